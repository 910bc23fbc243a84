package io.github.eigengate.check.form;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.Field;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.RealRoots;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Subject;
import io.github.eigengate.check.Values;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.FormData;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;

/**
 * Coefficients at primes dividing the level of a newform with trivial character and weight k ≥ 2: if p ‖ N then
 * a_p = −λ_p p^{k/2−1} with λ_p = ±1 the Atkin–Lehner eigenvalue, so a_p² = p^{k−2}; if p² | N then a_p = 0
 * (Atkin–Lehner, Math. Ann. 185 (1970), Thm 3; Li, Math. Ann. 212 (1975), Thm 3; Miyake, Thm 4.6.17).
 *
 * <p>With a nontrivial character χ and any weight k ≥ 1, for p | N with N_p, c_p the p-parts of N and of cond(χ)
 * (W. Li 1975, Thm 3 (i)–(iii); Miyake Thm 4.6.17; Atkin–Li, Invent. Math. 48 (1978), Thm 3.1 — item numbers from
 * memory): if c_p = N_p then |a_p| = p^{(k−1)/2} in every embedding; if N_p = p and c_p = 1 then
 * a_p² = χ'(p)p^{k−2}, χ' the prime-to-p part of χ; otherwise a_p = 0. The first is decided exactly: a_p ≠ 0 and
 * every conjugate of β = a_p + p^{k−1}/a_p is real with β² ≤ 4p^{k−1} (then a_p is a root of x² − βx + p^{k−1},
 * whose roots have |·|² = p^{k−1}; conversely |α|² = q gives β = α + ᾱ = 2 Re α) — docs/checks.md.
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
        if (!data.form().character().isTrivial()) {
            checkWithCharacter(data, out);
            return;
        }
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

    /** Li's trichotomy at p | N for a form with a nontrivial character. */
    private static <E> void checkWithCharacter(FormData<E> data, FindingSink out) {
        int level = data.form().level();
        int k = data.form().weight();
        DirichletCharacter chi = data.form().character();
        Coefficients<E> a = data.coefficients();
        Field<E> field = data.field();
        for (long[] pe : Arith.factor(level)) {
            int p = (int) pe[0];
            E ap = a.get(p);
            if (ap == null) {
                continue;
            }
            long np = Arith.powExact(p, (int) pe[1]);
            int cp = chi.conductorPart(p);
            Subject subject = Subject.form(data.form().id(), "n=" + p);
            String where = "p=" + p + ", N=" + level + ", cond(χ)=" + chi.conductor();
            BigInteger q = BigInteger.valueOf(p).pow(k - 1); // p^{k−1}
            if (cp == np) {
                QPoly beta = null;
                boolean ok;
                if (ap instanceof Rational r) {
                    ok = r.multiply(r).equals(Rational.of(q));
                } else if (field.isZero(ap)) {
                    ok = false;
                } else {
                    E b = field.add(ap, field.multiply(field.fromInteger(q), field.inverse(ap)));
                    beta = Values.charPoly(b);
                    ok = RealRoots.allRootsRealWithSquareAtMost(beta, Rational.of(q.shiftLeft(2)));
                }
                if (!ok) {
                    out.error(ID, a.at(p), subject, "|a_p|^2 = p^(k-1) = " + q + " in every embedding",
                            ap + (beta == null ? "" : ", a_p + p^(k-1)/a_p with characteristic polynomial " + beta),
                            "|a_p| = p^((k-1)/2) when the p-part of cond(χ) is that of N (" + where
                                    + "; Li 1975, Thm 3(iii))");
                }
            } else if (np == p && cp == 1) {
                DirichletCharacter rest = chi.primeToPart(p);
                E restAtP = rest.value(p, field, zetaFor(rest, chi, data, field));
                // χ'(p) p^{k−2}, written as χ'(p) p^{k−1} / p so that k = 1 needs no negative power
                E expected = field.multiply(restAtP, field.multiply(field.fromInteger(q),
                        field.inverse(field.fromInteger(BigInteger.valueOf(p)))));
                E square = field.multiply(ap, ap);
                if (!square.equals(expected)) {
                    out.error(ID, a.at(p), subject, "a_p^2 = χ'(p)*p^(k-2) = " + expected, "a_p^2 = " + square,
                            "a_p^2 = χ'(p) p^(k-2), χ' the prime-to-p part of χ, when p exactly divides N but not"
                                    + " cond(χ) (" + where + "; Li 1975, Thm 3(i))");
                }
            } else if (!field.isZero(ap)) {
                out.error(ID, a.at(p), subject, "0", ap.toString(),
                        "a_p = 0 when p^2 divides N and the p-part of cond(χ) is smaller than that of N (" + where
                                + "; Li 1975, Thm 3(ii))");
            }
        }
    }

    /** The root of unity of order ord(χ') inside the field: zeta^(m/m'), m = ord(χ), m' = ord(χ'). */
    private static <E> E zetaFor(DirichletCharacter rest, DirichletCharacter chi, FormData<E> data, Field<E> field) {
        if (rest.order() <= 2) {
            return null;
        }
        E z = field.one();
        for (int i = 0; i < chi.order() / rest.order(); i++) {
            z = field.multiply(z, data.zeta());
        }
        return z;
    }
}
