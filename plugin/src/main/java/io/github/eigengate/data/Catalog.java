package io.github.eigengate.data;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Everything of one dataset but the coefficients: the forms, the declared spaces and the claims tables. Small;
 * held in memory for the whole run.
 *
 * @param directory         the dataset directory
 * @param display           how reports name it (relative to the project when possible)
 * @param forms             by id, in file order
 * @param rejectedForms     ids of rows of {@code forms.csv} that were reported and left out
 * @param spaces            rows of {@code spaces.csv}
 * @param coefficientFiles  {@code coefficients.csv} then the shards {@code coefficients-*.csv}, by name
 * @param congruences       rows of {@code congruences.csv}
 * @param reducible         rows of {@code reducible.csv}
 * @param weights           rows of {@code modp-weights.csv}
 * @param curves            rows of {@code curves.csv}
 * @param atkinLehner       the {@code atkin_lehner} / {@code root_number} cells of {@code forms.csv}, by form id
 */
public record Catalog(Path directory, String display, Map<String, Form> forms, Set<String> rejectedForms,
                      List<SpaceRow> spaces,
                      List<Path> coefficientFiles, List<TableRow> congruences, List<TableRow> reducible,
                      List<TableRow> weights, List<CurveRow> curves, Map<String, AtkinLehnerSigns> atkinLehner) {

    /** A catalog without curves and without Atkin–Lehner cells. */
    public Catalog(Path directory, String display, Map<String, Form> forms, Set<String> rejectedForms,
                   List<SpaceRow> spaces, List<Path> coefficientFiles, List<TableRow> congruences,
                   List<TableRow> reducible, List<TableRow> weights) {
        this(directory, display, forms, rejectedForms, spaces, coefficientFiles, congruences, reducible, weights,
                List.of(), Map.of());
    }

    public Form form(String id) {
        return forms.get(id);
    }

    /** The rows of {@code curves.csv} that name this form, in file order. */
    public List<CurveRow> curvesOf(String formId) {
        return curves.stream().filter(c -> c.form().equals(formId)).toList();
    }
}
