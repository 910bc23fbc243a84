package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.Arrays;

/**
 * Counting real roots of rational polynomials exactly, and deciding "every root is real and lies in [lo, hi]" without
 * the coefficient swell of a Sturm sequence.
 *
 * <p><b>Exact counts</b>: Descartes' rule of signs with bisection (the Vincent–Collins–Akritas method: Collins and
 * Akritas, <i>Polynomial real root isolation using Descartes' rule of signs</i>, SYMSAC 1976; in the form of
 * Rouillier and Zimmermann, <i>Efficient isolation of polynomial's real roots</i>, J. Comput. Appl. Math. 162
 * (2004), §2). The squarefree integer polynomial g is moved to the unit interval by x = lo + (hi − lo)·y, so the
 * coefficients are balanced whatever the size of the interval; for a polynomial P on (0, 1) the number V of sign
 * changes of (1 + y)^n P(1/(1 + y)) bounds the number of roots in (0, 1) and has the same parity (Descartes); V = 0
 * or 1 is exact, otherwise (0, 1) is halved, P(y/2) and P((y + 1)/2) being integer polynomials again. For a squarefree
 * P the bisection ends (Vincent's theorem; Collins–Akritas, Theorem 1). Descartes' bound is subadditive under
 * bisection, so found + Σ V over the open subintervals bounds the count at every step: a decision that needs deg g
 * roots stops as soon as that bound falls short.
 *
 * <p><b>The decision "all roots real in [lo, hi]"</b> first looks for a certificate: d + 1 rational points lo = t_0 &lt;
 * t_1 &lt; … &lt; t_d = hi at which g (of degree d) has strictly alternating signs; by the intermediate value theorem g
 * then has d distinct roots in (lo, hi), which are all its roots. The points between the roots are proposed from
 * floating-point approximations of the roots (Aberth–Ehrlich iteration: Aberth, Math. Comp. 27 (1973)), but every
 * sign is evaluated exactly at a dyadic rational, so floating point only chooses where to look and never decides. When
 * no certificate is found (a root on an end, roots closer than double precision, non-real roots), the Descartes count
 * decides.
 *
 * <p>For the bound |α| ≤ √c with c not a square, the certificate uses a dyadic B ≤ √c (a few bits below) and the
 * interval [−B, B]; the exact fallback squares the roots (Graeffe: h(x²) = ±g(x)g(−x), whose roots are the α², real
 * and in [0, c] iff α is real with α² ≤ c) and counts the roots of h in [0, c].
 */
public final class RealRoots {
    private RealRoots() {}

    /**
     * @return the number of distinct real roots of {@code f}; 0 for a nonzero constant
     * @throws IllegalArgumentException if {@code f} is zero
     */
    public static int countDistinctRealRoots(QPoly f) {
        BigInteger[] g = squarefreeInteger(f);
        if (g.length <= 1) {
            return 0;
        }
        // Cauchy's bound: every root has |α| < 1 + max |g_i / g_d| <= 2^m
        int top = 0;
        for (BigInteger c : g) {
            top = Math.max(top, c.bitLength());
        }
        int m = top - ZPoly.lc(g).bitLength() + 2;
        Rational bound = Rational.of(BigInteger.ONE.shiftLeft(m));
        return descartesCount(g, bound.negate(), bound, 0);
    }

    /**
     * @return the number of distinct real roots of {@code f} in the closed interval {@code [lo,
     *     hi]} (roots exactly at an end count)
     * @throws IllegalArgumentException if {@code f} is zero or {@code lo > hi}
     */
    public static int countDistinctRootsIn(QPoly f, Rational lo, Rational hi) {
        if (lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("empty interval [" + lo + ", " + hi + "]");
        }
        BigInteger[] g = squarefreeInteger(f);
        if (g.length <= 1) {
            return 0;
        }
        return descartesCount(g, lo, hi, 0);
    }

    /**
     * @return whether every complex root of {@code f} is real and lies in {@code [lo, hi]}
     * @throws IllegalArgumentException if {@code f} is constant (or zero) or {@code lo > hi}
     */
    public static boolean allRootsRealIn(QPoly f, Rational lo, Rational hi) {
        if (f.degree() < 1) {
            throw new IllegalArgumentException("polynomial of degree >= 1 required, got " + f);
        }
        if (lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("empty interval [" + lo + ", " + hi + "]");
        }
        BigInteger[] g = squarefreeInteger(f);
        int d = g.length - 1;
        if (lo.compareTo(hi) < 0 && certified(g, lo, hi, scaleExponent(lo, hi))) {
            return true;
        }
        return descartesCount(g, lo, hi, d) == d;
    }

