package io.github.eigengate.arith;

/**
 * The sizes of input the gate accepts, so that no cell can make it run unboundedly or exhaust memory. Each is far
 * above what real tables of modular forms need; docs/limits.md lists them with the error a user sees.
 */
public final class Limits {

    /** Characters in one expression (a coefficient value or a field polynomial), whitespace included. */
    public static final int MAX_EXPRESSION_LENGTH = 1_000_000;

    /**
     * Decimal digits of one integer (a numerator or a denominator). BigInteger's decimal conversion is quadratic,
     * and 100 000 digits take some milliseconds; a_p of weight 10 000 has at most about 5000·log10(p) digits.
     */
    public static final int MAX_DIGITS = 100_000;

    /**
     * Exponent of x in an expression. A field has degree at most 1000, and a value is an element of such a field:
     * higher powers only ever appear in mistaken cells, where x^e mod f would have coefficients of e·log|α| bits.
     */
    public static final int MAX_EXPONENT = 10_000;

    private Limits() {
    }
}
