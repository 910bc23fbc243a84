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
import java.util.ArrayList;
import java.util.List;

/**
 * The Ramanujan–Petersson bound: for a newform of weight k and trivial character and a prime p ∤ N, every complex
 * embedding of a_p satisfies |a_p| ≤ 2 p^{(k−1)/2} (Deligne, <i>La conjecture de Weil I</i>, 1974, for k ≥ 2;
 * Deligne–Serre 1974 for k = 1).
 *
 * <p>Decided exactly: a_p is totally real (trivial character), so the bound holds in every embedding iff every root
 * α of the characteristic polynomial χ of a_p is real with α² ≤ 4p^{k−1}: a Sturm count of the distinct roots of χ
 * in [−2p^{(k−1)/2}, 2p^{(k−1)/2}], the irrational ends handled exactly ({@link RealRoots#allRootsRealWithSquareAtMost}).
 *
 * <p>With a nontrivial character χ: b = χ̄(p)·a_p² must have every conjugate real in [0, 4p^{k−1}] (the roots of its
 * characteristic polynomial, {@link RealRoots#allRootsRealIn}). For an embedding σ, |σ(b)| = |σ(a_p)|², and σ(b) is
 * real and ≥ 0 iff conj σ(a_p) = σ(χ̄(p))·σ(a_p); so the test is equivalent to the bound together with the adjoint
 * relation ā_p = χ̄(p)a_p (Shimura, <i>Introduction to the Arithmetic Theory of Automorphic Functions</i>, Thm 3.52,
 * from memory), which a newform satisfies in every embedding (docs/checks.md proves it). Weight 1: |a_p| ≤ 2
 * (Deligne–Serre 1974), the same test with 4p^0 = 4.
 */
public final class RamanujanBound implements FormCheck {

