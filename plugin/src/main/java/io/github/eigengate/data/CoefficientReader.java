package io.github.eigengate.data;

import io.github.eigengate.arith.ExpressionSyntaxException;
import io.github.eigengate.arith.Field;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.Rationals;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;

/**
 * Streams the coefficient tables and hands each form's coefficients to a consumer once they are complete.
 *
 * <p>Rows of one form are usually contiguous; then a form is delivered as soon as its run of rows ends, and memory
 * stays bounded by the largest form. A form whose rows come in several runs (in one file or across shards) is
 * detected on its second run; the caller then streams again with that form in {@code holdBack}, which collects it
 * over all files and delivers it at the end. See {@code Gate}.
 */
public final class CoefficientReader {

    private final Catalog catalog;
    private final Set<String> holdBack;
    private final Problems problems;
    private final Consumer<FormData<?>> out;

    private final Set<String> delivered = new HashSet<>();
    private final Set<String> scattered = new HashSet<>();
    private final Map<String, Block<?>> held = new LinkedHashMap<>();
    private Block<?> current;
    private String unknownRun;
    private CsvTable.Row layout;
    private int formAt;
    private int nAt;
    private int valueAt;

    private CoefficientReader(Catalog catalog, Set<String> holdBack, Problems problems, Consumer<FormData<?>> out) {
        this.catalog = catalog;
        this.holdBack = holdBack;
        this.problems = problems;
        this.out = out;
    }

    /**
     * Streams every coefficient file of the catalog.
     *
     * @return the forms whose rows were found in more than one run and were not held back: their deliveries were
     *     incomplete, and the caller must stream again holding them back
     */
    public static Set<String> stream(Catalog catalog, Set<String> holdBack, Problems problems,
                                     Consumer<FormData<?>> out) {
        CoefficientReader reader = new CoefficientReader(catalog, holdBack, problems, out);
        for (Path file : catalog.coefficientFiles()) {
            String shown = CatalogReader.name(catalog.display(), file.getFileName().toString());
            CsvTable.of(file, shown, Tables.COEFFICIENTS_REQUIRED, List.of()).read(problems,
                    row -> reader.row(row, shown));
            reader.endRun();
        }
        for (Block<?> block : reader.held.values()) {
            out.accept(block.finish());
        }
        return reader.scattered;
    }

    private void row(CsvTable.Row row, String file) {
        if (row != layout) { // a new file: its own column order
            layout = row;
            formAt = row.position("form");
            nAt = row.position("n");
            valueAt = row.position("value");
        }
        String id = row.get(formAt);
        if (current == null && id.equals(unknownRun)) {
            return; // the rest of an unknown form's run, reported at its first row
        }
        if (current == null || !current.form.id().equals(id)) {
            endRun();
            startRun(row, id);
        }
        if (current == null) {
            return;
        }
        String nText = row.get(nAt);
        int n = Cells.smallPositive(nText);
        if (n < 0) {
            Integer checked = Cells.integer(row, "n", nText, 1, Integer.MAX_VALUE, "form=" + id, problems);
            if (checked == null) {
                return;
            }
            n = checked;
        }
        current.add(n, row.get(valueAt), row, file);
    }

    private void startRun(CsvTable.Row row, String id) {
        Form form = catalog.form(id);
        if (form == null) {
            // reached once per run of an unknown id: row() skips the rest of the run
            if (catalog.rejectedForms().contains(id)) {
                problems.error(row.at("form"), "form=" + id, "a form id from forms.csv", id,
                        "the form's row in forms.csv has an error (reported there); its rows are skipped");
            } else {
                problems.error(row.at("form"), "form=" + (id.isEmpty() ? "?" : id), "a form id from forms.csv",
                        id.isEmpty() ? "an empty cell" : id,
                        "no form with this id is declared; its rows are skipped");
            }
            unknownRun = id;
            return;
        }
        unknownRun = null;
        Block<?> resume = held.get(id);
        if (resume != null) {
            current = resume;
            return;
        }
        if (holdBack.contains(id)) {
            current = Block.of(form, problems);
            held.put(id, current);
            return;
        }
        if (delivered.contains(id)) {
            scattered.add(id);
        }
        current = Block.of(form, problems);
    }

    private void endRun() {
        if (current != null && !held.containsKey(current.form.id())) {
            delivered.add(current.form.id());
            out.accept(current.finish());
        }
        current = null;
        unknownRun = null;
    }

    /** One form's rows being collected. */
    private static final class Block<E> {
        final Form form;
        final Field<E> field;
        final Problems problems;
        final Coefficients.Builder<E> builder = new Coefficients.Builder<>();
        final Parser<E> parser;

