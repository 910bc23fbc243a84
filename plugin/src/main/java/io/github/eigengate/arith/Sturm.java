package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The reference decision for {@link RealRoots}: counting real roots of rational polynomials exactly with Sturm
 * sequences. Kept (package-private) so that tests can compare the Descartes method of {@link RealRoots} with an
 * independent exact method; its coefficients swell with the degree and the size of the interval.
 *
 * <p>For a squarefree polynomial {@code g} let {@code g_0 = g}, {@code g_1 = g'} and {@code g_{i+1}
 * = -rem(g_{i-1}, g_i)} until the remainder vanishes, and let {@code V(t)} be the number of sign
 * changes (zeros skipped) in {@code g_0(t), g_1(t), ...}. Sturm's theorem (Basu–Pollack–Roy,
 * <i>Algorithms in Real Algebraic Geometry</i>, §2.2) says that for {@code a < b} the
 * number of roots of {@code g} in the half-open interval {@code (a, b]} is {@code V(a) - V(b)}; this
 * holds also when {@code a} or {@code b} is a root, because at a root {@code c} the term {@code g_0(c)
 * = 0} is skipped while {@code g_0} and {@code g_1} have equal signs just right of {@code c}, so
 * {@code V(c) = V(c+)}. The closed interval adds 1 if {@code g(a) = 0}.
 * Each {@code g_i} is replaced by a positive multiple with integer coefficients (pseudo-remainders
 * with positive multipliers, then division by the positive content), which changes no sign.
 * Everything is evaluated exactly at rational points; nothing is decided in floating point.
 */
final class Sturm {
    private Sturm() {}

    /**
     * @return the number of distinct real roots of {@code f}; 0 for a nonzero constant
     * @throws IllegalArgumentException if {@code f} is zero
     */
    static int countDistinctRealRoots(QPoly f) {
        List<BigInteger[]> s = sturmSequence(f);
        return variationsAtInfinity(s, false) - variationsAtInfinity(s, true);
    }

    /**
     * @return the number of distinct real roots of {@code f} in the closed interval {@code [lo,
     *     hi]} (roots exactly at an end count)
     * @throws IllegalArgumentException if {@code f} is zero or {@code lo > hi}
     */
    static int countDistinctRootsIn(QPoly f, Rational lo, Rational hi) {
        if (lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("empty interval [" + lo + ", " + hi + "]");
        }
        List<BigInteger[]> s = sturmSequence(f);
        int atLo = ZPoly.signAt(s.get(0), lo.num(), lo.den()) == 0 ? 1 : 0;
        if (lo.equals(hi)) {
            return atLo;
        }
        return variations(s, lo) - variations(s, hi) + atLo;
    }

    /**
     * @return whether every complex root of {@code f} is real and lies in {@code [lo, hi]}
     * @throws IllegalArgumentException if {@code f} is constant (or zero) or {@code lo > hi}
     */
    static boolean allRootsRealIn(QPoly f, Rational lo, Rational hi) {
        if (f.degree() < 1) {
            throw new IllegalArgumentException("polynomial of degree >= 1 required, got " + f);
        }
        int distinct = f.squarefreePart().degree();
        return countDistinctRootsIn(f, lo, hi) == distinct;
    }

    /**
     * Decides whether every complex root {@code α} of {@code f} is real with {@code α^2 <= c}, i.e.
     * lies in {@code [-sqrt c, sqrt c]} — the shape of a Ramanujan–Petersson bound {@code |α| <= 2
     * p^((k-1)/2)}, checked as {@code α^2 <= 4 p^(k-1)}. One Sturm sequence of the squarefree part
     * g of f, evaluated exactly at the irrational ends ±√c: with c = u/v, v^d g(±√(uv)/v) = E ± O√(uv)
     * for integers E, O, whose sign is decided by comparing E² with uv·O². The answer is yes iff the
     * number of distinct roots of g in [−√c, √c] is deg g.
     *
     * @throws IllegalArgumentException if {@code f} is constant (or zero)
     */
    static boolean allRootsRealWithSquareAtMost(QPoly f, Rational c) {
        if (f.degree() < 1) {
            throw new IllegalArgumentException("polynomial of degree >= 1 required, got " + f);
        }
        if (c.signum() < 0) {
            return false;
        }
        List<BigInteger[]> s = sturmSequence(f);
        int distinct = s.get(0).length - 1;
        BigInteger big = c.num().multiply(c.den()); // √c = √big / den
        int rootAtLowerEnd = signAtSqrt(s.get(0), big, c.den(), -1) == 0 ? 1 : 0;
        if (big.signum() == 0) {
            return rootAtLowerEnd == distinct;
        }
        int inside = variationsAtSqrt(s, big, c.den(), -1) - variationsAtSqrt(s, big, c.den(), 1) + rootAtLowerEnd;
        return inside == distinct;
    }

