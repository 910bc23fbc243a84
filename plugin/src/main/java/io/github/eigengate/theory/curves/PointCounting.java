package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;

/**
 * a_p = p + 1 − #E(F_p) for an elliptic curve with good reduction at a prime p < 2^31.
 *
 * <p>For p ≥ 5 the count is made on the short model y² = x³ − 27c4·x − 54c6 (isomorphic over F_p to the reduction
 * of any model with good reduction at p). Small p: the Legendre-symbol sum #E = p + 1 + Σ_x (f(x)/p) over a table
 * of squares. Large p: Shanks–Mestre baby-step giant-step (Cohen, GTM 138, Algorithm 7.4.12) on E and on its
 * quadratic twist E', using #E + #E' = 2p + 2: each point found fixes its exact order or pins #E down, and the
 * candidates for #E in the Hasse interval |a_p| ≤ 2√p that are compatible with every order seen on E and on E' are
 * intersected until one remains. Mestre's theorem (Schoof, <i>Counting points on elliptic curves over finite
 * fields</i>, J. Théor. Nombres Bordeaux 7 (1995), Thm. 3.2) guarantees that for p > 229 E or E' has a point whose
 * order has one multiple in the interval, so the loop ends; should it not end within a fixed number of points, the
 * Legendre sum decides. Every answer is proved: it is the only value the found orders allow.
 */
public final class PointCounting {

    /** Below this, the Legendre sum is cheaper than the baby-step giant-step search. */
    static final int SMALL = 1000;
    private static final int MAX_POINTS = 60;

    private PointCounting() {
    }

    /**
     * a_p of a model that has good reduction at p (p ∤ Δ of this model).
     *
     * @throws IllegalArgumentException when p divides the model's discriminant
     */
    public static long trace(WeierstrassModel e, long p) {
        BigInteger bp = BigInteger.valueOf(p);
        if (e.discriminant().mod(bp).signum() == 0) {
            throw new IllegalArgumentException("the model " + e + " is singular mod " + p);
        }
        if (p < 5) {
            return p + 1 - countGeneral(e, (int) p);
        }
        long a = BigInteger.valueOf(-27).multiply(e.c4()).mod(bp).longValue();
        long b = BigInteger.valueOf(-54).multiply(e.c6()).mod(bp).longValue();
        return traceShort(a, b, p);
    }

    /** Counts projective points of a general Weierstrass model over F_p by brute force (p = 2, 3). */
    private static long countGeneral(WeierstrassModel e, int p) {
        BigInteger bp = BigInteger.valueOf(p);
        long a1 = e.a1().mod(bp).longValue();
        long a2 = e.a2().mod(bp).longValue();
        long a3 = e.a3().mod(bp).longValue();
        long a4 = e.a4().mod(bp).longValue();
        long a6 = e.a6().mod(bp).longValue();
        long count = 1;
        for (long x = 0; x < p; x++) {
            for (long y = 0; y < p; y++) {
                long f = y * y + a1 * x * y + a3 * y - x * x * x - a2 * x * x - a4 * x - a6;
                if (Math.floorMod(f, p) == 0) {
                    count++;
                }
            }
        }
        return count;
    }

    /** a_p of y² = x³ + a·x + b over F_p, p ≥ 5 prime, 4a³ + 27b² ≢ 0, with 0 ≤ a, b < p. */
    public static long traceShort(long a, long b, long p) {
        if (p < SMALL) {
            return legendreSum(a, b, p);
        }
        return new Bsgs(a, b, p).trace();
    }

    /** −Σ_x (x³ + ax + b / p), from a table of squares. */
    static long legendreSum(long a, long b, long p) {
        int q = (int) p;
        byte[] chi = new byte[q];
        java.util.Arrays.fill(chi, (byte) -1);
        chi[0] = 0;
        for (long y = 1; y <= q / 2; y++) {
            chi[(int) (y * y % q)] = 1;
        }
        long sum = 0;
        for (long x = 0; x < q; x++) {
            long f = ((x * x % q + a) * x + b) % q;
            sum += chi[(int) f];
        }
        return -sum;
    }

