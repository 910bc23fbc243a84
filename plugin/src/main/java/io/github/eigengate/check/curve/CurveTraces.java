package io.github.eigengate.check.curve;

import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.CurveRow;
import io.github.eigengate.data.FormData;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.curves.Traces;
import io.github.eigengate.theory.curves.Twists;
import java.util.Arrays;
import java.util.List;

/**
 * For every prime p in the form's table, a_p(form) = a_p(E): p + 1 − #E(F_p) at good p, +1, −1, 0 at split
 * multiplicative, non-split multiplicative and additive p. Modularity (Breuil–Conrad–Diamond–Taylor 2001) and
 * Eichler–Shimura: L(E, s) = L(f, s), Euler factor by Euler factor (Diamond–Shurman, Thm. 8.8.1 and §8.8).
 */
public final class CurveTraces implements Check {

    public static final String ID = "curve-traces";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_p of each curve equals a_p of its form at every prime p of the table";
    }

    @Override
    public Pass start(Catalog catalog) {
        return new Pass() {
            @Override
            public void form(FormData<?> form, FindingSink out) {
                List<CurveRow> curves = catalog.curvesOf(form.form().id());
                if (curves.isEmpty()) {
                    return;
                }
                Coefficients<?> c = form.coefficients();
                int[] primes = primesIn(c);
                if (primes.length == 0) {
                    for (CurveRow row : curves) {
                        out.examined(ID, Subject.form(row.form()));
                        out.warning(ID, row.curveAt(), Subject.form(row.form()), "a_p for some prime p",
                                "no a_p in the tables", "the curve's a_p cannot be compared: the form has no "
                                        + "coefficient at a prime (not checked)");
                    }
                    return;
                }
                long[] values = new long[primes.length];
                for (int i = 0; i < primes.length; i++) {
                    Object v = c.get(primes[i]);
                    if (!(v instanceof Rational r) || !r.isInteger() || r.num().bitLength() > 62) {
                        out.examined(ID, Subject.form(form.form().id()));
                        out.error(ID, c.at(primes[i]), Subject.form(form.form().id(), "p=" + primes[i]),
                                "an integer", String.valueOf(v),
                                "the form has a curve, so its a_p are the integers a_p(E)");
                        return;
                    }
                    values[i] = r.num().longValue();
                }
                for (CurveRow row : curves) {
                    out.examined(ID, Subject.form(row.form()));
                    check(form, row, primes, values, out);
                }
            }
        };
    }

    private static void check(FormData<?> form, CurveRow row, int[] primes, long[] table, FindingSink out) {
        long[] curve = Traces.of(row.model(), primes);
        int first = -1;
        int count = 0;
        for (int i = 0; i < primes.length; i++) {
            if (curve[i] != table[i]) {
                count++;
                if (first < 0) {
                    first = i;
                }
            }
        }
        if (first < 0) {
            return;
        }
        int p = primes[first];
        String reason = "a_p of the curve " + row.model() + " must equal a_p of the form (modularity); they differ at "
                + count + " of the " + primes.length + " primes p ≤ " + primes[primes.length - 1]
                + " of the table";
        long d = Twists.discriminant(primes, table, curve, form.form().level(), 1);
        if (d != 0) {
            reason += "; the curve looks like the twist by " + d
                    + " of the form's curve (a_p(form) = (" + d + "/p)·a_p(E) at every prime of the table)";
        }
        out.error(ID, row.curveAt(), Subject.form(row.form(), "p=" + p),
                "a_" + p + " = " + table[first] + " (" + form.coefficients().at(p) + ")",
                "a_" + p + " = " + curve[first] + " (the curve)", reason);
    }

    private static int[] primesIn(Coefficients<?> c) {
        int[] indices = c.indices();
        int max = c.maxIndex();
        int[] spf = Arith.sharedSmallestPrimeFactors(max);
        return Arrays.stream(indices).filter(n -> n >= 2 && Arith.smallestPrimeFactor(n, spf) == n).toArray();
    }
}