    /**
     * Decides whether every complex root {@code α} of {@code f} is real with {@code α^2 <= c}, i.e.
     * lies in {@code [-sqrt c, sqrt c]} — the shape of a Ramanujan–Petersson bound {@code |α| <= 2
     * p^((k-1)/2)}, checked as {@code α^2 <= 4 p^(k-1)}. A sign-alternation certificate on a dyadic [−B, B] ⊂ [−√c,
     * √c] when one is found, otherwise the Descartes count of the squared roots in [0, c] (see the class comment).
     *
     * @throws IllegalArgumentException if {@code f} is constant (or zero)
     */
    public static boolean allRootsRealWithSquareAtMost(QPoly f, Rational c) {
        if (f.degree() < 1) {
            throw new IllegalArgumentException("polynomial of degree >= 1 required, got " + f);
        }
        if (c.signum() < 0) {
            return false;
        }
        BigInteger[] g = squarefreeInteger(f);
        if (c.signum() == 0) {
            return g.length == 2 && g[0].signum() == 0;
        }
        // B = mb * 2^e <= √c with mb of about 60 bits: mb = floor(√(c / 4^e))
        int e = (c.num().bitLength() - c.den().bitLength()) / 2 - 60;
        BigInteger scaled = e >= 0 ? c.num().divide(c.den().shiftLeft(2 * e))
                : c.num().shiftLeft(-2 * e).divide(c.den());
        BigInteger mb = scaled.sqrt();
        if (mb.signum() > 0) {
            Rational b = dyadic(mb, e);
            if (certified(g, b.negate(), b, e + 60)) {
                return true;
            }
        }
        BigInteger[] h = ZPoly.primitiveOf(QPoly.of(toRationals(graeffe(g))).squarefreePart().coeffArray());
        int dh = h.length - 1;
        return descartesCount(h, Rational.ZERO, c, dh) == dh;
    }

    // ---------------------------------------------------------------------------------------------------------------
    // Descartes' rule with bisection

    /**
     * The number of distinct roots of the squarefree integer polynomial {@code g} in {@code [lo, hi]}; when the count
     * provably stays below {@code target}, some number below {@code target} (the search stops early).
     */
    static int descartesCount(BigInteger[] g, Rational lo, Rational hi, int target) {
        if (lo.equals(hi)) {
            return ZPoly.signAt(g, lo.num(), lo.den()) == 0 ? 1 : 0;
        }
        // x = (alpha + beta*y) / gamma maps [0, 1] onto [lo, hi]
        BigInteger gamma = lcm(lo.den(), hi.den());
        BigInteger alpha = lo.num().multiply(gamma.divide(lo.den()));
        BigInteger beta = hi.num().multiply(gamma.divide(hi.den())).subtract(alpha);
        BigInteger[] p = compose(g, alpha, beta, gamma);
        int found = 0;
        if (p[0].signum() == 0) { // a root at lo
            found++;
            p = Arrays.copyOfRange(p, 1, p.length);
        }
        if (sum(p).signum() == 0) { // a root at hi
            found++;
            p = divideByYMinusOne(p);
        }
        return found + countInUnitInterval(p, target - found);
    }

    /** Distinct roots in the open interval (0, 1) of a squarefree integer polynomial, with the early stop. */
    private static int countInUnitInterval(BigInteger[] p0, int target) {
        if (p0.length <= 1) {
            return 0;
        }
        ArrayDeque<BigInteger[]> todo = new ArrayDeque<>();
        ArrayDeque<Integer> bounds = new ArrayDeque<>();
        int v0 = descartesBound(p0);
        todo.push(p0);
        bounds.push(v0);
        int found = 0;
        int pending = v0;
        if (pending < target) {
            return pending;
        }
        while (!todo.isEmpty()) {
            BigInteger[] p = todo.pop();
            int v = bounds.pop();
            pending -= v;
            if (v <= 1) {
                found += v;
                continue;
            }
            int n = p.length - 1;
            BigInteger[] left = new BigInteger[n + 1]; // 2^n p(y/2)
            for (int i = 0; i <= n; i++) {
                left[i] = p[i].shiftLeft(n - i);
            }
            left = removePowerOfTwo(left);
            BigInteger[] right = left.clone(); // 2^n p((y + 1)/2)
            taylorShiftByOne(right);
            if (right[0].signum() == 0) { // a root at 1/2
                found++;
                right = Arrays.copyOfRange(right, 1, right.length);
                left = divideByYMinusOne(left);
            }
            int vl = descartesBound(left);
            int vr = descartesBound(right);
            pending += vl + vr;
            if (found + pending < target) {
                return found + pending;
            }
            if (vl > 0) {
                todo.push(left);
                bounds.push(vl);
            }
            if (vr > 0) {
                todo.push(right);
                bounds.push(vr);
            }
        }
        return found;
    }