    /**
     * Baby-step giant-step on y² = x³ + A·x + B and its twists, with long arithmetic (p < 2^31). Steps are taken in
     * Jacobian coordinates (x = X/Z², y = Y/Z³; Cohen, GTM 138, §7.2.1 and Algorithm 7.4.12), and each run of steps
     * is brought back to affine x with one inversion (Montgomery's simultaneous inversion, Cohen §10.3.4).
     */
    private static final class Bsgs {
        private final long a;
        private final long b;
        private final long p;
        private final double pinv;
        private final long bound;     // floor(2√p): |a_p| ≤ bound (Hasse)
        private final int m;          // baby steps 1..m
        private final int kmax;       // giant steps k = −kmax..kmax
        private final long[] tableX;  // open addressing on x
        private final int[] tableJ;
        private final int mask;
        private final long[] bx;
        private final long[] by;
        private final long[] bz;
        private final long[] gx;
        private final long[] gy;
        private final long[] gz;
        private final long[] prefix;
        // the current curve E_g: y² = x³ + ca·x + cb
        private long ca;
        // scratch Jacobian point
        private long jx;
        private long jy;
        private long jz;

        Bsgs(long a, long b, long p) {
            this.a = a;
            this.b = b;
            this.p = p;
            this.pinv = 1.0 / p;
            long s = isqrt(4 * p);
            this.bound = s;
            this.m = (int) Math.max(1, isqrt(s));
            long step = 2L * m + 1;
            this.kmax = (int) Math.max(0, (bound - m + step - 1) / step);
            int size = Integer.highestOneBit(4 * m + 3) << 1;
            this.tableX = new long[size];
            this.tableJ = new int[size];
            this.mask = size - 1;
            this.bx = new long[m + 1];
            this.by = new long[m + 1];
            this.bz = new long[m + 1];
            int g = 2 * kmax + 1;
            this.gx = new long[g];
            this.gy = new long[g];
            this.gz = new long[g];
            this.prefix = new long[Math.max(g, m + 1)];
        }

        long trace() {
            long lcmE = 1;   // divides #E
            long lcmT = 1;   // divides #E' = 2p + 2 − #E
            for (long x0 = 0, used = 0; x0 < p && used < MAX_POINTS; x0++) {
                long g = (mul(mul(x0, x0) + a, x0) + b) % p;
                if (g == 0) {
                    continue;
                }
                used++;
                boolean onE = Legendre.jacobi(g, p) == 1;
                // E_g ≅ E when g is a square, ≅ E' otherwise; it carries the point (g·x0, g²)
                long g2 = mul(g, g);
                ca = mul(a, g2);
                long[] res = search(mul(g, x0), g2);
                // res[0] = 1: the group order of E_g is res[1]; res[0] = 2: the order of the point is res[1]
                if (res[0] == 1) {
                    long n = res[1];
                    return onE ? p + 1 - n : n - p - 1;
                }
                if (onE) {
                    lcmE = lcm(lcmE, res[1]);
                } else {
                    lcmT = lcm(lcmT, res[1]);
                }
                long found = 0;
                int count = 0;
                for (long t = -bound; t <= bound && count < 2; t++) {
                    long n = p + 1 - t;
                    if (n % lcmE == 0 && (2 * p + 2 - n) % lcmT == 0) {
                        found = t;
                        count++;
                    }
                }
                if (count == 1) {
                    return found;
                }
            }
            return legendreSumLarge();
        }

        private long legendreSumLarge() {
            long sum = 0;
            for (long x = 0; x < p; x++) {
                sum += Legendre.jacobi((mul(mul(x, x) + a, x) + b) % p, p);
            }
            return -sum;
        }

