package io.github.eigengate.theory.congruence;

import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Sturm's bound for Γ0(M).
 *
 * <p>J. Sturm, <i>On the congruence of modular forms</i>, Number Theory (New York 1984–85), LNM 1240 (1987),
 * Theorem 1: let F ∈ M_W(Γ) have Fourier coefficients in the ring of integers of a number field K and let 𝔓 be a
 * prime of K. If ord_𝔓 a_n(F) > 0 for every n ≤ (W/12)·[SL2(Z) : Γ], then ord_𝔓 a_n(F) > 0 for every n (statement
 * quoted from memory). For
 * Γ = Γ0(M) the index is m(M) = M ∏_{q | M} (1 + 1/q) (a standard formula, e.g. Diamond–Shurman, <i>A First
 * Course in Modular Forms</i>, §1.2; quoted from memory). Levels are passed factored (prime → exponent), since the
 * levels built by {@link CongruenceBounds} are products of known primes and may not fit a {@code long}.
 */
public final class SturmBound {

    private SturmBound() {
    }

    /**
     * [SL2(Z) : Γ0(M)] = M ∏_{q | M prime} (1 + 1/q).
     *
     * @throws IllegalArgumentException if M < 1
     */
    public static BigInteger index(SortedMap<Long, Integer> level) {
        BigInteger m = BigInteger.ONE;
        for (Map.Entry<Long, Integer> e : level.entrySet()) {
            if (e.getValue() < 1) {
                throw new IllegalArgumentException("exponent of " + e.getKey() + " must be positive");
            }
            BigInteger q = BigInteger.valueOf(e.getKey());
            m = m.multiply(q.pow(e.getValue() - 1)).multiply(q.add(BigInteger.ONE));
        }
        return m;
    }

    /** {@link #index(SortedMap)} for a level 1 ≤ N < 2^31 given as a number. */
    public static BigInteger index(int level) {
        return index(factor(level));
    }

    /** The level as a number. */
    public static BigInteger value(SortedMap<Long, Integer> level) {
        BigInteger m = BigInteger.ONE;
        for (Map.Entry<Long, Integer> e : level.entrySet()) {
            m = m.multiply(BigInteger.valueOf(e.getKey()).pow(e.getValue()));
        }
        return m;
    }

    /**
     * n = ∏ q^e as prime → exponent, by trial division.
     *
     * @throws IllegalArgumentException if n < 1
     */
    public static SortedMap<Long, Integer> factor(long n) {
        if (n < 1) {
            throw new IllegalArgumentException("level must be positive, was " + n);
        }
        SortedMap<Long, Integer> out = new TreeMap<>();
        for (long[] qe : Arith.factor(n)) {
            out.put(qe[0], (int) qe[1]);
        }
        return out;
    }

    /**
     * ⌊W·m(M)/12⌋: by Sturm's Theorem 1, a form of weight W on Γ0(M) with 𝔓-integral coefficients that vanish mod 𝔓
     * for n ≤ this bound vanishes mod 𝔓.
     *
     * @throws IllegalArgumentException if W < 0 or M < 1
     */
    public static BigInteger bound(long weight, SortedMap<Long, Integer> level) {
        if (weight < 0) {
            throw new IllegalArgumentException("weight must be non-negative, was " + weight);
        }
        return BigInteger.valueOf(weight).multiply(index(level)).divide(BigInteger.valueOf(12));
    }
}