    /** Sign changes of (1 + y)^n p(1/(1 + y)): Descartes' bound for the roots of p in (0, 1). */
    private static int descartesBound(BigInteger[] p) {
        int n = p.length - 1;
        if (n <= 0) {
            return 0;
        }
        BigInteger[] q = new BigInteger[n + 1];
        for (int i = 0; i <= n; i++) {
            q[i] = p[n - i];
        }
        taylorShiftByOne(q);
        int count = 0;
        int last = 0;
        for (BigInteger c : q) {
            int s = c.signum();
            if (s != 0) {
                if (last != 0 && s != last) {
                    count++;
                }
                last = s;
            }
        }
        return count;
    }

    /** In place: a(y) := a(y + 1), by the O(n²) additions of repeated synthetic division. */
    private static void taylorShiftByOne(BigInteger[] a) {
        int n = a.length - 1;
        for (int i = 0; i < n; i++) {
            for (int j = n - 1; j >= i; j--) {
                a[j] = a[j].add(a[j + 1]);
            }
        }
    }

    /** Exact quotient by y − 1 of a polynomial vanishing at 1 (synthetic division). */
    private static BigInteger[] divideByYMinusOne(BigInteger[] p) {
        int n = p.length - 1;
        BigInteger[] q = new BigInteger[n];
        BigInteger carry = BigInteger.ZERO;
        for (int k = n; k >= 1; k--) {
            carry = carry.add(p[k]);
            q[k - 1] = carry;
        }
        return q;
    }

    private static BigInteger[] removePowerOfTwo(BigInteger[] a) {
        int shift = Integer.MAX_VALUE;
        for (BigInteger c : a) {
            if (c.signum() != 0) {
                shift = Math.min(shift, c.getLowestSetBit());
            }
        }
        if (shift == 0 || shift == Integer.MAX_VALUE) {
            return a;
        }
        for (int i = 0; i < a.length; i++) {
            a[i] = a[i].shiftRight(shift);
        }
        return a;
    }

    /** γ^d g((α + βy)/γ) as an integer polynomial in y (homogeneous Horner scheme). */
    private static BigInteger[] compose(BigInteger[] g, BigInteger alpha, BigInteger beta, BigInteger gamma) {
        int d = g.length - 1;
        BigInteger[] r = new BigInteger[d + 1];
        Arrays.fill(r, BigInteger.ZERO);
        r[0] = g[d];
        BigInteger gp = BigInteger.ONE;
        for (int i = d - 1; i >= 0; i--) {
            int deg = d - 1 - i; // degree of r before this step
            gp = gp.multiply(gamma);
            for (int j = deg + 1; j >= 1; j--) { // r := r * (alpha + beta y)
                r[j] = r[j].multiply(alpha).add(r[j - 1].multiply(beta));
            }
            r[0] = r[0].multiply(alpha).add(g[i].multiply(gp));
        }
        return ZPoly.primitivePart(ZPoly.trim(r));
    }

    // ---------------------------------------------------------------------------------------------------------------
    // The sign-alternation certificate

