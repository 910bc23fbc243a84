package io.github.eigengate.check.form;

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
 * The Ramanujan–Petersson bound: for a newform of weight k and trivial character and a prime p ∤ N, every complex
 * embedding of a_p satisfies |a_p| ≤ 2 p^{(k−1)/2} (Deligne, <i>La conjecture de Weil I</i>, 1974, for k ≥ 2;
 * Deligne–Serre 1974 for k = 1).
 *
 * <p>Decided exactly: a_p is totally real (trivial character), so the bound holds in every embedding iff every root
 * α of the characteristic polynomial χ of a_p is real with α² ≤ 4p^{k−1}: a Sturm count of the distinct roots of χ
 * in [−2p^{(k−1)/2}, 2p^{(k−1)/2}], the irrational ends handled exactly ({@link RealRoots#allRootsRealWithSquareAtMost}).
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

    /** Whether every root α of χ is real with α² ≤ bound (one Sturm sequence, evaluated exactly at ±√bound). */
    static boolean withinBound(QPoly chi, BigInteger bound) {
        return RealRoots.allRootsRealWithSquareAtMost(chi, Rational.of(bound));
    }
}