        /**
         * BSGS for the point P = (px, py) on E_g over the Hasse interval of N = #E_g = p + 1 + c, |c| ≤ bound.
         * Returns {1, N} when N is the only multiple of ord(P) in the interval, {2, ord(P)} otherwise.
         */
        private long[] search(long px, long py) {
            // baby steps jP, j = 1..m, in Jacobian coordinates; Z = 0 is the point at infinity
            jx = px;
            jy = py;
            jz = 1;
            gx[0] = 0;
            for (int j = 1; j <= m; j++) {
                if (j > 1) {
                    addAffine(px, py);
                    if (jz == 0) {
                        return new long[] {2, j}; // jP = O and no smaller multiple is
                    }
                }
                bx[j] = jx;
                by[j] = jy;
                bz[j] = jz;
            }
            normalize(bx, by, bz, 1, m);
            java.util.Arrays.fill(tableJ, 0);
            for (int j = 1; j <= m; j++) {
                long x = bx[j];
                int slot = hash(x);
                while (tableJ[slot] != 0) {
                    if (tableX[slot] == x) {
                        // x(jP) = x(iP), i < j, with no multiple at O before: jP = −iP, ord(P) = i + j
                        return new long[] {2, tableJ[slot] + j};
                    }
                    slot = (slot + 1) & mask;
                }
                tableX[slot] = x;
                tableJ[slot] = j;
            }
            // no point of order ≤ 2m: every multiple of ord(P) in the interval is found exactly once below
            long step = 2L * m + 1;
            multiply(px, py, step);
            if (jz == 0) {
                return new long[] {2, step}; // ord(P) > 2m divides 2m + 1
            }
            long[] s = affine(jx, jy, jz);
            long sx = s[0];
            long sy = s[1];
            multiply(px, py, p + 1 - (long) kmax * step);
            int count = 2 * kmax + 1;
            for (int i = 0; i < count; i++) {
                if (i > 0) {
                    addAffine(sx, sy);
                }
                gx[i] = jx;
                gy[i] = jy;
                gz[i] = jz;
            }
            // the points at infinity keep Z = 0 and are skipped by the normalisation
            normalize(gx, gy, gz, 0, count - 1);
            long first = Long.MIN_VALUE;
            long second = Long.MIN_VALUE;
            for (int i = 0; i < count && second == Long.MIN_VALUE; i++) {
                long base = (long) (i - kmax) * step; // Q = (p + 1 + base)P
                long c = Long.MIN_VALUE;
                if (gz[i] == 0) {
                    c = base;
                } else {
                    int slot = hash(gx[i]);
                    while (tableJ[slot] != 0) {
                        if (tableX[slot] == gx[i]) {
                            int j = tableJ[slot];
                            // Q = jP: (p+1+base−j)P = O; Q = −jP: (p+1+base+j)P = O
                            c = by[j] == gy[i] ? base - j : base + j;
                            break;
                        }
                        slot = (slot + 1) & mask;
                    }
                }
                if (c != Long.MIN_VALUE && Math.abs(c) <= bound) {
                    if (first == Long.MIN_VALUE) {
                        first = c;
                    } else {
                        second = c;
                    }
                }
            }
            if (first == Long.MIN_VALUE) {
                throw new IllegalStateException("no multiple of the point's order in the Hasse interval mod " + p);
            }
            if (second == Long.MIN_VALUE) {
                return new long[] {1, p + 1 + first};
            }
            // all multiples of ord(P) in the interval come in increasing order: consecutive ones differ by it
            return new long[] {2, second - first};
        }

        private int hash(long x) {
            return (int) (x * 0x9E3779B97F4A7C15L >>> 40) & mask;
        }

        /** Replaces Jacobian (x[i], y[i], z[i]) by affine (x, y) for i in [from, to] with z ≠ 0; z is kept. */
        private void normalize(long[] x, long[] y, long[] z, int from, int to) {
            long acc = 1;
            for (int i = from; i <= to; i++) {
                prefix[i] = acc;
                if (z[i] != 0) {
                    acc = mul(acc, z[i]);
                }
            }
            long inv = inverse(acc);
            for (int i = to; i >= from; i--) {
                if (z[i] == 0) {
                    continue;
                }
                long zi = mul(inv, prefix[i]);   // 1/z[i]
                inv = mul(inv, z[i]);
                long zi2 = mul(zi, zi);
                x[i] = mul(x[i], zi2);
                y[i] = mul(y[i], mul(zi2, zi));
            }
        }