    /**
     * Whether g has strictly alternating nonzero signs at lo, at d − 1 dyadic points proposed between the
     * approximate roots, and at hi (then its d roots are real, distinct and in (lo, hi)). {@code scale}: the roots of
     * interest have |x| of order 2^scale.
     */
    private static boolean certified(BigInteger[] g, Rational lo, Rational hi, int scale) {
        int d = g.length - 1;
        int sLo = ZPoly.signAt(g, lo.num(), lo.den());
        int sHi = ZPoly.signAt(g, hi.num(), hi.den());
        if (sLo == 0 || sHi == 0 || (d % 2 == 0) != (sLo == sHi)) {
            return false;
        }
        if (d == 1) {
            return true;
        }
        double[] roots = approximateRealRoots(g, scale);
        if (roots == null) {
            return false;
        }
        int e = scale - 60; // sample points m * 2^e, |m| < 2^62
        long prev = Long.MIN_VALUE;
        int expected = -sLo;
        for (int k = 0; k + 1 < d; k++) {
            double mid = (roots[k] + roots[k + 1]) / 2; // in units of 2^scale
            if (!(Math.abs(mid) < 4)) {
                return false;
            }
            long m = Math.round(Math.scalb(mid, 60));
            if (m <= prev) {
                return false;
            }
            prev = m;
            if (k == 0 && dyadic(BigInteger.valueOf(m), e).compareTo(lo) <= 0) {
                return false;
            }
            if (k == d - 2 && dyadic(BigInteger.valueOf(m), e).compareTo(hi) >= 0) {
                return false;
            }
            if (signAtDyadic(g, m, e) != expected) {
                return false;
            }
            expected = -expected;
        }
        return true;
    }

    /** The sign of g(m·2^e), from an integer multiple of it (Horner's scheme with shifts). */
    static int signAtDyadic(BigInteger[] g, long m, int e) {
        int d = g.length - 1;
        BigInteger bm = BigInteger.valueOf(m);
        BigInteger acc = g[d];
        if (e >= 0) { // sum g_i m^i 2^(e i)
            for (int i = d - 1; i >= 0; i--) {
                acc = acc.multiply(bm).shiftLeft(e).add(g[i]);
            }
        } else { // 2^(-e d) g(m / 2^-e) = sum g_i m^i 2^(-e (d - i))
            int s = -e;
            for (int i = d - 1; i >= 0; i--) {
                acc = acc.multiply(bm).add(g[i].shiftLeft(s * (d - i)));
            }
        }
        return acc.signum();
    }

