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
 * The Hecke relations satisfied by the coefficients of a normalised eigenform with trivial character
 * (Diamond–Shurman, Prop. 5.8.5; Miyake, Thm 4.5.16):
 * a_{mn} = a_m a_n for coprime m, n; a_{p^{r+1}} = a_p a_{p^r} − p^{k−1} a_{p^{r−1}} for p ∤ N; a_{p^r} = a_p^r for
 * p | N. Each relation is checked where every coefficient it involves is in the tables.
 */
public final class HeckeRelations implements FormCheck {

    public static final String ID = "hecke-relations";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_mn = a_m a_n for coprime m, n; the prime-power recursion at p ∤ N; a_{p^r} = a_p^r at p | N";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        Coefficients<E> a = data.coefficients();
        int max = a.maxIndex();
        if (max < 4) {
            return;
        }
        int[] spf = Arith.sharedSmallestPrimeFactors(max);
        Field<E> field = data.field();
        int level = data.form().level();
        for (int n : a.indices()) {
            int p = n < 4 ? n : Arith.smallestPrimeFactor(n, spf);
            if (p == n) {
                continue;
            }
            int m = n;
            while (m % p == 0) {
                m /= p;
            }
            E an = a.get(n);
            if (m > 1) {
                coprime(data, out, field, n, an, p, spf);
                continue;
            }
            // n = p^e with e ≥ 2
            int prev = n / p;
            E ap = a.get(p);
            E aPrev = a.get(prev);
            if (ap == null || aPrev == null) {
                continue;
            }
            E expected;
            String rule;
            if (level % p == 0) {
                expected = field.multiply(ap, aPrev);
                rule = "a_{p^r} = a_p^r for p | N (p=" + p + ")";
            } else {
                E aPrev2 = a.get(prev / p);
                if (aPrev2 == null) {
                    continue;
                }
                E pk1 = field.fromInteger(BigInteger.valueOf(p).pow(data.form().weight() - 1));
                boolean trivial = data.form().character().isTrivial();
                if (!trivial) {
                    pk1 = field.multiply(data.chi(p), pk1);
                }
                expected = field.subtract(field.multiply(ap, aPrev), field.multiply(pk1, aPrev2));
                rule = "a_{p^(r+1)} = a_p a_{p^r} - " + (trivial ? "" : "χ(p) ") + "p^(k-1) a_{p^(r-1)} for p ∤ N (p="
                        + p + ", r+1=" + Arith.valuation(n, p) + ")";
            }
            if (!expected.equals(an)) {
                out.error(ID, a.at(n), Subject.form(data.form().id(), "n=" + n), expected.toString(), an.toString(),
                        rule + " (Diamond–Shurman Prop. 5.8.5)");
            }
        }
    }

    /**
     * Checks a_n = a_{q^f} a_{n/q^f} for the first prime q | n (from the smallest, p) whose two parts are both
     * present.
     */
    private static <E> void coprime(FormData<E> data, FindingSink out, Field<E> field, int n, E an, int p,
                                    int[] spf) {
        Coefficients<E> a = data.coefficients();
        int rest = n;
        int q = p;
        while (rest > 1) {
            int qf = 1;
            while (rest % q == 0) {
                rest /= q;
                qf *= q;
            }
            int other = n / qf;
            E x = a.get(qf);
            E y = a.get(other);
            if (x != null && y != null) {
                E expected = field.multiply(x, y);
                if (!expected.equals(an)) {
                    out.error(ID, a.at(n), Subject.form(data.form().id(), "n=" + n), expected.toString(),
                            an.toString(), "a_mn = a_m a_n for coprime m=" + qf + ", n=" + other + ", a_" + qf + "="
                                    + x + ", a_" + other + "=" + y + " (Diamond–Shurman Prop. 5.8.5)");
                }
                return;
            }
            if (rest > 1) {
                q = Arith.smallestPrimeFactor(rest, spf);
            }
        }
    }
}
