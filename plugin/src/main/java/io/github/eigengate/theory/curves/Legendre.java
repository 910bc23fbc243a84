package io.github.eigengate.theory.curves;

import java.math.BigInteger;

/**
 * Legendre, Jacobi and Kronecker symbols by quadratic reciprocity (Cohen, GTM 138, Algorithm 1.4.10), without
 * exponentiation.
 */
public final class Legendre {

    private Legendre() {
    }

    /** (a / p) for an odd prime p: 0, 1 or −1. */
    public static int symbol(BigInteger a, BigInteger p) {
        if (p.bitLength() < 63) {
            return jacobi(a.mod(p).longValue(), p.longValue());
        }
        return jacobi(a.mod(p), p);
    }

    /** The Jacobi symbol (a / n) for odd n > 0 and any a. */
    public static int jacobi(long a, long n) {
        a = Math.floorMod(a, n);
        int t = 1;
        while (a != 0) {
            int z = Long.numberOfTrailingZeros(a);
            a >>= z;
            long r = n & 7;
            if ((z & 1) == 1 && (r == 3 || r == 5)) {
                t = -t;
            }
            if ((a & 3) == 3 && (n & 3) == 3) {
                t = -t;
            }
            long tmp = a;
            a = n % a;
            n = tmp;
        }
        return n == 1 ? t : 0;
    }

    private static int jacobi(BigInteger a, BigInteger n) {
        int t = 1;
        while (a.signum() != 0) {
            int z = a.getLowestSetBit();
            a = a.shiftRight(z);
            int r = n.intValue() & 7;
            if ((z & 1) == 1 && (r == 3 || r == 5)) {
                t = -t;
            }
            if ((a.intValue() & 3) == 3 && (n.intValue() & 3) == 3) {
                t = -t;
            }
            BigInteger tmp = a;
            a = n.mod(a);
            n = tmp;
        }
        return n.equals(BigInteger.ONE) ? t : 0;
    }

    /** The Kronecker symbol (d / p) for a prime p; (d / 2) is 0 for even d, 1 for d ≡ ±1 mod 8, −1 for d ≡ ±3. */
    public static int kronecker(long d, long p) {
        if (p == 2) {
            if ((d & 1) == 0) {
                return 0;
            }
            long r = Math.floorMod(d, 8);
            return r == 1 || r == 7 ? 1 : -1;
        }
        return jacobi(d, p);
    }
}
