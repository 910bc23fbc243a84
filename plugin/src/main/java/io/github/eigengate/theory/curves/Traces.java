package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;

/**
 * a_p(E) at many primes: p + 1 − #E(F_p) at good p, counted on a model minimal at p; +1, −1, 0 at split
 * multiplicative, non-split multiplicative and additive p (Silverman, AEC, Appendix C §16 / Ex. 5.11). Primes
 * dividing the model's discriminant go through Tate's algorithm, so a model that is singular mod p only because it
 * is not minimal at p still gives the a_p of the curve.
 */
public final class Traces {

    private Traces() {
    }

    /** a_p for each prime of {@code primes} (each below 2^31). */
    public static long[] of(WeierstrassModel e, int[] primes) {
        long[] out = new long[primes.length];
        BigInteger disc = e.discriminant();
        BigInteger m27c4 = e.c4().multiply(BigInteger.valueOf(-27));
        BigInteger m54c6 = e.c6().multiply(BigInteger.valueOf(-54));
        boolean small = m27c4.bitLength() < 63 && m54c6.bitLength() < 63 && disc.bitLength() < 63;
        long a = small ? m27c4.longValue() : 0;
        long b = small ? m54c6.longValue() : 0;
        long d = small ? disc.longValue() : 0;
        for (int i = 0; i < primes.length; i++) {
            long p = primes[i];
            boolean bad = small ? d % p == 0 : disc.mod(BigInteger.valueOf(p)).signum() == 0;
            if (bad || p < 5) {
                out[i] = trace(e, p);
            } else if (small) {
                out[i] = PointCounting.traceShort(Math.floorMod(a, p), Math.floorMod(b, p), p);
            } else {
                BigInteger bp = BigInteger.valueOf(p);
                out[i] = PointCounting.traceShort(m27c4.mod(bp).longValue(), m54c6.mod(bp).longValue(), p);
            }
        }
        return out;
    }

    /** a_p at one prime. */
    public static long trace(WeierstrassModel e, long p) {
        BigInteger bp = BigInteger.valueOf(p);
        if (e.discriminant().mod(bp).signum() != 0) {
            return PointCounting.trace(e, p);
        }
        LocalReduction local = Tate.reduce(e, bp);
        return local.type() == LocalReduction.Type.GOOD ? PointCounting.trace(local.minimal(), p)
                : local.badTrace();
    }
}
