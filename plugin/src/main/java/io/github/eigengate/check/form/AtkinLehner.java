package io.github.eigengate.check.form;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Subject;
import io.github.eigengate.check.Values;
import io.github.eigengate.data.AtkinLehnerSigns;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.FormData;
import java.math.BigInteger;
import java.util.Map;

/**
 * The {@code atkin_lehner} and {@code root_number} cells of a newform with trivial character agree with its
 * coefficients and with each other:
 * <ul>
 *   <li>a_q = −w_q q^{k/2−1} for every prime q ‖ N whose a_q is given (Atkin–Lehner 1970, Thm 3); at q² | N,
 *       a_q = 0 says nothing about w_q and nothing is compared;</li>
 *   <li>ε = (−1)^{k/2} ∏_{q | N} w_q: Λ(s) = N^{s/2}(2π)^{−s}Γ(s)L(f, s) satisfies Λ(s) = i^k w_N Λ(k − s) with
 *       w_N = ∏ w_q (Atkin–Lehner 1970, Thm 3 and §2).</li>
 * </ul>
 * Forms with a nontrivial character are not compared (W_q then maps f to another form); a note says so.
 */
public final class AtkinLehner implements FormCheck {

    public static final String ID = "atkin-lehner";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_q = -w_q q^(k/2-1) for q ‖ N; root number = (-1)^(k/2) ∏ w_q (trivial character)";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        AtkinLehnerSigns s = catalog.atkinLehner().get(data.form().id());
        if (s == null) {
            return;
        }
        String id = data.form().id();
        int level = data.form().level();
        int weight = data.form().weight();
        if (!data.form().character().isTrivial()) {
            out.note(ID, s.signsAt(), Subject.form(id), "not checked: the Atkin–Lehner signs are compared for the "
                    + "trivial character only");
            return;
        }
        Coefficients<E> a = data.coefficients();
        for (Map.Entry<Integer, Integer> e : s.signs().entrySet()) {
            int q = e.getKey();
            if ((level / q) % q == 0 || !a.has(q)) {
                continue;
            }
            BigInteger expected = BigInteger.valueOf(q).pow(weight / 2 - 1).multiply(BigInteger.valueOf(-e.getValue()));
            Object aq = a.get(q);
            Rational value = aq instanceof Rational r ? r : ((NumberField.Element) aq).isRational()
                    ? Values.trace(aq).divide(Rational.of(data.form().degree())) : null;
            if (value == null || !value.equals(Rational.of(expected))) {
                out.error(ID, a.at(q), Subject.form(id, "q=" + q), "a_" + q + " = " + expected,
                        "a_" + q + " = " + aq + " with w_" + q + " = " + sign(e.getValue()),
                        "for q ‖ N a newform has a_q = -w_q q^(k/2-1) (Atkin–Lehner 1970, Thm 3): the sign in "
                                + "atkin_lehner or a_" + q + " is wrong");
            }
        }
        if (s.rootNumber() != 0 && !s.signs().isEmpty()) {
            int product = (weight / 2) % 2 == 0 ? 1 : -1;
            for (int w : s.signs().values()) {
                product *= w;
            }
            if (product != s.rootNumber()) {
                out.error(ID, s.rootNumberAt(), Subject.form(id, "root_number"), sign(product),
                        sign(s.rootNumber()), "the root number is (-1)^(k/2) ∏_{q | N} w_q = " + sign(product)
                                + " for these signs (Atkin–Lehner 1970, Thm 3): root_number or a sign is wrong");
            }
        } else if (s.rootNumber() != 0 && level == 1) {
            int expected = (weight / 2) % 2 == 0 ? 1 : -1;
            if (expected != s.rootNumber()) {
                out.error(ID, s.rootNumberAt(), Subject.form(id, "root_number"), sign(expected),
                        sign(s.rootNumber()), "at level 1 the root number is (-1)^(k/2)");
            }
        }
    }

    private static String sign(int w) {
        return w > 0 ? "+1" : "-1";
    }
}