        private long[] affine(long x, long y, long z) {
            long zi = inverse(z);
            long zi2 = mul(zi, zi);
            return new long[] {mul(x, zi2), mul(y, mul(zi2, zi))};
        }

        /** (jx, jy, jz) = k·(x, y) by double and add. */
        private void multiply(long x, long y, long k) {
            jx = 1;
            jy = 1;
            jz = 0;
            for (int i = 63 - Long.numberOfLeadingZeros(k); i >= 0; i--) {
                doubleJ();
                if (((k >>> i) & 1) == 1) {
                    addAffine(x, y);
                }
            }
        }

        /** (jx, jy, jz) ← 2·(jx, jy, jz). */
        private void doubleJ() {
            if (jz == 0 || jy == 0) {
                jz = 0;
                return;
            }
            long yy = mul(jy, jy);
            long s = mul(dbl(dbl(jx)), yy);
            long zz = mul(jz, jz);
            long xx = mul(jx, jx);
            long mm = add(add(dbl(xx), xx), mul(ca, mul(zz, zz)));
            long x3 = sub(mul(mm, mm), dbl(s));
            long y4 = mul(yy, yy);
            long y3 = sub(mul(mm, sub(s, x3)), dbl(dbl(dbl(y4))));
            jz = mul(dbl(jy), jz);
            jx = x3;
            jy = y3;
        }

        /** (jx, jy, jz) ← (jx, jy, jz) + (x, y), the second point affine (mixed addition). */
        private void addAffine(long x, long y) {
            if (jz == 0) {
                jx = x;
                jy = y;
                jz = 1;
                return;
            }
            long z2 = mul(jz, jz);
            long u2 = mul(x, z2);
            long s2 = mul(y, mul(z2, jz));
            long h = sub(u2, jx);
            long r = sub(s2, jy);
            if (h == 0) {
                if (r == 0) {
                    doubleJ();
                } else {
                    jz = 0;
                }
                return;
            }
            long h2 = mul(h, h);
            long h3 = mul(h2, h);
            long v = mul(jx, h2);
            long x3 = sub(sub(mul(r, r), h3), dbl(v));
            long y3 = sub(mul(r, sub(v, x3)), mul(jy, h3));
            jz = mul(jz, h);
            jx = x3;
            jy = y3;
        }

        private long add(long x, long y) {
            long t = x + y;
            return t >= p ? t - p : t;
        }

        private long dbl(long x) {
            long t = x << 1;
            return t >= p ? t - p : t;
        }

        private long sub(long x, long y) {
            long t = x - y;
            return t < 0 ? t + p : t;
        }

        /** x·y mod p through a floating-point quotient estimate, corrected exactly (0 ≤ x, y < p < 2^31). */
        private long mul(long x, long y) {
            long q = (long) ((double) x * (double) y * pinv);
            long r = x * y - q * p;
            if (r < 0) {
                r += p;
            } else if (r >= p) {
                r -= p;
            }
            return r;
        }

        /** x^(-1) mod p by the extended Euclidean algorithm, 0 < x < p. */
        private long inverse(long x) {
            int r0 = (int) p;
            int r1 = (int) x;
            int t0 = 0;
            int t1 = 1;
            while (r1 != 0) {
                int q = r0 / r1;
                int r2 = r0 - q * r1;
                r0 = r1;
                r1 = r2;
                int t2 = t0 - q * t1;
                t0 = t1;
                t1 = t2;
            }
            return t0 < 0 ? t0 + p : t0;
        }
    }

    private static long lcm(long x, long y) {
        return x / gcd(x, y) * y;
    }

    private static long gcd(long x, long y) {
        while (y != 0) {
            long t = x % y;
            x = y;
            y = t;
        }
        return Math.abs(x);
    }

    /** floor(√n) for n ≥ 0. */
    static long isqrt(long n) {
        long r = (long) Math.sqrt((double) n);
        while (r * r > n) {
            r--;
        }
        while ((r + 1) * (r + 1) <= n) {
            r++;
        }
        return r;
    }
}
