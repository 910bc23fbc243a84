package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * The conductor of an elliptic curve over Q against a given N, prime by prime: Tate's algorithm at 2, 3 and every
 * prime of N, and, for the primes q ≥ 5 of the discriminant outside N, the test of Kraus (<i>Quelques remarques à
 * propos des invariants c4, c6 et Δ d'une courbe elliptique</i>, Acta Arith. 54 (1989), Prop. 1 with Laska's
 * minimality criterion): the curve has good reduction at every such q at once iff the part D of |Δ| prime to 6N is
 * u^12 with u^4 | c4 and u^6 | c6. Only when that fails is D factored (trial division, then the cofactor) to name a
 * prime of bad reduction; the verdict itself never depends on factoring.
 */
public final class Conductors {

    private static final int TRIAL_LIMIT = 1_000_000;

    private Conductors() {
    }

    /**
     * A prime where the exponent of the conductor of E differs from that of N.
     *
     * @param p        the prime; {@code null} when only a composite {@code cofactor} with a prime of bad reduction
     *                 is known
     * @param expected v_p(N)
     * @param local    Tate's algorithm at p, or {@code null} with the cofactor
     * @param cofactor the unfactored part of Δ that holds a prime of bad reduction, or {@code null}
     */
    public record Mismatch(BigInteger p, int expected, LocalReduction local, BigInteger cofactor) {
    }

    /** Every prime where the conductor of E and N disagree, ascending (empty when the conductor is N). */
    public static List<Mismatch> against(WeierstrassModel e, long level) {
        List<Mismatch> out = new ArrayList<>();
        TreeSet<Long> primes = new TreeSet<>(List.of(2L, 3L));
        for (long q : Arith.primeFactors(level)) {
            primes.add(q);
        }
        BigInteger rest = e.discriminant().abs();
        for (long q : primes) {
            BigInteger bq = BigInteger.valueOf(q);
            int expected = Arith.valuation(level, q);
            LocalReduction local = Tate.reduce(e, bq);
            if (local.exponent() != expected) {
                out.add(new Mismatch(bq, expected, local, null));
            }
            while (rest.mod(bq).signum() == 0) {
                rest = rest.divide(bq);
            }
        }
        if (rest.equals(BigInteger.ONE) || goodEverywhere(e, rest)) {
            return out;
        }
        // locate the bad primes outside N
        List<Mismatch> outside = new ArrayList<>();
        for (long q = 5; q <= TRIAL_LIMIT && rest.compareTo(BigInteger.ONE) > 0; q += 2) {
            BigInteger bq = BigInteger.valueOf(q);
            if (rest.mod(bq).signum() != 0) {
                continue;
            }
            while (rest.mod(bq).signum() == 0) {
                rest = rest.divide(bq);
            }
            LocalReduction local = Tate.reduce(e, bq);
            if (local.exponent() != 0) {
                outside.add(new Mismatch(bq, 0, local, null));
            }
        }
        if (rest.compareTo(BigInteger.ONE) > 0 && !goodEverywhere(e, rest)) {
            // every prime factor of rest exceeds the trial limit, so rest below its square is prime
            BigInteger limit = BigInteger.valueOf(TRIAL_LIMIT);
            if (rest.compareTo(limit.multiply(limit)) < 0) {
                outside.add(new Mismatch(rest, 0, Tate.reduce(e, rest), null));
            } else {
                outside.add(new Mismatch(null, 0, null, rest));
            }
        }
        out.addAll(outside);
        out.sort((x, y) -> x.p() == null ? 1 : y.p() == null ? -1 : x.p().compareTo(y.p()));
        return out;
    }

    /** Kraus's test: good reduction at every prime of d (all ≥ 5): d = u^12, u^4 | c4, u^6 | c6. */
    static boolean goodEverywhere(WeierstrassModel e, BigInteger d) {
        BigInteger u = root(d, 12);
        if (u == null) {
            return false;
        }
        return e.c4().mod(u.pow(4)).signum() == 0 && e.c6().mod(u.pow(6)).signum() == 0;
    }

    /** The exact k-th root of n > 0, or {@code null}. */
    static BigInteger root(BigInteger n, int k) {
        BigInteger lo = BigInteger.ONE;
        BigInteger hi = BigInteger.ONE.shiftLeft(n.bitLength() / k + 1);
        while (lo.compareTo(hi) < 0) {
            BigInteger mid = lo.add(hi).add(BigInteger.ONE).shiftRight(1);
            if (mid.pow(k).compareTo(n) <= 0) {
                lo = mid;
            } else {
                hi = mid.subtract(BigInteger.ONE);
            }
        }
        return lo.pow(k).equals(n) ? lo : null;
    }

    /** The conductor of E when every prime of bad reduction is 2, 3, a prime of {@code primes}. */
    public static BigInteger conductor(WeierstrassModel e, long[] primes) {
        BigInteger n = BigInteger.ONE;
        for (long q : primes) {
            n = n.multiply(BigInteger.valueOf(q).pow(Tate.reduce(e, BigInteger.valueOf(q)).exponent()));
        }
        return n;
    }
}
