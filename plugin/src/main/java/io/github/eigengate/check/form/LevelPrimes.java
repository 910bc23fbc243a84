package io.github.eigengate.check.form;

import io.github.eigengate.arith.Field;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.FormData;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;

/**
 * Coefficients at primes dividing the level of a newform with trivial character and weight k ≥ 2: if p ‖ N then
 * a_p = −λ_p p^{k/2−1} with λ_p = ±1 the Atkin–Lehner eigenvalue, so a_p² = p^{k−2}; if p² | N then a_p = 0
 * (Atkin–Lehner, Math. Ann. 185 (1970), Thm 3; Li, Math. Ann. 212 (1975), Thm 3; Miyake, Thm 4.6.17).
 */
public final class LevelPrimes implements FormCheck {

    public static final String ID = "level-primes";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_p^2 = p^(k-2) when p || N, a_p = 0 when p^2 | N (trivial character, k >= 2)";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        int level = data.form().level();
        int k = data.form().weight();
        if (k < 2 || level == 1) {
            return;
        }
        Coefficients<E> a = data.coefficients();
        Field<E> field = data.field();
        for (long[] pe : Arith.factor(level)) {
            long p = pe[0];
            long e = pe[1];
            E ap = a.get(p);
            if (ap == null) {
                continue;
            }
            Subject subject = Subject.form(data.form().id(), "n=" + p);
            if (e >= 2) {
                if (!field.isZero(ap)) {
                    out.error(ID, a.at(p), subject, "0", ap.toString(),
                            "a_p = 0 when p^2 divides the level (p=" + p + ", N=" + level + "; Li 1975, Thm 3)");
                }
            } else {
                E square = field.multiply(ap, ap);
                E expected = field.fromInteger(BigInteger.valueOf(p).pow(k - 2));
                if (!square.equals(expected)) {
                    out.error(ID, a.at(p), subject, "a_p^2 = p^(k-2) = " + expected, "a_p^2 = " + square,
                            "a_p = ±p^(k/2-1) when p exactly divides the level (p=" + p + ", N=" + level
                                    + "; Atkin–Lehner 1970, Thm 3)");
                }
            }
        }
    }
}
