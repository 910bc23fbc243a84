package io.github.eigengate.theory.curves;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.WeierstrassModel;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * a_p against PARI/GP's {@code ellap} (curves/traces.csv: every p ≤ 3000 and primes near 10^6, 10^9 and 2^31, on
 * minimal and non-minimal models; commands in the file's header).
 */
class PointCountingTest {

    @Test
    void tracesAgreeWithPari() {
        List<Map<String, String>> rows = CurveFixtures.rows("traces.csv");
        Map<String, List<Map<String, String>>> byCurve = new LinkedHashMap<>();
        for (Map<String, String> r : rows) {
            byCurve.computeIfAbsent(r.get("curve"), k -> new ArrayList<>()).add(r);
        }
        assertTrue(byCurve.size() >= 10);
        List<String> wrong = new ArrayList<>();
        for (var entry : byCurve.entrySet()) {
            WeierstrassModel e = CurveFixtures.model(entry.getKey());
            int[] primes = entry.getValue().stream().mapToInt(r -> Integer.parseInt(r.get("p"))).toArray();
            long[] ours = Traces.of(e, primes);
            for (int i = 0; i < primes.length; i++) {
                long pari = Long.parseLong(entry.getValue().get(i).get("ap"));
                if (ours[i] != pari) {
                    wrong.add(entry.getKey() + " p=" + primes[i] + ": PARI " + pari + ", ours " + ours[i]);
                }
            }
        }
        assertEquals(List.of(), wrong.subList(0, Math.min(20, wrong.size())));
    }

    @Test
    void aModelScaledByALargePrimeKeepsTheTracesOfItsCurve() {
        // [0,-1,1,-10,-20] scaled by u = 1000003 (prime, one of the primes of traces.csv): c4, c6 exceed 64 bits,
        // and the model is singular mod 1000003 only because it is not minimal there
        WeierstrassModel scaled = WeierstrassModel.of(0, -1, 1, -10, -20)
                .scaleUp(java.math.BigInteger.valueOf(1_000_003));
        List<Map<String, String>> rows = CurveFixtures.rows("traces.csv").stream()
                .filter(r -> r.get("curve").equals("[0,-1,1,-10,-20]")).toList();
        int[] primes = rows.stream().mapToInt(r -> Integer.parseInt(r.get("p"))).toArray();
        assertTrue(java.util.Arrays.stream(primes).anyMatch(p -> p == 1_000_003));
        long[] ours = Traces.of(scaled, primes);
        for (int i = 0; i < primes.length; i++) {
            assertEquals(Long.parseLong(rows.get(i).get("ap")), ours[i], "p=" + primes[i]);
        }
    }

    @Test
    void theBabyStepGiantStepSearchAgreesWithTheLegendreSum() {
        // two exact methods of this class against each other on y² = x³ − 7x + 6·... over p in [1000, 4000)
        for (long p = 1009; p < 4000; p += 2) {
            if (!io.github.eigengate.theory.Arith.isPrime(p)) {
                continue;
            }
            for (long a = 0; a < 5; a++) {
                for (long b = 1; b < 4; b++) {
                    if ((4 * a * a * a + 27 * b * b) % p == 0) {
                        continue;
                    }
                    assertEquals(PointCounting.legendreSum(a, b, p), PointCounting.traceShort(a, b, p),
                            "p=" + p + " a=" + a + " b=" + b);
                }
            }
        }
    }
}
