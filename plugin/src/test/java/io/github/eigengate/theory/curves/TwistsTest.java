package io.github.eigengate.theory.curves;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.arith.WeierstrassModel;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The twist named by curve-traces is the one PARI/GP made: curves/twists.csv lists ellminimalmodel(elltwist(E, d))
 * for 22 fundamental discriminants d and four curves; the a_p of both (p ≤ 600, checked against ellap in
 * PointCountingTest) must give back d, or for the CM curve y² = x³ − x the smaller d that makes the same twist.
 */
class TwistsTest {

    @Test
    void theDiscriminantIsRecoveredFromTheSignPattern() {
        int[] primes = java.util.stream.IntStream.rangeClosed(2, 600)
                .filter(io.github.eigengate.theory.Arith::isPrime).toArray();
        List<String> wrong = new ArrayList<>();
        List<Map<String, String>> rows = CurveFixtures.rows("twists.csv");
        assertEquals(88, rows.size());
        for (Map<String, String> r : rows) {
            WeierstrassModel e = CurveFixtures.model(r.get("curve"));
            WeierstrassModel t = CurveFixtures.model(r.get("twist"));
            long[] ae = Traces.of(e, primes);
            long d = Twists.discriminant(primes, Traces.of(t, primes), ae, Long.parseLong(r.get("conductor")), 1);
            long want = Long.parseLong(r.get("d"));
            if (d != want && !(Math.abs(d) <= Math.abs(want) && sameOnSupport(d, want, primes, ae))) {
                wrong.add(r.get("curve") + " by " + r.get("d") + ": found " + d);
            }
        }
        assertEquals(List.of(), wrong);
    }

    /**
     * y² = x³ − x has CM by Z[i] (a_p = 0 for p ≡ 3 mod 4), so its twists by d and −4d (or d/−4) are the same
     * curve: the smaller discriminant is then the answer, and it must agree with d wherever a_p ≠ 0.
     */
    private static boolean sameOnSupport(long d, long want, int[] primes, long[] ae) {
        for (int i = 0; i < primes.length; i++) {
            int x = Legendre.kronecker(d, primes[i]);
            int y = Legendre.kronecker(want, primes[i]);
            if (ae[i] != 0 && x != 0 && y != 0 && x != y) {
                return false;
            }
        }
        return true;
    }
}
