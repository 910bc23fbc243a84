package io.github.eigengate.arith;

/**
 * Thrown when a prime {@code p} divides the index {@code [O_K : Z[x]]} of the equation order in
 * the ring of integers of {@code K = Q[x]/(f)}, detected by Dedekind's criterion. Then the primes
 * of {@code K} above {@code p} cannot be named by the irreducible factors of {@code f} modulo
 * {@code p}.
 */
public final class IndexDivisibleException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final long prime;

    /**
     * @param field name of the field
     * @param prime the prime dividing the index
     */
    public IndexDivisibleException(String field, long prime) {
        super(prime + " divides the index of Z[x] in the ring of integers of " + field
                + " (Dedekind's criterion), so the primes above " + prime
                + " cannot be named by the factors of the defining polynomial modulo " + prime);
        this.prime = prime;
    }

    /** @return the prime dividing the index */
    public long prime() {
        return prime;
    }
}
