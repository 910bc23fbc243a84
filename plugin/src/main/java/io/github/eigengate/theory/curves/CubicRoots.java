package io.github.eigengate.theory.curves;

import java.math.BigInteger;

/**
 * The number of distinct roots in F_p of a monic cubic T³ + bT² + cT + d: the degree of gcd(T^p − T, P) (Cohen,
 * GTM 138, §3.4.1: the roots of P in F_p are the roots of gcd(P, T^p − T)).
 */
final class CubicRoots {

    private CubicRoots() {
    }

    static int count(BigInteger b, BigInteger c, BigInteger d, BigInteger p) {
        if (p.bitLength() <= 12) {
            int q = p.intValueExact();
            long bb = b.mod(p).longValue();
            long cc = c.mod(p).longValue();
            long dd = d.mod(p).longValue();
            int roots = 0;
            for (long t = 0; t < q; t++) {
                if ((((t + bb) * t % q + cc) * t % q + dd) % q == 0) {
                    roots++;
                }
            }
            return roots;
        }
        BigInteger[] f = {d.mod(p), c.mod(p), b.mod(p), BigInteger.ONE}; // low degree first, monic
        // T^p mod f by square and multiply
        BigInteger[] r = {BigInteger.ONE};
        BigInteger[] base = {BigInteger.ZERO, BigInteger.ONE};
        for (int i = p.bitLength() - 1; i >= 0; i--) {
            r = mulMod(r, r, f, p);
            if (p.testBit(i)) {
                r = mulMod(r, base, f, p);
            }
        }
        BigInteger[] g = sub(r, base, p);
        return degree(gcd(f, g, p));
    }

    private static BigInteger[] mulMod(BigInteger[] x, BigInteger[] y, BigInteger[] f, BigInteger p) {
        BigInteger[] prod = new BigInteger[x.length + y.length - 1];
        java.util.Arrays.fill(prod, BigInteger.ZERO);
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < y.length; j++) {
                prod[i + j] = prod[i + j].add(x[i].multiply(y[j]));
            }
        }
        return reduce(prod, f, p);
    }

    /** x mod the monic f, coefficients mod p. */
    private static BigInteger[] reduce(BigInteger[] x, BigInteger[] f, BigInteger p) {
        BigInteger[] r = x.clone();
        int df = f.length - 1;
        for (int i = r.length - 1; i >= df; i--) {
            BigInteger q = r[i].mod(p);
            if (q.signum() != 0) {
                for (int j = 0; j <= df; j++) {
                    r[i - df + j] = r[i - df + j].subtract(q.multiply(f[j]));
                }
            }
        }
        int len = Math.min(r.length, df);
        BigInteger[] out = new BigInteger[len];
        for (int i = 0; i < len; i++) {
            out[i] = r[i].mod(p);
        }
        return out;
    }

    private static BigInteger[] sub(BigInteger[] x, BigInteger[] y, BigInteger p) {
        BigInteger[] out = new BigInteger[Math.max(x.length, y.length)];
        for (int i = 0; i < out.length; i++) {
            BigInteger a = i < x.length ? x[i] : BigInteger.ZERO;
            BigInteger b = i < y.length ? y[i] : BigInteger.ZERO;
            out[i] = a.subtract(b).mod(p);
        }
        return out;
    }

    private static int degree(BigInteger[] x) {
        for (int i = x.length - 1; i >= 0; i--) {
            if (x[i].signum() != 0) {
                return i;
            }
        }
        return -1;
    }

    private static BigInteger[] gcd(BigInteger[] a, BigInteger[] b, BigInteger p) {
        while (degree(b) >= 0) {
            BigInteger[] r = remainder(a, b, p);
            a = b;
            b = r;
        }
        return a;
    }

    private static BigInteger[] remainder(BigInteger[] a, BigInteger[] b, BigInteger p) {
        int db = degree(b);
        BigInteger inv = b[db].modInverse(p);
        BigInteger[] r = a.clone();
        for (int i = degree(r); i >= db; i = degree(r)) {
            BigInteger q = r[i].multiply(inv).mod(p);
            for (int j = 0; j <= db; j++) {
                r[i - db + j] = r[i - db + j].subtract(q.multiply(b[j])).mod(p);
            }
            if (i == 0) {
                break;
            }
        }
        return r;
    }
}
