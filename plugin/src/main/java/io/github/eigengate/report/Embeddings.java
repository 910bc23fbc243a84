package io.github.eigengate.report;

import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.RealRoots;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * Real embeddings of a coefficient field Q[x]/(f), for plotting only: the real roots of f are isolated exactly with
 * Sturm sequences ({@link RealRoots}) and then narrowed by exact bisection; only the last step, the value shown, is a
 * double. No verdict depends on anything here.
 */
final class Embeddings {

    /** Bisection steps after isolation: the interval shrinks to 2^-STEPS of the root bound, far below a pixel. */
    private static final int STEPS = 48;

    private Embeddings() {
    }

    /** The distinct real roots of {@code f}, ascending, as doubles. */
    static double[] realRoots(QPoly f) {
        QPoly g = f.squarefreePart();
        if (g.degree() < 1) {
            return new double[0];
        }
        // Cauchy's bound: every root has |α| < 1 + max |a_i / a_d| (Basu–Pollack–Roy, §10.1)
        Rational max = Rational.ZERO;
        for (int i = 0; i < g.degree(); i++) {
            Rational q = g.coefficient(i).divide(g.leadingCoefficient()).abs();
            if (q.compareTo(max) > 0) {
                max = q;
            }
        }
        Rational bound = max.add(Rational.ONE).add(Rational.ONE);
        List<Rational> roots = new ArrayList<>();
        isolate(g, bound.negate(), bound, RealRoots.countDistinctRootsIn(g, bound.negate(), bound), roots);
        double[] out = new double[roots.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = toDouble(roots.get(i));
        }
        return out;
    }

    /** Roots in [lo, hi] (neither end a root), {@code n} of them, appended in ascending order. */
    private static void isolate(QPoly g, Rational lo, Rational hi, int n, List<Rational> roots) {
        if (n == 0) {
            return;
        }
        if (n == 1) {
            roots.add(narrow(g, lo, hi));
            return;
        }
        Rational mid = lo.add(hi).divide(Rational.of(2));
        Rational step = hi.subtract(lo).divide(Rational.of(1024));
        while (g.evaluate(mid).signum() == 0) {
            mid = mid.add(step);
        }
        int left = RealRoots.countDistinctRootsIn(g, lo, mid);
        isolate(g, lo, mid, left, roots);
        isolate(g, mid, hi, n - left, roots);
    }

    /** The one root of squarefree g in (lo, hi): g changes sign there, so bisect on the sign. */
    private static Rational narrow(QPoly g, Rational lo, Rational hi) {
        int sLo = g.evaluate(lo).signum();
        for (int i = 0; i < STEPS; i++) {
            Rational mid = lo.add(hi).divide(Rational.of(2));
            int s = g.evaluate(mid).signum();
            if (s == 0) {
                return mid;
            }
            if (s == sLo) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo.add(hi).divide(Rational.of(2));
    }

    static double toDouble(Rational q) {
        return new BigDecimal(q.num()).divide(new BigDecimal(q.den()), MathContext.DECIMAL64).doubleValue();
    }

    /** The value at {@code root} of the element written as a polynomial in the generator (Horner, in doubles). */
    static double evaluate(List<Rational> coordinates, double root) {
        double v = 0;
        for (int i = coordinates.size() - 1; i >= 0; i--) {
            v = v * root + toDouble(coordinates.get(i));
        }
        return v;
    }
}
