package io.github.eigengate.check.space;

import io.github.eigengate.arith.Rational;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.Diagnosis;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.SpaceRow;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.spaces.Dimensions;
import io.github.eigengate.theory.spaces.NewSpaceTraces;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * For a declared (complete) space and a prime p ∤ N: Σ_f Tr_{K_f/Q}(a_p(f)²) = Tr(T_{p²} | S_k^new(Γ0(N))) +
 * p^{k−1}·dim S_k^new(Γ0(N)). Since a_p² = a_{p²} + p^{k−1} for an eigenform of trivial character (Diamond–Shurman
 * Prop. 5.8.5), summing over the dim eigenforms gives the identity; with a character χ the second term becomes
 * p^{k−1} Σ_f Tr χ(p), to be added with the character version of the trace formula.
 *
 * <p>Compared: every prime p ∤ N given by every form with p² ≤ {@link Listing#CAP} and a_{p²} not given by every
 * form (where it is, {@code space-traces} compares it).
 */
public final class SpaceTraceSquares implements Check {

    public static final String ID = "space-trace-squares";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Σ_f Tr(a_p²) = Tr T_{p²} + p^(k-1) dim on S_k^new(Γ0(N)) for primes p not dividing N";
    }

    @Override
    public Pass start(Catalog catalog) {
        return new Listing(catalog, (n, level) -> level % n != 0 && Arith.isPrime(n), false).pass(ID, SpaceTraceSquares::check);
    }

    private static void check(SpaceRow row, List<Listing.Entry> es, Listing listing, FindingSink out) {
        int level = row.space().level();
        int weight = row.space().weight();
        List<Integer> primes = new ArrayList<>();
        for (int p : SpaceTraceProducts.commonPrimes(es, level)) {
            if ((long) p * p <= Listing.CAP && !Listing.allGive(es, p * p)) {
                primes.add(p);
            }
        }
        if (primes.isEmpty()) {
            return;
        }
        long max = (long) primes.get(primes.size() - 1) * primes.get(primes.size() - 1);
        NewSpaceTraces nt = NewSpaceTraces.of(weight, listing.table(max));
        BigInteger dim = BigInteger.valueOf(Dimensions.newforms(level, weight));
        List<Integer> failing = new ArrayList<>();
        BigInteger firstExpected = null;
        Rational firstFound = null;
        for (int p : primes) {
            BigInteger expected = nt.newTrace(level, (long) p * p).add(BigInteger.valueOf(p).pow(weight - 1)
                    .multiply(dim));
            Rational found = Rational.ZERO;
            for (Listing.Entry e : es) {
                found = found.add(Listing.trace(Listing.multiply(e.a(p), e.a(p))));
            }
            if (!found.equals(Rational.of(expected))) {
                if (failing.isEmpty()) {
                    firstExpected = expected;
                    firstFound = found;
                }
                failing.add(p);
            }
        }
        if (failing.isEmpty()) {
            return;
        }
        int p = failing.get(0);
        out.error(ID, row.location(), Spaces.subject(row.space()).with("p=" + p),
                "Tr T_" + ((long) p * p) + " + " + p + "^" + (weight - 1) + "·" + dim + " = " + firstExpected,
                "Σ Tr(a_" + p + "^2) = " + firstFound, "Σ_f Tr(a_p^2) = Tr T_{p^2} + p^(k-1) dim fails at p = "
                        + Diagnosis.list(failing) + " of " + primes.size() + " compared: an orbit is missing or listed "
                        + "twice, or an a_p is wrong");
    }
}
