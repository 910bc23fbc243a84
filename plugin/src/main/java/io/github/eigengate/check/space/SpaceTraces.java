package io.github.eigengate.check.space;

import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.Work;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.check.Values;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.SpaceKey;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.spaces.HurwitzClassNumbers;
import io.github.eigengate.theory.spaces.TraceFormula;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * For a declared space, Σ_f Tr_{K_f/Q}(a_n(f)) over its forms equals Tr(T_n | S_k^new(Γ0(N))) for every n coprime
 * to N given by all of its forms. The right side comes from the Eichler–Selberg trace formula in Cohen's
 * formulation (H. Cohen, Sém. Théorie des Nombres de Bordeaux 1976–77, exp. 4), made new by inverting
 * Tr(T_n | S_k(N)) = Σ_{M | N} σ0(N/M) Tr(T_n | S_k^new(M)), valid for (n, N) = 1. The left side is the trace of T_n
 * on the span of the declared newforms, since the a_n(f) over the conjugates of f are the eigenvalues of T_n.
 *
 * <p>With a character χ the row stands for the Galois orbit of χ; the right side is Σ_{χ' ~ χ} Tr(T_n | S_k^new(N, χ'))
 * = Tr_{Q(χ)/Q} Tr(T_n | S_k^new(N, χ)) from the trace formula with nebentypus (Cohen's form), and the left side sums
 * over the forms whose character is conjugate to χ (each Galois orbit of newforms contains [K_f : Q(χ)] forms of each
 * χ'). Compared exactly for every n coprime to N given by all the forms; weight 1 has no trace formula (a note).
 */
public final class SpaceTraces implements Check {

    public static final String ID = "space-traces";

    /** Largest n whose trace is compared: the class-number table up to 4n + 4 then takes 5 MB and a fraction of a second. */
    static final long MAX_INDEX = 100_000;

    /** Differing n listed in a finding before the rest are only counted. */
    private static final int LISTED = 5;

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the traces of a_n over a declared space's forms equal Tr T_n on S_k^new(Γ0(N), χ) summed over the orbit "
                + "of χ, (n, N) = 1";
    }

    @Override
    public Pass start(Catalog catalog) {
        Map<SpaceKey, SpaceRow> declared = new HashMap<>();
        for (SpaceRow row : catalog.spaces()) {
            declared.put(row.space().orbit(), row);
        }
        Map<SpaceKey, Sums> sums = new HashMap<>();
        return new Pass() {
            @Override
            public void form(FormData<?> data, FindingSink out) {
                Form form = data.form();
                SpaceKey key = Spaces.orbitOf(form);
                if (key == null || !declared.containsKey(key)) {
                    return;
                }
                Sums s = sums.computeIfAbsent(key, k -> new Sums());
                s.add(data.coefficients(), form.level());
            }

            @Override
            public void finish(FindingSink out) {
                long maxN = 1;
                for (Sums s : sums.values()) {
                    maxN = Math.max(maxN, s.maxIndex());
                }
                HurwitzClassNumbers table = null;
                for (SpaceRow row : catalog.spaces()) {
                    Subject subject = Spaces.subject(row.space());
                    out.examined(ID, subject);
                    int forms = Spaces.formsOf(catalog, row.space()).size();
                    Sums s = sums.get(row.space().orbit());
                    if (forms == 0) {
                        continue; // space-dimension judges an empty listing
                    }
                    if (row.space().weight() == 1) {
                        out.note(ID, row.location(), subject, "traces of weight 1 not checkable: the trace formula "
                                + "needs k >= 2, so the coefficients are neither passed nor failed here");
                        continue;
                    }
                    List<Long> common = s == null ? List.of() : s.common(forms);
                    if (common.isEmpty()) {
                        out.warning(ID, row.location(), subject, "a_n for some n coprime to N in every form", "none",
                                "not checked: no index n coprime to the level is given by all forms of the space");
                        continue;
                    }
                    if (common.get(common.size() - 1) > MAX_INDEX) { // limit of docs/limits.md
                        out.warning(ID, row.location(), subject, "n ≤ " + MAX_INDEX, "n up to "
                                + common.get(common.size() - 1), "traces at n > " + MAX_INDEX + " are not compared "
                                + "(the class-number table the trace formula needs would not fit a build)");
                        common = common.stream().filter(n -> n <= MAX_INDEX).toList();
                        if (common.isEmpty()) {
                            continue;
                        }
                    }
                    if (table == null) {
                        table = HurwitzClassNumbers.upTo(4 * Math.min(maxN, MAX_INDEX) + 4);
                    }
                    compare(row, subject, s, common, TraceFormula.forCharacter(row.space().character(), table), out);
                }
            }
        };
    }

    private static void compare(SpaceRow row, Subject subject, Sums s, List<Long> common, TraceFormula formula,
                                FindingSink out) {
        int weight = row.space().weight();
        List<String> differing = new ArrayList<>();
        long first = 0;
        BigInteger firstExpected = null;
        Rational firstFound = null;
        for (long n : common) {
            // about 4√n class-number terms of k·log2(n) bits each (Cohen, GTM 138, §5.3); see Work
            Work.charge(Work.BIG * (1 + 4 * (long) Math.sqrt(n)) * (1 + weight * (64 - Long.numberOfLeadingZeros(n)) / 64));
            BigInteger expected = formula.newTrace(weight, n);
            Rational found = s.sum(n);
            if (!found.equals(Rational.of(expected))) {
                if (first == 0) {
                    first = n;
                    firstExpected = expected;
                    firstFound = found;
                }
                differing.add(Long.toString(n));
            }
        }
        if (first == 0) {
            return;
        }
        String more = differing.size() <= LISTED ? String.join(", ", differing)
                : String.join(", ", differing.subList(0, LISTED)) + " and " + (differing.size() - LISTED) + " more";
        String expected = row.space().character().isTrivial() ? "Tr T_" + first + " = " + firstExpected
                : "Tr_{Q(χ)/Q} Tr T_" + first + " = " + firstExpected;
        out.error(ID, row.location(), subject.with("n=" + first), expected,
                "sum of Tr(a_" + first + ") = " + firstFound,
                "the declared forms' traces differ from the trace formula at n = " + more + " of " + common.size()
                        + " compared: an orbit is missing, listed twice, or a coefficient is wrong");
    }

    /** Σ_f Tr(a_n(f)) and the number of forms giving a_n, for n coprime to the level. */
    private static final class Sums {
        private final TreeMap<Long, Rational> sum = new TreeMap<>();
        private final Map<Long, Integer> count = new HashMap<>();

        void add(Coefficients<?> a, int level) {
            for (int n : a.indices()) {
                if (Arith.gcd(n, level) != 1) {
                    continue;
                }
                sum.merge((long) n, Values.trace(a.get(n)), Rational::add);
                count.merge((long) n, 1, Integer::sum);
            }
        }

        long maxIndex() {
            return sum.isEmpty() ? 1 : sum.lastKey();
        }

        List<Long> common(int forms) {
            List<Long> out = new ArrayList<>();
            for (Map.Entry<Long, Integer> e : count.entrySet()) {
                if (e.getValue() == forms) {
                    out.add(e.getKey());
                }
            }
            out.sort(null);
            return out;
        }

        Rational sum(long n) {
            return sum.get(n);
        }
    }
}
