package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.ExpressionSyntaxException;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Work;
import io.github.eigengate.arith.ZFactorization;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Reads everything of a dataset directory except the coefficients, which {@link CoefficientReader} streams.
 * Malformed rows are reported and left out; the catalog holds what could be read.
 */
public final class CatalogReader {

    /** Beyond this, exact factorisation and characteristic polynomials stop being affordable in a build. */
    static final int MAX_FIELD_DEGREE = 1000;

    /**
     * Work (see {@link Work}) allowed to decide that one field polynomial is irreducible: a few seconds. Real Hecke
     * fields of degree up to a few hundred take a small fraction of it; Zassenhaus recombination is exponential for
     * polynomials with many modular factors (Swinnerton-Dyer polynomials), which are then reported, not waited for.
     */
    static final long FIELD_BUDGET = 1_000_000_000L;

    private CatalogReader() {
    }

    /**
     * @param directory the dataset directory
     * @param display   the directory as reports name it
     * @return the catalog, or {@code null} (after reporting) when the directory or {@code forms.csv} is missing
     */
    public static Catalog read(Path directory, String display, Problems problems) {
        return read(directory, display, null, problems);
    }

    /**
     * As {@link #read(Path, String, Problems)}, with every path confined (after symbolic links) to {@code root}, or,
     * when it is {@code null}, every file to the dataset's own directory: a table that is a link to elsewhere, a
     * dangling link, a FIFO or a directory named like a table is reported, never followed or skipped in silence.
     */
    public static Catalog read(Path directory, String display, Path root, Problems problems) {
        if (!Files.isDirectory(directory)) {
            problems.error(SourceLocation.file(display), "dataset=" + display, "a dataset directory",
                    Files.exists(directory) ? "a file" : "nothing", "the dataset directory does not exist");
            return null;
        }
        Path bound;
        try {
            Path real = directory.toRealPath();
            Path rootReal = root == null ? null : root.toRealPath();
            if (rootReal != null && !real.startsWith(rootReal)) {
                problems.error(SourceLocation.file(display), "dataset=" + display,
                        "a directory inside " + rootReal, real.toString(),
                        "the dataset directory resolves (through symbolic links) outside the project root; "
                                + "it is not read");
                return null;
            }
            bound = rootReal == null ? real : rootReal;
        } catch (IOException e) {
            problems.error(SourceLocation.file(display), "dataset=" + display, "a readable directory",
                    "an I/O error", "the dataset directory cannot be resolved: " + e.getMessage());
            return null;
        }
        Path formsFile = directory.resolve(Tables.FORMS);
        if (!Files.exists(formsFile, LinkOption.NOFOLLOW_LINKS)) {
            problems.error(SourceLocation.file(name(display, Tables.FORMS)), "dataset=" + display,
                    "a file " + Tables.FORMS, "none", "every dataset needs " + Tables.FORMS);
            return null;
        }
        if (!admitted(formsFile, name(display, Tables.FORMS), bound, problems)) {
            return null;
        }
        Set<String> rejected = new HashSet<>();
        Map<String, AtkinLehnerSigns> signs = new HashMap<>();
        Map<String, Form> forms = readForms(formsFile, name(display, Tables.FORMS), problems, rejected, signs);
        List<SpaceRow> spaces = readSpaces(directory, display, bound, problems);
        List<Path> shards = coefficientFiles(directory, display, bound, problems);
        List<TableRow> congruences = readRows(directory, display, Tables.CONGRUENCES, Tables.CONGRUENCES_REQUIRED,
                Tables.CONGRUENCES_OPTIONAL, bound, problems);
        List<TableRow> reducible = readRows(directory, display, Tables.REDUCIBLE, Tables.REDUCIBLE_REQUIRED,
                Tables.REDUCIBLE_OPTIONAL, bound, problems);
        List<TableRow> weights = readRows(directory, display, Tables.WEIGHTS, Tables.WEIGHTS_REQUIRED,
                Tables.WEIGHTS_OPTIONAL, bound, problems);
        List<CurveRow> curves = CurveReader.read(directory, display, bound, forms, rejected, problems);
        return new Catalog(directory, display, forms, Set.copyOf(rejected), spaces, shards, congruences, reducible,
                weights, curves, Map.copyOf(signs));
    }

    /**
     * Whether a table that is present may be read: a regular file (links followed) that resolves inside
     * {@code bound}. Anything else is reported as an error at the file.
     */
    static boolean admitted(Path file, String shown, Path bound, Problems problems) {
        String subject = "table=" + shown;
        if (Files.isSymbolicLink(file) && !Files.exists(file)) {
            problems.error(SourceLocation.file(shown), subject, "a readable file", "a dangling symbolic link",
                    "the table is a symbolic link to nothing; it is not read");
            return false;
        }
        if (!Files.isRegularFile(file)) {
            problems.error(SourceLocation.file(shown), subject, "a regular file",
                    Files.isDirectory(file) ? "a directory" : "a special file (FIFO, device or socket)",
                    "the table is not a regular file; it is not read");
            return false;
        }
        try {
            Path real = file.toRealPath();
            if (!real.startsWith(bound)) {
                problems.error(SourceLocation.file(shown), subject, "a file inside " + bound, real.toString(),
                        "the table resolves (through symbolic links) outside the "
                                + "project root; it is not read");
                return false;
            }
        } catch (IOException e) {
            problems.error(SourceLocation.file(shown), subject, "a readable file", "an I/O error",
                    "the table cannot be resolved: " + e.getMessage());
            return false;
        }
        return true;
    }

