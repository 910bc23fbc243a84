package io.github.eigengate.report;

/**
 * The limiting distributions the report draws the normalised x_p = a_p / (2 p^((k-1)/2)) against. Floating point:
 * they are pictures, never verdicts.
 */
final class Distributions {

    private Distributions() {
    }

    /**
     * The Sato–Tate density (2/π)√(1−x²) on [−1, 1] for a form without complex multiplication (Barnet-Lamb,
     * Geraghty, Harris, Taylor, "A family of Calabi–Yau varieties and potential automorphy II", 2011, for k ≥ 2).
     */
    static double satoTate(double x) {
        return Math.abs(x) >= 1 ? 0 : 2 / Math.PI * Math.sqrt(1 - x * x);
    }

    /**
     * For a CM form: half the mass at 0 (the inert primes), the other half with density (1/π)/√(1−x²) (Hecke's
     * equidistribution of Grössencharacter angles). Returns the continuous part's density as a probability
     * density of its own, so it integrates to 1 over (−1, 1); the report scales it by the non-zero half.
     */
    static double cmContinuous(double x) {
        return Math.abs(x) >= 1 ? 0 : 1 / (Math.PI * Math.sqrt(1 - x * x));
    }
}
