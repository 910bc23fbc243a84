package io.github.eigengate.check.form;

import io.github.eigengate.arith.Field;
import io.github.eigengate.check.Diagnosis;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.FormData;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The Hecke relations satisfied by the coefficients of a normalised eigenform (Diamond–Shurman, Prop. 5.8.5;
 * Miyake, Thm 4.5.16): a_{mn} = a_m a_n for coprime m, n; a_{p^{r+1}} = a_p a_{p^r} − χ(p) p^{k−1} a_{p^{r−1}} for
 * p ∤ N; a_{p^r} = a_p^r for p | N. So a_{p^e} is determined by a_p (with χ(p) and p^{k−1}), and a_n by the a_p of
 * its primes.
 *
 * <p>Compared: every given a_{p^e} (e ≥ 2) with the value the recursion gives from the given a_p alone, whether or
 * not the powers in between are given; every given a_n with at least two prime factors with the product of its
 * prime-power parts, each part taken from a_p by the recursion when a_p is given, else the given a_{p^e}; when a
 * part is neither, a_n = a_{q^f} a_{n/q^f} for the first prime q | n with both factors given. Nothing else
 * (an a_{p^e} without a_p is not compared).
 *
 * <p>Diagnosis: when at least two failing relations involve one given coefficient, and one value of it satisfies
 * every relation it enters, that coefficient is named as the likely culprit with that value (and whether the value
 * found is a Galois conjugate of it); its failing relations follow as detail, the first {@link Diagnosis#LISTED}.
 * When most relations of a form fail without a culprit, one line says so.
 */
public final class HeckeRelations implements FormCheck {

    public static final String ID = "hecke-relations";

    private static final String REF = " (Diamond–Shurman Prop. 5.8.5)";

    /** More failing relations than this, and more than half of those compared, make one summary line. */
    private static final int MANY = 10;

    /** At most this many culprits are named per form. */
    private static final int CULPRITS = 5;

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_{p^e} from a_p by the recursion (χ(p) p^(k-1) at p ∤ N, a_p^e at p | N); a_n the product of its "
                + "prime-power parts";
    }

    @Override
    public <E> void check(FormData<E> data, Catalog catalog, FindingSink out) {
        Coefficients<E> a = data.coefficients();
        int max = a.maxIndex();
        if (max < 4) {
            return;
        }
        int[] spf = Arith.sharedSmallestPrimeFactors(max);
        Derivation<E> d = new Derivation<>(data, spf);
        Map<Integer, Relation<E>> failing = new LinkedHashMap<>();
        Map<Integer, List<Integer>> involving = new HashMap<>();
        int compared = 0;
        for (int n : a.indices()) {
            Relation<E> r = d.relation(n);
            if (r == null) {
                continue;
            }
            compared++;
            for (int c : r.involved.keySet()) {
                involving.computeIfAbsent(c, x -> new ArrayList<>()).add(n);
            }
            if (!r.expected.equals(a.get(n))) {
                failing.put(n, r);
            }
        }
        if (failing.isEmpty()) {
            return;
        }
        String id = data.form().id();
        for (int round = 0; round < CULPRITS && failing.size() >= 2; round++) {
            Culprit<E> c = culprit(d, failing, involving);
            if (c == null) {
                break;
            }
            List<Integer> explained = new ArrayList<>();
            for (int n : involving.get(c.index)) {
                if (failing.containsKey(n)) {
                    explained.add(n);
                }
            }
            out.error(ID, a.at(c.index), Subject.form(id, "n=" + c.index), c.value.toString(),
                    a.get(c.index).toString(), "likely culprit: " + explained.size() + " relations fail, all involve a_"
                            + c.index + " (n = " + Diagnosis.list(explained) + "); a_" + c.index + " = " + c.value
                            + " satisfies every relation it enters"
                            + Diagnosis.conjugateNote(c.value, a.get(c.index)));
            for (int i = 0; i < explained.size(); i++) {
                Relation<E> r = failing.remove(explained.get(i));
                if (i < Diagnosis.LISTED) {
                    report(out, a, id, explained.get(i), r);
                }
            }
        }
        if (failing.size() > MANY && 2 * failing.size() > compared) {
            List<Integer> ns = new ArrayList<>(failing.keySet());
            out.error(ID, data.form().location(), Subject.form(id), "the Hecke relations",
                    failing.size() + " of " + compared + " relations fail",
                    "most relations fail (n = " + Diagnosis.list(ns) + "), with no single coefficient to blame: the "
                            + "values are probably written in another basis or for another field polynomial, or "
                            + "belong to another form");
            return;
        }
        for (Map.Entry<Integer, Relation<E>> e : failing.entrySet()) {
            report(out, a, id, e.getKey(), e.getValue());
        }
    }

    private static <E> void report(FindingSink out, Coefficients<E> a, String id, int n, Relation<E> r) {
        out.error(ID, a.at(n), Subject.form(id, "n=" + n), r.expected.toString(), a.get(n).toString(),
                r.rule + REF + Diagnosis.conjugateNote(r.expected, a.get(n)));
    }

    /**
     * The given coefficient involved in the most failing relations (at least two), with a value that makes every
     * relation it enters hold: solved from a failing relation in which it enters linearly, then checked on all.
     */
    private static <E> Culprit<E> culprit(Derivation<E> d, Map<Integer, Relation<E>> failing,
                                          Map<Integer, List<Integer>> involving) {
        Map<Integer, Integer> counts = new HashMap<>();
        for (Relation<E> r : failing.values()) {
            for (int c : r.involved.keySet()) {
                counts.merge(c, 1, Integer::sum);
            }
        }
        List<Integer> order = new ArrayList<>(counts.keySet());
        order.removeIf(c -> counts.get(c) < 2);
        order.sort((x, y) -> counts.get(y).equals(counts.get(x)) ? Integer.compare(x, y)
                : Integer.compare(counts.get(y), counts.get(x)));
        Field<E> field = d.field;
        Coefficients<E> a = d.a;
        for (int c : order) {
            E candidate = null;
            for (Map.Entry<Integer, Relation<E>> e : failing.entrySet()) {
                E cofactor = e.getValue().involved.get(c);
                if (cofactor != null && !field.isZero(cofactor)) {
                    candidate = field.multiply(a.get(e.getKey()), field.inverse(cofactor));
                    break;
                }
            }
            if (candidate == null || candidate.equals(a.get(c))) {
                continue;
            }
            d.override(c, candidate);
            boolean all = true;
            for (int n : involving.get(c)) {
                Relation<E> r = d.relation(n);
                if (r != null && !r.expected.equals(a.get(n))) {
                    all = false;
                    break;
                }
            }
            d.override(c, null);
            if (all) {
                return new Culprit<>(c, candidate);
            }
        }
        return null;
    }

    private record Culprit<E>(int index, E value) {
    }

    /**
     * What a given a_n is compared with.
     *
     * @param involved the given coefficients the expectation is computed from, each with its cofactor when it
     *                 enters linearly (expected = a_c · cofactor), else {@code null}
     */
    private record Relation<E>(E expected, String rule, Map<Integer, E> involved) {
    }

    /** The values a_{p^e} derived from a_p, and the relation of each given a_n. */
    private static final class Derivation<E> {
        private final Coefficients<E> a;
        private final Field<E> field;
        private final int[] spf;
        private final int level;
        private final int weight;
        private final FormData<E> data;
        private final boolean trivial;
        private final Map<Integer, E> overrides = new HashMap<>();

        Derivation(FormData<E> data, int[] spf) {
            this.data = data;
            this.a = data.coefficients();
            this.field = data.field();
            this.spf = spf;
            this.level = data.form().level();
            this.weight = data.form().weight();
            this.trivial = data.form().character().isTrivial();
        }

        void override(int index, E value) {
            if (value == null) {
                overrides.remove(index);
            } else {
                overrides.put(index, value);
            }
        }

        private E given(int n) {
            E o = overrides.get(n);
            return o != null ? o : a.get(n);
        }

        /** a_{p^e} from a_p by the recursion; a_p must be given. */
        E power(int p, int e) {
            E ap = given(p);
            if (level % p == 0) {
                E r = field.one();
                for (int i = 0; i < e; i++) {
                    r = field.multiply(r, ap);
                }
                return r;
            }
            E pk1 = field.fromInteger(BigInteger.valueOf(p).pow(weight - 1));
            if (!trivial) {
                pk1 = field.multiply(data.chi(p), pk1);
            }
            E prev = field.one();
            E cur = ap;
            for (int i = 1; i < e; i++) {
                E next = field.subtract(field.multiply(ap, cur), field.multiply(pk1, prev));
                prev = cur;
                cur = next;
            }
            return cur;
        }

        private String recursionRule(int p, int e) {
            if (level % p == 0) {
                return "a_{p^r} = a_p^r for p | N (p=" + p + ", r=" + e + ", a_" + p + "=" + given(p) + ")";
            }
            return "a_{p^e} from a_p by a_{p^(r+1)} = a_p a_{p^r} - " + (trivial ? "" : "χ(p) ")
                    + "p^(k-1) a_{p^(r-1)} for p ∤ N (p=" + p + ", e=" + e + ", a_" + p + "=" + given(p) + ")";
        }

        /** The relation a given a_n is compared with, or {@code null} for n = 1, a prime, or nothing derivable. */
        Relation<E> relation(int n) {
            if (n < 4) {
                return null;
            }
            int p = Arith.smallestPrimeFactor(n, spf);
            if (p == n) {
                return null;
            }
            List<int[]> parts = new ArrayList<>();
            int rest = n;
            while (rest > 1) {
                int q = Arith.smallestPrimeFactor(rest, spf);
                int e = 0;
                int qe = 1;
                while (rest % q == 0) {
                    rest /= q;
                    e++;
                    qe *= q;
                }
                parts.add(new int[] {q, e, qe});
            }
            if (parts.size() == 1) {
                if (given(p) == null) {
                    return null;
                }
                Map<Integer, E> inv = new HashMap<>();
                inv.put(p, null);
                return new Relation<>(power(p, parts.get(0)[1]), recursionRule(p, parts.get(0)[1]), inv);
            }
            List<E> values = new ArrayList<>();
            List<Integer> from = new ArrayList<>();
            for (int[] part : parts) {
                if (given(part[0]) != null) {
                    values.add(part[1] == 1 ? given(part[0]) : power(part[0], part[1]));
                    from.add(part[0]);
                } else if (given(part[2]) != null) {
                    values.add(given(part[2]));
                    from.add(part[2]);
                } else {
                    return split(n, parts);
                }
            }
            E expected = field.one();
            for (E v : values) {
                expected = field.multiply(expected, v);
            }
            Map<Integer, E> inv = new LinkedHashMap<>();
            StringBuilder rule = new StringBuilder();
            for (int i = 0; i < parts.size(); i++) {
                int[] part = parts.get(i);
                E cofactor = field.one();
                for (int j = 0; j < values.size(); j++) {
                    if (j != i) {
                        cofactor = field.multiply(cofactor, values.get(j));
                    }
                }
                boolean linear = from.get(i) == part[2] || part[1] == 1;
                inv.put(from.get(i), linear ? cofactor : null);
                rule.append(", a_").append(part[2]).append('=').append(values.get(i));
                if (from.get(i) != part[2]) {
                    rule.append(" (from a_").append(part[0]).append(')');
                }
            }
            String head = parts.size() == 2
                    ? "a_mn = a_m a_n for coprime m=" + parts.get(0)[2] + ", n=" + parts.get(1)[2]
                    : "a_n = " + String.join(" ", parts.stream().map(x -> "a_" + x[2]).toList())
                            + " over the coprime prime-power parts of n";
            return new Relation<>(expected, head + rule, inv);
        }

        /** a_n = a_{q^f} a_{n/q^f} for the first prime q | n with both factors given. */
        private Relation<E> split(int n, List<int[]> parts) {
            for (int[] part : parts) {
                int other = n / part[2];
                E x = given(part[2]);
                E y = given(other);
                if (x != null && y != null) {
                    Map<Integer, E> inv = new HashMap<>();
                    inv.put(part[2], y);
                    inv.put(other, x);
                    return new Relation<>(field.multiply(x, y), "a_mn = a_m a_n for coprime m=" + part[2] + ", n="
                            + other + ", a_" + part[2] + "=" + x + ", a_" + other + "=" + y, inv);
                }
            }
            return null;
        }
    }
}