    /**
     * Approximations of the roots of g(2^scale · z), sorted by real part, as real parts; {@code null} when the
     * iteration did not settle or a root is clearly not real (the certificate would fail). Aberth–Ehrlich iteration
     * in double precision, updated in place (Gauss–Seidel style).
     */
    private static double[] approximateRealRoots(BigInteger[] g, int scale) {
        int n = g.length - 1;
        double[] c = new double[n + 1];
        long[] exps = new long[n + 1];
        long top = Long.MIN_VALUE;
        for (int i = 0; i <= n; i++) {
            if (g[i].signum() == 0) {
                continue;
            }
            exps[i] = g[i].bitLength() + (long) scale * i;
            top = Math.max(top, exps[i]);
        }
        for (int i = 0; i <= n; i++) {
            if (g[i].signum() == 0) {
                c[i] = 0;
                continue;
            }
            int bl = g[i].bitLength();
            int cut = Math.max(bl - 62, 0);
            double mant = g[i].shiftRight(cut).doubleValue();
            long ex = cut + (long) scale * i - top;
            c[i] = ex < -1100 ? 0 : Math.scalb(mant, (int) ex);
        }
        if (c[n] == 0 || !Double.isFinite(c[n])) {
            return null;
        }
        // initial points on a circle of the Fujiwara radius around the centroid
        double centre = -c[n - 1] / (n * c[n]);
        double radius = 0;
        for (int i = 0; i < n; i++) {
            radius = Math.max(radius, Math.pow(Math.abs(c[i] / c[n]), 1.0 / (n - i)));
        }
        radius = Math.max(2 * radius, 1e-3);
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n + 0.4;
            re[k] = centre + radius * Math.cos(a);
            im[k] = radius * Math.sin(a);
        }
        double worst = Double.POSITIVE_INFINITY;
        int stalled = 0; // iterations without progress: rounding noise reached
        int it = 0;
        for (; it < 300 && worst >= 1e-13 && stalled < 4; it++) {
            double before = worst;
            worst = 0;
            for (int k = 0; k < n; k++) {
                double zr = re[k];
                double zi = im[k];
                double pr = c[n];
                double pi = 0;
                double dr = 0;
                double di = 0;
                for (int i = n - 1; i >= 0; i--) {
                    double tr = dr * zr - di * zi + pr; // p' := p' z + p
                    double ti = dr * zi + di * zr + pi;
                    dr = tr;
                    di = ti;
                    tr = pr * zr - pi * zi + c[i]; // p := p z + c_i
                    ti = pr * zi + pi * zr;
                    pr = tr;
                    pi = ti;
                }
                if (pr == 0 && pi == 0) {
                    continue;
                }
                double dd = dr * dr + di * di;
                if (dd == 0) {
                    return null;
                }
                double wr = (pr * dr + pi * di) / dd; // w = p / p'
                double wi = (pi * dr - pr * di) / dd;
                double sr = 0;
                double si = 0;
                for (int j = 0; j < n; j++) {
                    if (j != k) {
                        double ur = zr - re[j];
                        double ui = zi - im[j];
                        double uu = ur * ur + ui * ui;
                        if (uu == 0) {
                            return null;
                        }
                        sr += ur / uu;
                        si -= ui / uu;
                    }
                }
                double br = 1 - (wr * sr - wi * si); // 1 - w s
                double bi = -(wr * si + wi * sr);
                double bb = br * br + bi * bi;
                if (bb == 0) {
                    return null;
                }
                double cr = (wr * br + wi * bi) / bb; // correction w / (1 - w s)
                double ci = (wi * br - wr * bi) / bb;
                re[k] = zr - cr;
                im[k] = zi - ci;
                double size = Math.max(1, Math.hypot(re[k], im[k]));
                worst = Math.max(worst, Math.hypot(cr, ci) / size);
            }
            if (!Double.isFinite(worst)) {
                return null;
            }
            stalled = worst > before * 0.7 && worst < 1e-3 ? stalled + 1 : 0;
        }
        if (worst > 1e-3) {
            return null; // not settled: no proposal (the exact count decides)
        }
        for (int k = 0; k < n; k++) {
            if (Math.abs(im[k]) > 1e-2 * Math.max(1, Math.abs(re[k]))) {
                return null; // clearly not real: the exact count will say no
            }
        }
        Arrays.sort(re);
        return re;
    }

    /** The exponent s with max(|lo|, |hi|) of order 2^s. */
    private static int scaleExponent(Rational lo, Rational hi) {
        Rational m = lo.abs().compareTo(hi.abs()) >= 0 ? lo.abs() : hi.abs();
        if (m.signum() == 0) {
            return 0;
        }
        return m.num().bitLength() - m.den().bitLength();
    }

    // ---------------------------------------------------------------------------------------------------------------
    // helpers

    /** The primitive integer polynomial (positive leading coefficient) of the squarefree part of f. */
    private static BigInteger[] squarefreeInteger(QPoly f) {
        if (f.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has infinitely many roots");
        }
        return ZPoly.primitiveOf(f.squarefreePart().coeffArray());
    }

    /** h with h(x²) = (−1)^d g(x) g(−x): from g = g_e(x²) + x g_o(x²), h(y) = ±(g_e(y)² − y g_o(y)²). */
    static BigInteger[] graeffe(BigInteger[] g) {
        int d = g.length - 1;
        BigInteger[] even = new BigInteger[d / 2 + 1];
        BigInteger[] odd = new BigInteger[(d + 1) / 2];
        for (int i = 0; i <= d; i++) {
            if (i % 2 == 0) {
                even[i / 2] = g[i];
            } else {
                odd[i / 2] = g[i];
            }
        }
        BigInteger[] ee = ZPoly.multiply(ZPoly.trim(even), ZPoly.trim(even));
        BigInteger[] oo = ZPoly.multiply(ZPoly.trim(odd), ZPoly.trim(odd));
        BigInteger[] yoo = new BigInteger[oo.length + 1];
        yoo[0] = BigInteger.ZERO;
        System.arraycopy(oo, 0, yoo, 1, oo.length);
        BigInteger[] h = ZPoly.subtract(ee, ZPoly.trim(yoo));
        return d % 2 == 0 ? h : ZPoly.scale(h, BigInteger.ONE.negate());
    }

    private static Rational[] toRationals(BigInteger[] a) {
        Rational[] r = new Rational[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = Rational.of(a[i]);
        }
        return r;
    }

    private static Rational dyadic(BigInteger m, int e) {
        return e >= 0 ? Rational.of(m.shiftLeft(e)) : Rational.of(m, BigInteger.ONE.shiftLeft(-e));
    }

    private static BigInteger lcm(BigInteger a, BigInteger b) {
        return a.divide(a.gcd(b)).multiply(b);
    }

    private static BigInteger sum(BigInteger[] p) {
        BigInteger s = BigInteger.ZERO;
        for (BigInteger c : p) {
            s = s.add(c);
        }
        return s;
    }
}