    public static final String ID = "ramanujan-bound";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "|a_p| ≤ 2 p^((k-1)/2) in every complex embedding, for primes p ∤ N";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        if (!data.form().character().isTrivial()) {
            checkWithCharacter(data, out);
            return;
        }
        Coefficients<E> a = data.coefficients();
        int level = data.form().level();
        int k = data.form().weight();
        int[] spf = Arith.sharedSmallestPrimeFactors(a.maxIndex());
        for (int p : a.indices()) {
            if (p < 2 || Arith.smallestPrimeFactor(p, spf) != p || level % p == 0) {
                continue;
            }
            E ap = a.get(p);
            BigInteger bound = BigInteger.valueOf(p).pow(k - 1).shiftLeft(2); // 4 p^{k-1}
            if (ap instanceof Rational r) {
                if (!r.isInteger()) {
                    continue; // not an algebraic integer: reported by field-sanity
                }
                BigInteger sq = r.num().multiply(r.num());
                if (sq.compareTo(bound) > 0) {
                    out.error(ID, a.at(p), Subject.form(data.form().id(), "n=" + p), "a_p^2 <= 4*p^(k-1) = " + bound,
                            "a_p^2 = " + sq, "Deligne's bound |a_p| <= 2 p^((k-1)/2) fails at p=" + p);
                }
                continue;
            }
            if (!withinBound(Values.charPoly(ap), bound)) {
                out.error(ID, a.at(p), Subject.form(data.form().id(), "n=" + p),
                        "every embedding with |a_p|^2 <= 4*p^(k-1) = " + bound,
                        ap + " with characteristic polynomial " + Values.charPoly(ap),
                        "Deligne's bound |a_p| <= 2 p^((k-1)/2) fails in some complex embedding at p=" + p
                                + " (or a_p is not totally real)");
            }
        }
    }

    /** The test on b = χ̄(p)·a_p²: every conjugate real in [0, 4p^{k−1}]. */
    private static <E> void checkWithCharacter(FormData<E> data, FindingSink out) {
        Coefficients<E> a = data.coefficients();
        Field<E> field = data.field();
        int level = data.form().level();
        int k = data.form().weight();
        int[] spf = Arith.sharedSmallestPrimeFactors(a.maxIndex());
        DirichletCharacter character = data.form().character();
        List<E> zetaPowers = powers(data.zeta(), character.order(), field);
        for (int p : a.indices()) {
            if (p < 2 || Arith.smallestPrimeFactor(p, spf) != p || level % p == 0) {
                continue;
            }
            E ap = a.get(p);
            BigInteger bound = BigInteger.valueOf(p).pow(k - 1).shiftLeft(2); // 4 p^{k-1}
            int e = character.exponent(p);
            int m = character.order();
            E chi = zetaPowers.get(e);
            E b = field.multiply(zetaPowers.get((m - e) % m), field.multiply(ap, ap)); // χ̄(p) = ζ^{m−e}
            Subject subject = Subject.form(data.form().id(), "n=" + p);
            String expected = "every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, " + bound + "]";
            String bad;
            if (b instanceof Rational r) {
                if (r.signum() >= 0 && r.compareTo(Rational.of(bound)) <= 0) {
                    continue;
                }
                bad = r.signum() < 0 ? "negative" : "large";
                out.error(ID, a.at(p), subject, expected, "a_p = " + ap + ", χ(p) = " + chi
                        + ", χ̄(p)*a_p^2 = " + r, reason(bad, k, p));
                continue;
            }
            QPoly poly = Values.charPoly(b);
            if (withinBoundWithCharacter(poly, bound)) {
                continue;
            }
            bad = RealRoots.allRootsRealIn(poly, Rational.ZERO, rootBound(poly)) ? "large" : "not real";
            out.error(ID, a.at(p), subject, expected, "a_p = " + ap + ", χ(p) = " + chi
                    + ", χ̄(p)*a_p^2 with characteristic polynomial " + poly, reason(bad, k, p));
        }
    }

    /** Whether every root of the characteristic polynomial of χ̄(p)a_p² is real in [0, bound] (one Sturm count). */
    static boolean withinBoundWithCharacter(QPoly charPolyOfB, BigInteger bound) {
        return RealRoots.allRootsRealIn(charPolyOfB, Rational.ZERO, Rational.of(bound));
    }

    /** ζ^0, …, ζ^{m−1} (for m ≤ 2: 1, −1), so that χ(p) and χ̄(p) are looked up, not inverted. */
    private static <E> List<E> powers(E zeta, int m, Field<E> field) {
        List<E> out = new ArrayList<>(m);
        E z = m <= 2 ? field.negate(field.one()) : zeta;
        E x = field.one();
        for (int i = 0; i < m; i++) {
            out.add(x);
            x = field.multiply(x, z);
        }
        return out;
    }

    private static String reason(String bad, int k, int p) {
        if (bad.equals("large")) {
            return (k == 1 ? "the Deligne–Serre bound |a_p| <= 2" : "Deligne's bound |a_p| <= 2 p^((k-1)/2)")
                    + " fails in some complex embedding at p=" + p;
        }
        return "χ̄(p)*a_p^2 is not real and >= 0 in every embedding, so conj(a_p) = χ̄(p)*a_p fails at p="
                + p + " (is a_p replaced by its complex conjugate, or χ(p) wrong?)";
    }

    /** 1 + max |c_i| for a monic polynomial: every complex root has absolute value below it (Cauchy). */
    private static Rational rootBound(QPoly f) {
        Rational m = Rational.ZERO;
        for (Rational c : f.coefficients()) {
            Rational abs = c.signum() < 0 ? c.negate() : c;
            if (abs.compareTo(m) > 0) {
                m = abs;
            }
        }
        return m.add(Rational.ONE);
    }

    /** Whether every root α of χ is real with α² ≤ bound (one Sturm sequence, evaluated exactly at ±√bound). */
    static boolean withinBound(QPoly chi, BigInteger bound) {
        return RealRoots.allRootsRealWithSquareAtMost(chi, Rational.of(bound));
    }
}
