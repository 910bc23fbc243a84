package io.github.eigengate.theory.curves;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Tate's algorithm against PARI/GP's {@code elllocalred} and {@code ellglobalred} on every curve of
 * curves/tate.csv (all curves of conductor 11..600 of the pari-elldata database, conductors with 2^8 and 3^5, and
 * non-minimal models; the gp commands are in the file's header and fixtures-gp/curves-reference.gp).
 */
class TateTest {

    @Test
    void localDataAgreeWithPariAtEveryPrimeOfTheDiscriminant() {
        List<Map<String, String>> rows = CurveFixtures.rows("tate.csv");
        assertTrue(rows.size() > 8000, "rows: " + rows.size());
        List<String> wrong = new ArrayList<>();
        Map<String, BigInteger> conductors = new LinkedHashMap<>();
        Map<String, BigInteger> expected = new LinkedHashMap<>();
        for (Map<String, String> row : rows) {
            WeierstrassModel e = CurveFixtures.model(row.get("curve"));
            BigInteger p = new BigInteger(row.get("p"));
            LocalReduction local = Tate.reduce(e, p);
            String got = local.exponent() + " " + local.kodaira() + " " + local.tamagawa();
            String want = row.get("f") + " " + row.get("kodaira") + " " + row.get("c");
            if (!got.equals(want)) {
                wrong.add(row.get("curve") + " p=" + p + ": PARI " + want + ", ours " + got);
            }
            conductors.merge(row.get("curve"), p.pow(local.exponent()), BigInteger::multiply);
            expected.put(row.get("curve"), new BigInteger(row.get("conductor")));
        }
        assertEquals(List.of(), wrong.subList(0, Math.min(20, wrong.size())));
        assertEquals(expected, conductors);
    }

    @Test
    void conductorAgainstTheLevelNamesThePrimeAndTheKodairaSymbol() {
        // [0,0,0,-1,0]: y² = x³ − x, conductor 32, type III at 2 (curves/tate.csv, elllocalred(E, 2) = [5, 3, ...])
        WeierstrassModel e = WeierstrassModel.of(0, 0, 0, -1, 0);
        assertEquals(List.of(), Conductors.against(e, 32));
        List<Conductors.Mismatch> m = Conductors.against(e, 64);
        assertEquals(1, m.size());
        assertEquals(BigInteger.TWO, m.get(0).p());
        assertEquals(6, m.get(0).expected());
        assertEquals("III", m.get(0).local().kodaira());
        assertEquals(5, m.get(0).local().exponent());
    }

    @Test
    void aPrimeOutsideTheLevelIsFoundWithoutKnowingIt() {
        // the level-11 curve [0,-1,1,-10,-20] against level 1: bad at 11, type I5 (curves/tate.csv)
        WeierstrassModel e = WeierstrassModel.of(0, -1, 1, -10, -20);
        List<Conductors.Mismatch> m = Conductors.against(e, 1);
        assertEquals(1, m.size());
        assertEquals(BigInteger.valueOf(11), m.get(0).p());
        assertEquals("I5", m.get(0).local().kodaira());
    }

    @Test
    void aNonMinimalModelAtALargePrimeStillHasItsConductor() {
        // scaled by u = 1000003 (prime): disc · u^12; Kraus's test sees good reduction there without factoring
        WeierstrassModel e = WeierstrassModel.of(0, -1, 1, -10, -20).scaleUp(BigInteger.valueOf(1_000_003));
        assertEquals(List.of(), Conductors.against(e, 11));
    }

    @Test
    void badPrimesBeyondTheTrialLimitAreStillFound() {
        // PARI/GP: E = ellinit([0,0,0,1,10000001]); factor(abs(E.disc)) = [2,4; 19,1; 8636857,1; 16453357,1],
        // ellglobalred(E)[1] = 43200008640000496. Against N = 16·19·8636857 the prime 16453357 > 10^6 is missing:
        // the trial division to 10^6 leaves it, and below 10^12 it is prime, so it is named.
        WeierstrassModel e = WeierstrassModel.of(0, 0, 0, 1, 10_000_001);
        long n = 16L * 19 * 8636857;
        List<Conductors.Mismatch> m = Conductors.against(e, n);
        assertEquals(1, m.size());
        assertEquals(BigInteger.valueOf(16453357), m.get(0).p());
        assertEquals("I1", m.get(0).local().kodaira());
        // against N = 16·19 both large primes are missing; 8636857·16453357 > 10^12 is left unfactored
        List<Conductors.Mismatch> two = Conductors.against(e, 16L * 19);
        assertEquals(1, two.size());
        assertEquals(BigInteger.valueOf(8636857L * 16453357L), two.get(0).cofactor());
    }

    @Test
    void localDataDoNotDependOnTheModel() {
        // every (curve, p) row of curves/tate.csv again after x = u²x' + r, y = u³y' + su²x' + t with pseudo-random
        // u ∈ {1, 2, 3, 5, 6}, |r|, |s|, |t| ≤ 7: f_p, the Kodaira symbol and c_p are invariants of the curve
        java.util.Random random = new java.util.Random(20261202);
        long[] us = {1, 2, 3, 5, 6};
        List<String> wrong = new ArrayList<>();
        for (Map<String, String> row : CurveFixtures.rows("tate.csv")) {
            BigInteger u = BigInteger.valueOf(us[random.nextInt(us.length)]);
            WeierstrassModel e = CurveFixtures.model(row.get("curve")).scaleUp(u).change(
                    BigInteger.valueOf(random.nextInt(15) - 7), BigInteger.valueOf(random.nextInt(15) - 7),
                    BigInteger.valueOf(random.nextInt(15) - 7));
            LocalReduction local = Tate.reduce(e, new BigInteger(row.get("p")));
            String got = local.exponent() + " " + local.kodaira() + " " + local.tamagawa();
            String want = row.get("f") + " " + row.get("kodaira") + " " + row.get("c");
            if (!got.equals(want)) {
                wrong.add(row.get("curve") + " u=" + u + " p=" + row.get("p") + ": PARI " + want + ", ours " + got);
            }
        }
        assertEquals(List.of(), wrong.subList(0, Math.min(20, wrong.size())));
    }
}
