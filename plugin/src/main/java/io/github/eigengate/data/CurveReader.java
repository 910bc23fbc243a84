package io.github.eigengate.data;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads {@code curves.csv} (docs/data-contract.md): {@code form}, {@code curve} = {@code [a1,a2,a3,a4,a6]} with
 * integers of any size, optional {@code torsion}. Rows with a malformed cell, a singular model or a form that is
 * not rational of weight 2 with the trivial character are reported as {@code table-format} and left out.
 */
public final class CurveReader {

    /** Digits allowed in one coefficient: far beyond any published model, short of making arithmetic a hazard. */
    static final int MAX_DIGITS = 2000;

    private CurveReader() {
    }

    /**
     * The rows of {@code curves.csv} in file order; empty when the dataset has no such file. The file must be a
     * regular file inside {@code bound}, like every table ({@link CatalogReader#admitted}).
     */
    public static List<CurveRow> read(Path directory, String display, Path bound, Map<String, Form> forms,
                                      Set<String> rejected, Problems problems) {
        Path file = directory.resolve(Tables.CURVES);
        List<CurveRow> rows = new ArrayList<>();
        String shown = CatalogReader.name(display, Tables.CURVES);
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS) || !CatalogReader.admitted(file, shown, bound, problems)) {
            return rows;
        }
        CsvTable.of(file, shown, Tables.CURVES_REQUIRED, Tables.CURVES_OPTIONAL).read(problems, row -> {
            String id = row.get("form");
            String subject = "form=" + (id.isEmpty() ? "?" : id);
            boolean ok = true;
            Form form = forms.get(id);
            if (id.isEmpty()) {
                problems.error(row.at("form"), subject, "a form id", "an empty cell", "every curve names its form");
                ok = false;
            } else if (form == null) {
                if (!rejected.contains(id)) { // a rejected form was reported where it is declared
                    problems.error(row.at("form"), subject, "the id of a form in " + Tables.FORMS, id,
                            "the curve names a form that " + Tables.FORMS + " does not declare");
                }
                ok = false;
            } else if (!form.rational() || form.weight() != 2 || !form.character().isTrivial()) {
                problems.error(row.at("form"), subject, "a form over Q of weight 2 with the trivial character",
                        "weight " + form.weight() + (form.rational() ? "" : ", field " + form.fieldPolynomial())
                                + (form.character().isTrivial() ? "" : ", character " + form.character().cell()),
                        "an elliptic curve over Q corresponds to a rational newform of weight 2 and trivial "
                                + "character (modularity)");
                ok = false;
            }
            WeierstrassModel model = model(row, subject, problems);
            Integer torsion = null;
            String t = row.get("torsion");
            if (!t.isEmpty()) {
                torsion = Cells.integer(row, "torsion", 1, 1_000_000, subject, problems);
                ok &= torsion != null;
            }
            if (ok && model != null) {
                rows.add(new CurveRow(id, model, torsion, row.at(), row.at("curve"), row.at("torsion")));
            }
        });
        return rows;
    }

    private static WeierstrassModel model(CsvTable.Row row, String subject, Problems problems) {
        String text = row.get("curve");
        String expected = "[a1,a2,a3,a4,a6] with five integers";
        if (text.isEmpty()) {
            problems.error(row.at("curve"), subject, expected, "an empty cell", "every row needs a curve");
            return null;
        }
        if (!text.startsWith("[") || !text.endsWith("]")) {
            problems.error(row.at("curve"), subject, expected, text,
                    "a curve is written in brackets, e.g. [0,-1,1,-10,-20]");
            return null;
        }
        String[] parts = text.substring(1, text.length() - 1).split(",", -1);
        if (parts.length != 5) {
            problems.error(row.at("curve"), subject, expected, text,
                    "a Weierstrass model has five coefficients a1, a2, a3, a4, a6; this cell has " + parts.length);
            return null;
        }
        List<BigInteger> a = new ArrayList<>();
        String[] names = {"a1", "a2", "a3", "a4", "a6"};
        for (int i = 0; i < 5; i++) {
            String c = parts[i].strip();
            if (!c.matches("[+-]?[0-9]+")) {
                problems.error(row.at("curve"), subject, expected, text,
                        names[i] + " = '" + c + "' is not a decimal integer");
                return null;
            }
            if (c.length() > MAX_DIGITS) {
                problems.error(row.at("curve"), subject, expected, text.substring(0, 40) + "…",
                        names[i] + " has more than " + MAX_DIGITS + " digits");
                return null;
            }
            a.add(new BigInteger(c.startsWith("+") ? c.substring(1) : c));
        }
        WeierstrassModel m = WeierstrassModel.of(a);
        if (m.isSingular()) {
            problems.error(row.at("curve"), subject, "a model with nonzero discriminant", "discriminant 0",
                    "the cubic " + m + " is singular (a node or a cusp), not an elliptic curve");
            return null;
        }
        return m;
    }
}
