package io.github.eigengate.theory.serre;

/**
 * Validation of the residue characteristic p shared by the classes of this package.
 *
 * <p>The recipes of this package (Serre's k(ρ̄), the Buzzard–Diamond–Jarvis set W(ρ̄)) are implemented
 * for primes p ≥ 5 only. The upper bound keeps p² − 1, the order of F_{p²}^×, inside an {@code int}.
 */
final class Primes {

    /** Largest prime p with p² − 1 ≤ {@link Integer#MAX_VALUE}. */
    static final int MAX_PRIME = 46337;

    static final String SMALL_PRIME_MESSAGE =
            "p = 2 and p = 3 are not supported: the recipes used here assume p ≥ 5";

    private Primes() {
    }

    /**
     * Checks that p is a prime with 5 ≤ p ≤ {@value #MAX_PRIME}.
     *
     * @return p
     * @throws IllegalArgumentException if p = 2 or p = 3 (with the message {@link #SMALL_PRIME_MESSAGE}),
     *     if p is not prime, or if p is larger than {@value #MAX_PRIME}
     */
    static int requireSupported(int p) {
        if (p == 2 || p == 3) {
            throw new IllegalArgumentException(SMALL_PRIME_MESSAGE);
        }
        if (p < 2 || !isPrime(p)) {
            throw new IllegalArgumentException("p = " + p + " is not a prime");
        }
        if (p > MAX_PRIME) {
            throw new IllegalArgumentException(
                    "p = " + p + " is too large: p² − 1 must fit in an int (p ≤ " + MAX_PRIME + ")");
        }
        return p;
    }

    /** Trial division; exact for every int. */
    static boolean isPrime(int n) {
        if (n < 2) {
            return false;
        }
        if (n % 2 == 0) {
            return n == 2;
        }
        for (long d = 3; d * d <= n; d += 2) {
            if (n % d == 0) {
                return false;
            }
        }
        return true;
    }
}
