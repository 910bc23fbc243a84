package io.github.eigengate.data;

import java.util.List;

/** The file names and columns of the data contract (docs/data-contract.md). */
public final class Tables {

    private Tables() {
    }

    public static final String FORMS = "forms.csv";
    public static final String SPACES = "spaces.csv";
    public static final String COEFFICIENTS = "coefficients.csv";
    public static final String COEFFICIENT_SHARD_PREFIX = "coefficients-";
    public static final String CONGRUENCES = "congruences.csv";
    public static final String REDUCIBLE = "reducible.csv";
    public static final String WEIGHTS = "modp-weights.csv";
    public static final String CURVES = "curves.csv";

    public static final List<String> FORMS_REQUIRED = List.of("id", "level", "weight");
    public static final List<String> FORMS_OPTIONAL = List.of("character", "field", "zeta", "atkin_lehner",
            "root_number");
    public static final List<String> COEFFICIENTS_REQUIRED = List.of("form", "n", "value");
    public static final List<String> SPACES_REQUIRED = List.of("level", "weight");
    public static final List<String> SPACES_OPTIONAL = List.of("character");
    public static final List<String> CONGRUENCES_REQUIRED = List.of("form", "other", "p");
    public static final List<String> CONGRUENCES_OPTIONAL = List.of("twist", "prime", "other_prime");
    public static final List<String> REDUCIBLE_REQUIRED = List.of("form", "p", "i", "j");
    public static final List<String> REDUCIBLE_OPTIONAL = List.of("prime", "psi", "phi");
    public static final List<String> WEIGHTS_REQUIRED = List.of("p");
    public static final List<String> WEIGHTS_OPTIONAL =
            List.of("form", "prime", "local", "serre_weight", "weights", "shape", "exponents");
    public static final List<String> CURVES_REQUIRED = List.of("form", "curve");
    public static final List<String> CURVES_OPTIONAL = List.of("torsion");
}