    static String name(String display, String file) {
        return display.isEmpty() || display.equals(".") ? file : display + "/" + file;
    }

    private static Map<String, Form> readForms(Path file, String display, Problems problems, Set<String> rejected,
                                               Map<String, AtkinLehnerSigns> signs) {
        Map<String, Form> forms = new LinkedHashMap<>();
        Map<String, QPolyCache> fields = new HashMap<>();
        Map<String, CharacterCell.Parsed> characters = new HashMap<>(); // "N|cell": the walk over (Z/NZ)^× once
        CsvTable.of(file, display, Tables.FORMS_REQUIRED, Tables.FORMS_OPTIONAL).read(problems, row -> {
            String id = row.get("id");
            String subject = "form=" + (id.isEmpty() ? "?" : id);
            if (id.isEmpty()) {
                problems.error(row.at("id"), subject, "a form id", "an empty cell", "every form needs an id");
                return;
            }
            if (forms.containsKey(id)) {
                problems.error(row.at("id"), subject, "a unique id", id,
                        "the id is already used at line " + forms.get(id).location().line());
                return;
            }
            Integer level = Cells.integer(row, "level", 1, Integer.MAX_VALUE, subject, problems);
            DirichletCharacter character = null;
            boolean characterOk = level != null;
            if (level != null) {
                String cell = row.get("character");
                CharacterCell.Parsed chi = characters.computeIfAbsent(level + "|" + Cells.compact(cell),
                        key -> CharacterCell.parse(cell, level));
                if (chi.ok()) {
                    character = chi.character();
                } else {
                    problems.error(row.at("character"), subject, CharacterCell.EXPECTED, row.get("character"),
                            chi.problem());
                    characterOk = false;
                }
            }
            Integer weight = Cells.weight(row, subject, problems, character);
            String fieldText = row.get("field");
            NumberField field = null;
            boolean fieldOk = true;
            if (!fieldText.isEmpty()) {
                QPolyCache cached = fields.computeIfAbsent(Cells.compact(fieldText), CatalogReader::field);
                if (cached.problem != null) {
                    problems.error(row.at("field"), subject, cached.expected, fieldText, cached.problem);
                    fieldOk = false;
                } else {
                    field = cached.field;
                }
            }
            NumberField.Element zeta = null;
            boolean zetaOk = true;
            if (character != null && fieldOk) {
                ZetaCell.Parsed z = ZetaCell.parse(row.get("zeta"), character, field, row.has("zeta"));
                if (z.ok()) {
                    zeta = z.zeta();
                } else {
                    problems.error(row.at("zeta"), subject, z.expected(),
                            row.get("zeta").isEmpty() ? "an empty cell" : row.get("zeta"), z.problem());
                    zetaOk = false;
                }
            }
            if (level != null && weight != null && characterOk && fieldOk && zetaOk) {
                forms.put(id, new Form(id, level, weight, field, row.at(), character, zeta));
                // the optional Atkin–Lehner cells (AtkinLehnerSigns.read reports their problems)
                Optional.ofNullable(AtkinLehnerSigns.read(row, id, level, subject, problems))
                        .ifPresent(s -> signs.put(id, s));
            } else {
                rejected.add(id);
            }
        });
        return forms;
    }

    /** A parsed and validated field polynomial, shared by the forms that use it. */
    private record QPolyCache(NumberField field, String expected, String problem) {
    }

    private static QPolyCache field(String text) {
        String expected = "a monic irreducible polynomial in x with integer coefficients";
        QPoly f;
        try {
            f = QPoly.parse(text);
        } catch (ExpressionSyntaxException e) {
            return new QPolyCache(null, expected, "the polynomial cannot be read at character " + (e.offset() + 1)
                    + ": expected " + e.expected());
        }
        if (f.degree() < 1) {
            return new QPolyCache(null, expected, "a field polynomial must have degree at least 1");
        }
        if (f.degree() > MAX_FIELD_DEGREE) {
            return new QPolyCache(null, expected, "coefficient fields of degree above " + MAX_FIELD_DEGREE
                    + " are not supported (this one has degree " + f.degree() + ")");
        }
        if (!f.isMonic()) {
            return new QPolyCache(null, expected, "the field polynomial is not monic");
        }
        if (!f.hasIntegerCoefficients()) {
            return new QPolyCache(null, expected, "the field polynomial has non-integral coefficients");
        }
        String reducible;
        try {
            reducible = Work.unit(FIELD_BUDGET, () -> ZFactorization.isIrreducible(f) ? null
                    : ZFactorization.factor(f).stream().map(g -> "(" + g + ")").reduce((a, b) -> a + "*" + b)
                            .orElse(""));
        } catch (Work.Exceeded e) {
            return new QPolyCache(null, expected, "its irreducibility over Q was not decided within the work budget "
                    + "of " + e.budget() + " units (a field of this degree and shape is beyond what the gate factors "
                    + "in a build; see docs/limits.md); the form is not checked");
        }
        if (reducible != null) {
            return new QPolyCache(null, expected, "the field polynomial is reducible over Q: it factors as "
                    + reducible);
        }
        return new QPolyCache(NumberField.of(f), expected, null);
    }