        private Block(Form form, Field<E> field, Parser<E> parser, Problems problems) {
            this.form = form;
            this.field = field;
            this.parser = parser;
            this.problems = problems;
        }

        static Block<?> of(Form form, Problems problems) {
            if (form.rational()) {
                return new Block<>(form, Rationals.FIELD, CoefficientReader::rational, problems);
            }
            NumberField k = form.field();
            return new Block<>(form, k, (text, f) -> element(k, text, f), problems);
        }

        void add(int n, String text, CsvTable.Row row, String file) {
            if (form.rational()) {
                long small = Cells.smallInteger(text);
                if (small != Long.MIN_VALUE && !builder.has(n)) { // the common row: no allocation
                    builder.putInteger(n, small, file, row.line());
                    return;
                }
            }
            if (text.isEmpty()) {
                problems.error(row.at("value"), subject(n), expectation(form), "an empty cell", "a_" + n + " is missing");
                return;
            }
            if (Cells.splitsDigits(text)) {
                problems.error(row.at("value"), subject(n), expectation(form), text,
                        "whitespace separates two digits; write the number without it");
                return;
            }
            if (text.startsWith("[") && !text.endsWith("]") && row.size() > row.width()) {
                problems.error(row.at("value"), subject(n), expectation(form), text,
                        "the vector was split at its commas: quote the cell, e.g. \"[1, 2]\"");
                return;
            }
            Object parsed = parser.parse(text, form);
            if (parsed instanceof String problem) {
                problems.error(row.at("value"), subject(n), expectation(form), text, problem);
                return;
            }
            @SuppressWarnings("unchecked")
            E value = (E) parsed;
            E before = builder.get(n);
            if (before != null) {
                SourceLocation first = builder.at(n);
                if (before.equals(value)) {
                    problems.warning(row.at("value"), subject(n), "each (form, n) once", text,
                            "a_" + n + " is given again with the same value (first at " + first + ")");
                } else {
                    problems.error(row.at("value"), subject(n), before.toString(), text,
                            "a_" + n + " is given twice with different values (first at " + first + ")");
                }
                return;
            }
            builder.put(n, value, file, row.line());
        }

        /** The subject of a finding about a_n, made only when there is one. */
        private String subject(int n) {
            return "form=" + form.id() + " n=" + n;
        }

        FormData<E> finish() {
            @SuppressWarnings("unchecked")
            E zeta = (E) form.zeta();
            return new FormData<>(form, field, builder.build(), zeta);
        }
    }

    /** Parses a cell to an element, or returns a String saying what is wrong. */
    private interface Parser<E> {
        Object parse(String text, Form form);
    }

    static String expectation(Form form) {
        return form.rational() ? "an integer"
                : "a polynomial in x with rational coefficients or a vector [c0, ..., c" + (form.degree() - 1) + "]";
    }

    private static Object rational(String text, Form form) {
        long small = Cells.smallInteger(text);
        if (small != Long.MIN_VALUE) {
            return Rational.of(small);
        }
        String s = Cells.compact(text);
        if (!Cells.isInteger(s)) {
            return "the form has rational coefficients (no field), so a_n must be an integer";
        }
        if (Cells.significantDigits(s) > io.github.eigengate.arith.Limits.MAX_DIGITS) {
            return "an integer of at most " + io.github.eigengate.arith.Limits.MAX_DIGITS + " digits is accepted";
        }
        return Rational.of(new BigInteger(s)); // small ones were read above, without allocation
    }

    /** Also reads the {@code zeta} cell of {@code forms.csv} (the same grammar as a_n). */
    static Object element(NumberField k, String text, Form form) {
        String s = Cells.compact(text);
        if (s.startsWith("[")) {
            if (!s.endsWith("]")) {
                return "a vector must end with ']'";
            }
            String inner = s.substring(1, s.length() - 1);
            String[] parts = inner.isEmpty() ? new String[0] : inner.split(",", -1);
            if (parts.length != k.degree()) {
                return "the vector has " + parts.length + " entries but the field has degree " + k.degree();
            }
            List<Rational> coords = new ArrayList<>(parts.length);
            for (int i = 0; i < parts.length; i++) {
                try {
                    coords.add(Rational.parse(parts[i]));
                } catch (ExpressionSyntaxException | ArithmeticException e) {
                    return "entry " + (i + 1) + " of the vector is not a rational number";
                }
            }
            return k.element(coords);
        }
        try {
            return k.element(QPoly.parse(s));
        } catch (ExpressionSyntaxException e) {
            return "the expression cannot be read at character " + (e.offset() + 1) + ": expected " + e.expected();
        } catch (ArithmeticException e) {
            return "the expression is not a valid number: " + e.getMessage();
        }
    }
}
