package io.github.eigengate.check.space;

import io.github.eigengate.arith.LinearSystem;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.Diagnosis;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.spaces.Dimensions;
import io.github.eigengate.theory.spaces.NewSpaceTraces;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * For a declared (complete) space and primes p ≠ q not dividing N: Σ_f Tr_{K_f/Q}(a_p(f) a_q(f)) = Tr(T_pq |
 * S_k^new(Γ0(N))). Since a_p a_q = a_pq for an eigenform, the left side is the trace of T_pq on the span of the
 * declared newforms; the right side is the trace formula ({@link NewSpaceTraces}). This is what a primes-only table
 * can be checked against: an a_p replaced by a Galois conjugate keeps its own trace but changes Tr(a_p a_q).
 *
 * <p>Compared: q among the first {@link #PARTNERS} primes ∤ N given by every form, p any other prime ∤ N given by
 * every form; and q any prime dividing N given by every form, with every such p (then pq is not coprime to N and
 * the new-space trace comes from the old-space decomposition of {@link NewSpaceTraces}; this pins a wrong a_q,
 * e.g. a wrong Atkin–Lehner sign, to one form). Always pq ≤ {@link Listing#CAP} and a_pq not given by every form
 * (where it is, {@code space-traces} compares it). Trivial character only (the trace formula's); with χ the
 * identity is the same.
 *
 * <p>Diagnosis: when a prime r enters every failing identity, for each form f the value y of a_r(f) that makes
 * every identity at r hold is solved for exactly (Tr(y a_s(f)) is linear in the coordinates of y) and checked on
 * Σ_f Tr(a_r²) = Tr T_{r²} + r^{k−1} dim; when exactly one form has such a y, that coefficient is named.
 */
public final class SpaceTraceProducts implements Check {

    public static final String ID = "space-trace-products";

    /** The partners q of every p. */
    static final int PARTNERS = 4;

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Σ_f Tr(a_p a_q) = Tr T_pq on S_k^new(Γ0(N)) for primes p ≠ q not dividing N (primes-only tables)";
    }

    @Override
    public Pass start(Catalog catalog) {
        return new Listing(catalog, (n, level) -> Arith.isPrime(n), false).pass(ID, SpaceTraceProducts::check);
    }

    /** Primes not dividing N whose a_p every form gives, increasing. */
    static List<Integer> commonPrimes(List<Listing.Entry> es, int level) {
        List<Integer> primes = new ArrayList<>();
        for (int n : es.get(0).values().keySet()) {
            if (level % n != 0 && Arith.isPrime(n) && Listing.allGive(es, n)) {
                primes.add(n);
            }
        }
        return primes;
    }

    private static void check(SpaceRow row, List<Listing.Entry> es, Listing listing, FindingSink out) {
        int level = row.space().level();
        int weight = row.space().weight();
        List<Integer> primes = commonPrimes(es, level);
        List<int[]> pairs = new ArrayList<>();
        int maxN = 1;
        for (int i = 0; i < Math.min(PARTNERS, primes.size()); i++) {
            int q = primes.get(i);
            for (int j = i + 1; j < primes.size(); j++) {
                int p = primes.get(j);
                if ((long) p * q <= Listing.CAP && !Listing.allGive(es, p * q)) {
                    pairs.add(new int[] {q, p});
                    maxN = Math.max(maxN, p * q);
                }
            }
        }
        // q | N: a_p a_q = a_pq still (coprime), and Tr T_pq on the new space is known for (pq, N) > 1 too
        for (int n : es.get(0).values().keySet()) {
            if (level % n == 0 && Listing.allGive(es, n)) {
                for (int p : primes) {
                    if ((long) p * n <= Listing.CAP && !Listing.allGive(es, p * n)) {
                        pairs.add(new int[] {Math.min(p, n), Math.max(p, n)});
                        maxN = Math.max(maxN, p * n);
                    }
                }
            }
        }
        if (pairs.isEmpty()) {
            return;
        }
        NewSpaceTraces nt = NewSpaceTraces.of(weight, listing.table(Math.max(maxN, square(primes))));
        List<int[]> failing = new ArrayList<>();
        BigInteger firstExpected = null;
        Rational firstFound = null;
        for (int[] pq : pairs) {
            BigInteger expected = nt.newTrace(level, (long) pq[0] * pq[1]);
            Rational found = sum(es, pq[0], pq[1], -1, null);
            if (!found.equals(Rational.of(expected))) {
                if (failing.isEmpty()) {
                    firstExpected = expected;
                    firstFound = found;
                }
                failing.add(pq);
            }
        }
        if (failing.isEmpty()) {
            return;
        }
        List<String> names = new ArrayList<>();
        for (int[] pq : failing) {
            names.add(pq[0] + "*" + pq[1]);
        }
        diagnose(row, es, pairs, failing, names, nt, out);
        int[] first = failing.get(0);
        out.error(ID, row.location(), Spaces.subject(row.space()).with("pq=" + first[0] + "*" + first[1]),
                "Tr T_" + (first[0] * first[1]) + " = " + firstExpected,
                "Σ Tr(a_" + first[0] + " a_" + first[1] + ") = " + firstFound,
                "Σ_f Tr(a_p a_q) = Tr T_pq fails at pq = " + Diagnosis.list(names) + " of " + pairs.size()
                        + " compared: an orbit is missing or listed twice, or an a_p is wrong");
    }

    /** Σ_f Tr(a_p(f) a_q(f)), with a_p of entry {@code replaced} taken as {@code value} when it is ≥ 0. */
    private static Rational sum(List<Listing.Entry> es, int p, int q, int replaced, Object value) {
        Rational s = Rational.ZERO;
        for (int i = 0; i < es.size(); i++) {
            Listing.Entry e = es.get(i);
            Object ap = i == replaced && value != null ? value : e.a(p);
            s = s.add(Listing.trace(Listing.multiply(ap, e.a(q))));
        }
        return s;
    }

    private static int square(List<Integer> primes) {
        int m = 1;
        for (int p : primes) {
            if ((long) p * p <= Listing.CAP) {
                m = Math.max(m, p * p);
            }
        }
        return m;
    }

    private static void diagnose(SpaceRow row, List<Listing.Entry> es, List<int[]> pairs, List<int[]> failing,
                                 List<String> names, NewSpaceTraces nt, FindingSink out) {
        int level = row.space().level();
        int weight = row.space().weight();
        List<Integer> shared = new ArrayList<>();
        for (int r : failing.get(0)) {
            boolean all = true;
            for (int[] pq : failing) {
                all &= pq[0] == r || pq[1] == r;
            }
            if (all) {
                shared.add(r);
            }
        }
        int found = 0;
        int cr = 0;
        int cf = 0;
        Object cy = null;
        for (int r : shared) {
            List<int[]> atR = new ArrayList<>();
            for (int[] pq : pairs) {
                if (pq[0] == r || pq[1] == r) {
                    atR.add(pq);
                }
            }
            for (int f = 0; f < es.size(); f++) {
                Object y = solve(es, f, r, atR, nt, level);
                if (y == null || y.equals(es.get(f).a(r))) {
                    continue;
                }
                if ((long) r * r <= Listing.CAP && level % r != 0) {
                    BigInteger expected = nt.newTrace(level, (long) r * r).add(BigInteger.valueOf(r).pow(weight - 1)
                            .multiply(BigInteger.valueOf(Dimensions.newforms(level, weight))));
                    Rational s = Rational.ZERO;
                    for (int i = 0; i < es.size(); i++) {
                        Object ar = i == f ? y : es.get(i).a(r);
                        s = s.add(Listing.trace(Listing.multiply(ar, ar)));
                    }
                    if (!s.equals(Rational.of(expected))) {
                        continue;
                    }
                }
                found++;
                cr = r;
                cf = f;
                cy = y;
            }
        }
        if (found != 1) {
            return;
        }
        Listing.Entry e = es.get(cf);
        out.error(ID, e.at().get(cr), Subject.form(e.form().id(), "n=" + cr), cy.toString(), e.a(cr).toString(),
                "likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq fails in space " + row.space() + " at pq = "
                        + Diagnosis.list(names) + ", all involving a_" + cr + "; a_" + cr + " = " + cy
                        + " in this form makes every identity at " + cr + " hold"
                        + ((long) cr * cr <= Listing.CAP && level % cr != 0 ? " (and Σ_f Tr(a_" + cr + "^2) too)" : "")
                        + Diagnosis.conjugateNote(cy, e.a(cr)));
    }

    /**
     * The unique y ∈ K_f with Σ_{g ≠ f} Tr(a_r(g) a_s(g)) + Tr(y a_s(f)) = Tr T_rs for every pair {r, s}, or null.
     */
    private static Object solve(List<Listing.Entry> es, int f, int r, List<int[]> atR, NewSpaceTraces nt,
                                int level) {
        Listing.Entry e = es.get(f);
        NumberField k = e.form().field();
        int d = e.degree();
        List<List<Rational>> rows = new ArrayList<>();
        List<Rational> rhs = new ArrayList<>();
        for (int[] pq : atR) {
            int s = pq[0] == r ? pq[1] : pq[0];
            Rational others = sum(es, r, s, -1, null).subtract(Listing.trace(Listing.multiply(e.a(r), e.a(s))));
            rhs.add(Rational.of(nt.newTrace(level, (long) r * s)).subtract(others));
            List<Rational> line = new ArrayList<>();
            for (int i = 0; i < d; i++) {
                Object basis = k == null ? Rational.ONE : k.generator().pow(i);
                line.add(Listing.trace(Listing.multiply(basis, e.a(s))));
            }
            rows.add(line);
        }
        List<Rational> y = LinearSystem.solveUnique(rows, rhs);
        if (y == null) {
            return null;
        }
        return k == null ? y.get(0) : k.element(y);
    }
}
