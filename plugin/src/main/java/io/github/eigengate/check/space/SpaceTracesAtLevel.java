package io.github.eigengate.check.space;

import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.Diagnosis;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.spaces.NewSpaceTraces;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * For a declared (complete) space and n with (n, N) &gt; 1: Σ_f Tr_{K_f/Q}(a_n(f)) = Tr(T_n | S_k^new(Γ0(N))), T_n
 * containing U_q for q | N. The right side is the full-space trace formula minus the old-space part, derived from
 * the decomposition into B_d-images of newforms of lower level ({@link NewSpaceTraces}; checked against PARI/GP's
 * {@code mftraceform}). At n = q ‖ N this is Σ_f deg(f)·(−w_q(f)) q^{k/2−1}: it gates the Atkin–Lehner signs a
 * primes-only table carries in its a_q.
 *
 * <p>Compared: every n ≤ {@link Listing#CAP} not coprime to N given by every form of the space. Trivial character.
 * When the identity fails at a q ‖ N and flipping the sign of a_q in exactly one form mends it, that form is named.
 */
public final class SpaceTracesAtLevel implements Check {

    public static final String ID = "space-traces-at-level";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Σ_f Tr(a_n) = Tr T_n on S_k^new(Γ0(N)) for n not coprime to N (U_q, so the Atkin–Lehner signs)";
    }

    @Override
    public Pass start(Catalog catalog) {
        return new Listing(catalog, (n, level) -> Arith.gcd(n, level) > 1, true).pass(ID, SpaceTracesAtLevel::check);
    }

    private static void check(SpaceRow row, List<Listing.Entry> es, Listing listing, FindingSink out) {
        int level = row.space().level();
        int weight = row.space().weight();
        List<Integer> ns = new ArrayList<>();
        for (int n : es.get(0).values().keySet()) {
            if (Arith.gcd(n, level) > 1 && Listing.allGive(es, n)) {
                ns.add(n);
            }
        }
        if (ns.isEmpty()) {
            return;
        }
        NewSpaceTraces nt = NewSpaceTraces.of(weight, listing.table(ns.get(ns.size() - 1)));
        List<Integer> failing = new ArrayList<>();
        BigInteger firstExpected = null;
        Rational firstFound = null;
        for (int n : ns) {
            BigInteger expected = nt.newTrace(level, n);
            Rational found = Rational.ZERO;
            for (Listing.Entry e : es) {
                found = found.add(Listing.trace(e.a(n)));
            }
            if (!found.equals(Rational.of(expected))) {
                if (failing.isEmpty()) {
                    firstExpected = expected;
                    firstFound = found;
                }
                failing.add(n);
                if (Arith.isPrime(n) && (level / n) % n != 0) {
                    signFlip(row, es, n, expected, found, out);
                }
            }
        }
        if (failing.isEmpty()) {
            return;
        }
        int n = failing.get(0);
        out.error(ID, row.location(), Spaces.subject(row.space()).with("n=" + n), "Tr T_" + n + " = " + firstExpected,
                "sum of Tr(a_" + n + ") = " + firstFound, "the declared forms' traces differ from the new-space trace "
                        + "at n = " + Diagnosis.list(failing) + " of " + ns.size() + " compared with (n, N) > 1: an "
                        + "orbit is missing or listed twice, or a coefficient (for n = q ‖ N an Atkin–Lehner sign) is "
                        + "wrong");
    }

    /** Names the one form whose a_q, negated, makes Σ_f Tr(a_q) right (a_q = −w_q q^{k/2−1} for q ‖ N). */
    private static void signFlip(SpaceRow row, List<Listing.Entry> es, int q, BigInteger expected, Rational found,
                                 FindingSink out) {
        List<Listing.Entry> mend = new ArrayList<>();
        for (Listing.Entry e : es) {
            Rational t = Listing.trace(e.a(q));
            if (found.subtract(t.multiply(Rational.of(2))).equals(Rational.of(expected))) {
                mend.add(e);
            }
        }
        if (mend.size() != 1) {
            return;
        }
        Listing.Entry e = mend.get(0);
        // kept as Tr(a_q); a newform's a_q is rational for q ‖ N, so a_q = Tr(a_q)/deg
        Rational aq = Listing.trace(e.a(q)).divide(Rational.of(e.degree()));
        String negated = aq.negate().toString();
        out.error(ID, e.at().get(q), Subject.form(e.form().id(), "n=" + q), negated,
                aq.toString(), "likely culprit: a wrong Atkin–Lehner sign at q = " + q + " ‖ N; with a_" + q + " = "
                        + negated + " (w_" + q + " of the opposite sign, a_q = -w_q q^(k/2-1)) the trace of U_" + q
                        + " on " + row.space() + " is right, and no other single form's sign mends it");
    }
}