    /** Sign changes of the sequence at σ√big/den, σ = ±1. */
    private static int variationsAtSqrt(List<BigInteger[]> s, BigInteger big, BigInteger den, int sigma) {
        int count = 0;
        int last = 0;
        for (BigInteger[] p : s) {
            int sg = signAtSqrt(p, big, den, sigma);
            if (sg != 0) {
                if (last != 0 && sg != last) {
                    count++;
                }
                last = sg;
            }
        }
        return count;
    }

    /** The sign of p(σ√big/den), from den^d p(σ√big/den) = E + σ·O·√big with integers E, O. */
    static int signAtSqrt(BigInteger[] p, BigInteger big, BigInteger den, int sigma) {
        int d = p.length - 1;
        if (d < 0) {
            return 0;
        }
        BigInteger e = BigInteger.ZERO;
        BigInteger o = BigInteger.ZERO;
        BigInteger bigPow = BigInteger.ONE; // big^(i/2), stepped every two i
        BigInteger[] denPow = new BigInteger[d + 1];
        denPow[0] = BigInteger.ONE;
        for (int i = 1; i <= d; i++) {
            denPow[i] = denPow[i - 1].multiply(den);
        }
        for (int i = 0; i <= d; i++) {
            BigInteger term = p[i].multiply(bigPow).multiply(denPow[d - i]);
            if (i % 2 == 0) {
                e = e.add(term);
            } else {
                o = o.add(term);
                bigPow = bigPow.multiply(big);
            }
        }
        int se = e.signum();
        int so = o.signum() * sigma;
        if (so == 0 || big.signum() == 0) {
            return se;
        }
        if (se == 0 || se == so) {
            return so == 0 ? se : (se == 0 ? so : se);
        }
        int cmp = e.multiply(e).compareTo(big.multiply(o).multiply(o));
        return cmp > 0 ? se : cmp < 0 ? so : 0;
    }

    /** The Sturm sequence of the squarefree part of {@code f}, as positive integer multiples. */
    static List<BigInteger[]> sturmSequence(QPoly f) {
        if (f.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has infinitely many roots");
        }
        BigInteger[] g = ZPoly.primitiveOf(f.squarefreePart().coeffArray());
        List<BigInteger[]> s = new ArrayList<>();
        s.add(g);
        BigInteger[] prev = g;
        BigInteger[] cur = positiveContentFree(ZPoly.derivative(g));
        while (cur.length > 0) {
            s.add(cur);
            BigInteger[] next = positiveContentFree(negate(ZPoly.pseudoRemainder(prev, cur)));
            prev = cur;
            cur = next;
        }
        return s;
    }

    private static BigInteger[] negate(BigInteger[] a) {
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k].negate();
        }
        return r;
    }

    private static BigInteger[] positiveContentFree(BigInteger[] a) {
        if (a.length == 0) {
            return a;
        }
        BigInteger g = ZPoly.content(a);
        if (g.equals(BigInteger.ONE)) {
            return a;
        }
        BigInteger[] r = new BigInteger[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k].divide(g);
        }
        return r;
    }

    private static int variations(List<BigInteger[]> s, Rational t) {
        int count = 0;
        int last = 0;
        for (BigInteger[] p : s) {
            int sg = ZPoly.signAt(p, t.num(), t.den());
            if (sg != 0) {
                if (last != 0 && sg != last) {
                    count++;
                }
                last = sg;
            }
        }
        return count;
    }

    private static int variationsAtInfinity(List<BigInteger[]> s, boolean plus) {
        int count = 0;
        int last = 0;
        for (BigInteger[] p : s) {
            int sg = ZPoly.lc(p).signum();
            if (!plus && (p.length - 1) % 2 == 1) {
                sg = -sg;
            }
            if (last != 0 && sg != last) {
                count++;
            }
            last = sg;
        }
        return count;
    }
}
