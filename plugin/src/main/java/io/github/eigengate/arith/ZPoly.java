package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.Arrays;

/**
 * Package-private helpers for dense integer polynomials stored as {@code BigInteger[]} low to high
 * with no trailing zeros (the zero polynomial is the empty array).
 */
final class ZPoly {
    static final BigInteger[] ZERO = new BigInteger[0];

    private ZPoly() {}

    static BigInteger[] trim(BigInteger[] a) {
        int n = a.length;
        while (n > 0 && a[n - 1].signum() == 0) {
            n--;
        }
        return n == a.length ? a : Arrays.copyOf(a, n);
    }

    static int degree(BigInteger[] a) {
        return a.length - 1;
    }

    static BigInteger lc(BigInteger[] a) {
        return a[a.length - 1];
    }

    /** @return gcd of the coefficients (nonnegative; 0 for the zero polynomial) */
    static BigInteger content(BigInteger[] a) {
        BigInteger g = BigInteger.ZERO;
        for (BigInteger c : a) {
            g = g.gcd(c);
            if (g.equals(BigInteger.ONE)) {
                break;
            }
        }
        return g;
    }

    /** @return {@code a / content(a)} with positive leading coefficient */
    static BigInteger[] primitivePart(BigInteger[] a) {
        if (a.length == 0) {
            return a;
        }
        BigInteger g = content(a);
        if (lc(a).signum() < 0) {
            g = g.negate();
        }
        if (g.equals(BigInteger.ONE)) {
            return a;
        }
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k].divide(g);
        }
        return r;
    }

    /** Integer multiple of a rational polynomial: returns the primitive integer polynomial with positive lc. */
    static BigInteger[] primitiveOf(Rational[] c) {
        if (c.length == 0) {
            return ZERO;
        }
        BigInteger l = BigInteger.ONE;
        for (Rational r : c) {
            if (!r.isInteger()) {
                l = l.divide(l.gcd(r.den())).multiply(r.den());
            }
        }
        BigInteger[] a = new BigInteger[c.length];
        for (int k = 0; k < c.length; k++) {
            a[k] = c[k].num().multiply(l.divide(c[k].den()));
        }
        return primitivePart(a);
    }

    static BigInteger[] add(BigInteger[] a, BigInteger[] b) {
        if (a.length < b.length) {
            BigInteger[] t = a;
            a = b;
            b = t;
        }
        BigInteger[] r = a.clone();
        for (int k = 0; k < b.length; k++) {
            r[k] = r[k].add(b[k]);
        }
        return trim(r);
    }

    static BigInteger[] subtract(BigInteger[] a, BigInteger[] b) {
        int n = Math.max(a.length, b.length);
        BigInteger[] r = new BigInteger[n];
        for (int k = 0; k < n; k++) {
            BigInteger x = k < a.length ? a[k] : BigInteger.ZERO;
            BigInteger y = k < b.length ? b[k] : BigInteger.ZERO;
            r[k] = x.subtract(y);
        }
        return trim(r);
    }

    static BigInteger[] multiply(BigInteger[] a, BigInteger[] b) {
        if (a.length == 0 || b.length == 0) {
            return ZERO;
        }
        BigInteger[] r = new BigInteger[a.length + b.length - 1];
        Arrays.fill(r, BigInteger.ZERO);
        for (int i = 0; i < a.length; i++) {
            if (a[i].signum() == 0) {
                continue;
            }
            for (int j = 0; j < b.length; j++) {
                r[i + j] = r[i + j].add(a[i].multiply(b[j]));
            }
        }
        return r;
    }

    static BigInteger[] scale(BigInteger[] a, BigInteger c) {
        if (c.signum() == 0) {
            return ZERO;
        }
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k].multiply(c);
        }
        return r;
    }

    static BigInteger[] derivative(BigInteger[] a) {
        if (a.length <= 1) {
            return ZERO;
        }
        BigInteger[] r = new BigInteger[a.length - 1];
        for (int k = 1; k < a.length; k++) {
            r[k - 1] = a[k].multiply(BigInteger.valueOf(k));
        }
        return trim(r);
    }

    /**
     * Pseudo-remainder: {@code |lc(b)|^(deg a - deg b + 1) * a mod b}, computed over Z. The
     * multiplier is positive, so the sign of the remainder is that of the true remainder.
     */
    static BigInteger[] pseudoRemainder(BigInteger[] a, BigInteger[] b) {
        if (b.length == 0) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        BigInteger[] r = a.clone();
        int db = b.length - 1;
        BigInteger l = lc(b);
        BigInteger al = l.abs();
        int steps = 0;
        int rlen = r.length;
        while (rlen - 1 >= db) {
            BigInteger t = r[rlen - 1];
            int shift = rlen - 1 - db;
            // r <- |l| r - sign(l) t x^shift b
            for (int k = 0; k < rlen; k++) {
                r[k] = r[k].multiply(al);
            }
            BigInteger f = l.signum() > 0 ? t : t.negate();
            for (int k = 0; k <= db; k++) {
                r[k + shift] = r[k + shift].subtract(f.multiply(b[k]));
            }
            steps++;
            rlen--;
            while (rlen > 0 && r[rlen - 1].signum() == 0) {
                rlen--;
            }
        }
        int total = Math.max(a.length - b.length + 1, 0);
        BigInteger[] out = Arrays.copyOf(r, rlen);
        if (steps < total) {
            out = scale(out, al.pow(total - steps));
        }
        return trim(out);
    }

    /** @return the primitive gcd over Z (positive lc) of two integer polynomials, via the primitive PRS */
    static BigInteger[] gcd(BigInteger[] a, BigInteger[] b) {
        if (a.length == 0) {
            return primitivePart(b);
        }
        if (b.length == 0) {
            return primitivePart(a);
        }
        BigInteger[] u = primitivePart(a);
        BigInteger[] v = primitivePart(b);
        if (u.length > 1 && v.length > 1 && coprimeModular(u, v)) {
            return new BigInteger[] {BigInteger.ONE};
        }
        if (u.length < v.length) {
            BigInteger[] t = u;
            u = v;
            v = t;
        }
        while (v.length > 0) {
            BigInteger[] r = primitivePart(pseudoRemainder(u, v));
            u = v;
            v = r;
        }
        return primitivePart(u);
    }

    /** Primes just below 2^31 used for the modular coprimality test. */
    private static final long[] GCD_PRIMES = {2147483647L, 2147483629L, 2147483587L};

    /**
     * Sufficient test for {@code gcd(u, v) = 1} over Q: if {@code p} does not divide {@code lc(u)},
     * the reduction of the gcd over Z divides the gcd of the reductions, so {@code deg gcd(u, v) <=
     * deg gcd(u mod p, v mod p)}; a constant modular gcd proves coprimality. Avoids the coefficient
     * growth of the remainder sequence in the common coprime case (e.g. squarefree tests).
     */
    static boolean coprimeModular(BigInteger[] u, BigInteger[] v) {
        for (long p : GCD_PRIMES) {
            BigInteger bp = BigInteger.valueOf(p);
            if (lc(u).mod(bp).signum() == 0) {
                continue;
            }
            if (ZFactorization.fp(u, p).gcd(ZFactorization.fp(v, p)).degree() == 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * Exact division over Z.
     *
     * @return {@code a / b} if {@code b} divides {@code a} in Z[x], otherwise {@code null}
     */
    static BigInteger[] exactDivide(BigInteger[] a, BigInteger[] b) {
        if (b.length == 0) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        if (a.length == 0) {
            return ZERO;
        }
        if (a.length < b.length) {
            return null;
        }
        BigInteger[] r = a.clone();
        BigInteger l = lc(b);
        int db = b.length - 1;
        BigInteger[] q = new BigInteger[a.length - db];
        for (int k = a.length - 1; k >= db; k--) {
            BigInteger[] qr = r[k].divideAndRemainder(l);
            if (qr[1].signum() != 0) {
                return null;
            }
            BigInteger t = qr[0];
            q[k - db] = t;
            if (t.signum() != 0) {
                for (int j = 0; j <= db; j++) {
                    r[k - db + j] = r[k - db + j].subtract(t.multiply(b[j]));
                }
            }
        }
        for (int k = 0; k < db; k++) {
            if (r[k].signum() != 0) {
                return null;
            }
        }
        return trim(q);
    }

    /** Sign of {@code den^deg * a(num/den)} (den > 0), i.e. the sign of a at num/den. */
    static int signAt(BigInteger[] a, BigInteger num, BigInteger den) {
        if (a.length == 0) {
            return 0;
        }
        // Horner on the homogenised form: sum a_k num^k den^(n-k)
        BigInteger acc = a[a.length - 1];
        BigInteger dpow = BigInteger.ONE;
        boolean unitDen = den.equals(BigInteger.ONE);
        for (int k = a.length - 2; k >= 0; k--) {
            if (unitDen) {
                acc = acc.multiply(num).add(a[k]);
            } else {
                dpow = dpow.multiply(den);
                acc = acc.multiply(num).add(a[k].multiply(dpow));
            }
        }
        return acc.signum();
    }

    /** @return a copy of {@code a} with coefficients reduced to the symmetric range (-m/2, m/2] */
    static BigInteger[] symmetricMod(BigInteger[] a, BigInteger m) {
        BigInteger half = m.shiftRight(1);
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            BigInteger c = a[k].mod(m);
            if (c.compareTo(half) > 0) {
                c = c.subtract(m);
            }
            r[k] = c;
        }
        return trim(r);
    }

    static BigInteger[] mod(BigInteger[] a, BigInteger m) {
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k].mod(m);
        }
        return trim(r);
    }

    static BigInteger[] of(long... c) {
        BigInteger[] r = new BigInteger[c.length];
        for (int k = 0; k < c.length; k++) {
            r[k] = BigInteger.valueOf(c[k]);
        }
        return trim(r);
    }
}