    private static List<SpaceRow> readSpaces(Path directory, String display, Path bound, Problems problems) {
        Path file = directory.resolve(Tables.SPACES);
        List<SpaceRow> spaces = new ArrayList<>();
        String shown = name(display, Tables.SPACES);
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS) || !admitted(file, shown, bound, problems)) {
            return spaces;
        }
        Map<SpaceKey, Integer> seen = new HashMap<>();
        CsvTable.of(file, shown, Tables.SPACES_REQUIRED, Tables.SPACES_OPTIONAL).read(problems, row -> {
            String subject = "space=line " + row.line();
            Integer level = Cells.integer(row, "level", 1, Integer.MAX_VALUE, subject, problems);
            Integer weight = Cells.integer(row, "weight", 1, Cells.MAX_WEIGHT, subject, problems);
            String cell = row.get("character");
            boolean trivialCell = cell.isBlank() || cell.strip().equals("1");
            DirichletCharacter character = null;
            if (level != null) {
                CharacterCell.Parsed parsed = CharacterCell.parse(cell, level);
                if (parsed.ok()) {
                    character = parsed.character().isTrivial() ? DirichletCharacter.trivial(level)
                            : parsed.character();
                } else {
                    problems.error(row.at("character"), subject, CharacterCell.EXPECTED, cell,
                            "the character cannot be read: " + parsed.problem());
                    return;
                }
            }
            if (weight != null && character != null && character.isOdd() != (weight % 2 != 0)) {
                if (character.isTrivial() && trivialCell) {
                    problems.error(row.at("weight"), subject, "an even weight", Integer.toString(weight),
                            "with the trivial character there are no forms of odd weight (−I ∈ Γ0(N) acts as (−1)^k)");
                } else {
                    int sign = character.isOdd() ? -1 : 1;
                    problems.error(row.at("weight"), subject, (sign < 0 ? "an odd" : "an even")
                            + " weight (χ(−1) = " + sign + " = (−1)^k)", Integer.toString(weight),
                            "S_k(N, χ) = 0 unless χ(−1) = (−1)^k, since −I ∈ Γ0(N) acts on it by χ(−1)(−1)^k");
                }
                return;
            }
            if (level == null || weight == null) {
                return;
            }
            SpaceKey key = new SpaceKey(level, weight, character);
            Integer before = seen.putIfAbsent(key.orbit(), row.line());
            if (before != null) {
                problems.warning(row.at(), "space=" + key, "each space once", key.toString(),
                        "the space is already declared at line " + before
                                + (character.order() > 2 ? " (Galois-conjugate characters name the same space)" : ""));
                return;
            }
            spaces.add(new SpaceRow(key, row.at()));
        });
        return spaces;
    }

    private static List<Path> coefficientFiles(Path directory, String display, Path bound, Problems problems) {
        List<Path> files = new ArrayList<>();
        Path main = directory.resolve(Tables.COEFFICIENTS);
        if (Files.exists(main, LinkOption.NOFOLLOW_LINKS)
                && admitted(main, name(display, Tables.COEFFICIENTS), bound, problems)) {
            files.add(main);
        }
        try (Stream<Path> list = Files.list(directory)) {
            list.filter(p -> {
                String n = p.getFileName().toString();
                return n.startsWith(Tables.COEFFICIENT_SHARD_PREFIX) && n.endsWith(".csv");
            }).sorted().filter(p -> admitted(p, name(display, p.getFileName().toString()), bound, problems))
                    .forEach(files::add);
        } catch (IOException e) {
            problems.error(SourceLocation.file(display), "dataset=" + display, "a readable directory",
                    "an I/O error", "the dataset directory cannot be listed: " + e.getMessage());
        }
        return files;
    }

    private static List<TableRow> readRows(Path directory, String display, String fileName, List<String> required,
                                           List<String> optional, Path bound, Problems problems) {
        Path file = directory.resolve(fileName);
        List<TableRow> rows = new ArrayList<>();
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)
                || !admitted(file, name(display, fileName), bound, problems)) {
            return rows;
        }
        CsvTable table = CsvTable.of(file, name(display, fileName), required, optional);
        table.read(problems, row -> {
            Map<String, String> cells = new HashMap<>();
            Map<String, Integer> columns = new HashMap<>();
            for (String column : table.known()) {
                if (row.has(column)) {
                    cells.put(column, row.get(column));
                    columns.put(column, row.at(column).column());
                }
            }
            rows.add(new TableRow(table.display(), row.line(), cells, columns));
        });
        return rows;
    }
}
