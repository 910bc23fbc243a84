package io.github.eigengate.report;

import java.util.List;

/**
 * What the report plots for one form: for each prime p in its tables with p not dividing the level, the normalised
 * x_p = a_p / (2 p^((k-1)/2)) under every real embedding of its coefficient field. Floating point, for drawing only.
 *
 * @param dataset      the dataset's display name
 * @param datasetIndex its position among the run's datasets
 * @param formIndex    the form's position in forms.csv
 * @param primes       the primes p plotted, ascending
 * @param values       values[e][i] is x_p for primes[i] under the e-th real embedding
 * @param zeros        how many of the plotted a_p are exactly 0
 * @param note         why nothing is plotted (no real embedding, …), or ""
 * @param roots        the image of the field's generator x under each real embedding (empty for Q)
 */
public record FormSeries(String dataset, int datasetIndex, int formIndex, String id, int level, int weight, int degree,
                  long[] primes, double[][] values, int zeros, String note, double[] roots) {

    /** Fewer primes than this are too few to tell a vanishing half from chance. */
    static final int CM_MIN_PRIMES = 8;

    /**
     * Complex multiplication shown, not decided: a CM form has a_p = 0 for the primes inert in its imaginary quadratic
     * field, half of them by Chebotarev density (Ribet, "Galois representations attached to eigenforms with
     * Nebentypus", 1977, §3); a form without CM has a_p = 0 for a density-0 set (Serre, 1981). Shown when at least
     * a third vanish. Integer comparison; a label on the plot, never a verdict.
     */
    boolean looksCm() {
        return primes.length >= CM_MIN_PRIMES && 3L * zeros >= primes.length;
    }

    int embeddings() {
        return values.length;
    }

    List<Long> primeList() {
        return java.util.Arrays.stream(primes).boxed().toList();
    }
}
