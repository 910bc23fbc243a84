package io.github.eigengate.theory.spaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

class TraceFormulaTest {

    private static final HurwitzClassNumbers TABLE = HurwitzClassNumbers.upTo(4000);

    /**
     * Fixture traces.csv: n-th coefficient of mftraceform([N,k,1],1) (full cusp space) and
     * mftraceform([N,k,1],0) (new space) from PARI/GP, n = 1..100; the gp script is in the fixture header.
     */
    @Test
    void matchesPariTraceForms() {
        List<String[]> rows = Fixtures.rows("traces.csv");
        assertEquals(222, rows.size());
        Map<Integer, TraceFormula> byLevel = new HashMap<>();
        int checked = 0;
        for (String[] r : rows) {
            int level = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            boolean full = r[2].equals("1");
            String[] coeffs = r[3].split(" ");
            assertEquals(100, coeffs.length);
            TraceFormula tf = byLevel.computeIfAbsent(level, n -> TraceFormula.forLevel(n, TABLE));
            for (int n = 1; n <= 100; n++) {
                BigInteger expected = new BigInteger(coeffs[n - 1]);
                String what = "Tr T_" + n + " on S_" + k + (full ? "" : "^new") + "(" + level + ")";
                if (full) {
                    assertEquals(expected, tf.trace(k, n), what);
                    checked++;
                } else if (Arith.gcd(n, level) == 1) {
                    assertEquals(expected, tf.newTrace(k, n), what);
                    checked++;
                }
            }
        }
        assertTrue(checked > 15_000, "checked " + checked);
    }

    /**
     * Fixture traces-wide.csv: PARI/GP mftraceform coefficients a_1..a_40 for every N ≤ 200 and the levels
     * 243, 343, 500, 512, 625, 648, 729, 1024, weights 2, 4, 6 (gp script in the fixture header).
     */
    @Test
    void matchesPariForAllLevelsUpTo200() {
        List<String[]> rows = Fixtures.rows("traces-wide.csv");
        assertEquals(208 * 3 * 2, rows.size());
        HurwitzClassNumbers small = HurwitzClassNumbers.upTo(160);
        for (String[] r : rows) {
            int level = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            boolean full = r[2].equals("1");
            String[] coeffs = r[3].split(" ");
            assertEquals(40, coeffs.length);
            TraceFormula tf = TraceFormula.forLevel(level, small);
            for (int n = 1; n <= 40; n++) {
                String what = "Tr T_" + n + " on S_" + k + (full ? "" : "^new") + "(" + level + ")";
                if (full) {
                    assertEquals(new BigInteger(coeffs[n - 1]), tf.trace(k, n), what);
                } else if (Arith.gcd(n, level) == 1) {
                    assertEquals(new BigInteger(coeffs[n - 1]), tf.newTrace(k, n), what);
                }
            }
        }
    }

    /**
     * Fixture traces-large.csv: PARI/GP mftraceform coefficients a_1..a_30 at levels 65537 and 2·65537,
     * weight 2 (gp script in the fixture header); the prime 65537 is above the quadratic-residue table limit,
     * so Legendre symbols go through the Jacobi-symbol algorithm.
     */
    @Test
    void matchesPariForLevelsWithALargePrime() {
        HurwitzClassNumbers small = HurwitzClassNumbers.upTo(120);
        List<String[]> rows = Fixtures.rows("traces-large.csv");
        assertEquals(4, rows.size());
        for (String[] r : rows) {
            int level = Integer.parseInt(r[0]);
            boolean full = r[1].equals("1");
            String[] coeffs = r[2].split(" ");
            TraceFormula tf = TraceFormula.forLevel(level, small);
            for (int n = 1; n <= 30; n++) {
                String what = "Tr T_" + n + " on S_2" + (full ? "" : "^new") + "(" + level + ")";
                if (full) {
                    assertEquals(new BigInteger(coeffs[n - 1]), tf.trace(2, n), what);
                } else if (Arith.gcd(n, level) == 1) {
                    assertEquals(new BigInteger(coeffs[n - 1]), tf.newTrace(2, n), what);
                }
            }
        }
    }

    /**
     * Fixture traces1001.csv: Tr T_p on S_2(Γ0(1001)) and on the new subspace for all primes p ≤ 10^4,
     * from PARI/GP mftraceform (command in the fixture header). Exercises 4p − t² up to 4·10^4.
     */
    @Test
    void matchesPariAtLevel1001ForPrimesUpTo10000() {
        TraceFormula tf = TraceFormula.forLevel(1001, HurwitzClassNumbers.upTo(40_000));
        List<String[]> rows = Fixtures.rows("traces1001.csv");
        assertEquals(1229, rows.size());
        for (String[] r : rows) {
            long p = Long.parseLong(r[0]);
            assertEquals(new BigInteger(r[1]), tf.trace(2, p), "Tr T_" + p + " on S_2(1001)");
            if (1001 % p != 0) {
                assertEquals(new BigInteger(r[2]), tf.newTrace(2, p), "Tr T_" + p + " on S_2^new(1001)");
            } else {
                assertEquals(2, r.length);
            }
        }
    }

    /** Ramanujan's τ(n) = Tr(T_n | S_12(1)), OEIS A000594 (first values typed from memory). */
    @Test
    void ramanujanTau() {
        long[] tau = {1, -24, 252, -1472, 4830, -6048, -16744, 84480, -113643, -115920, 534612, -370944};
        TraceFormula one = TraceFormula.forLevel(1, TABLE);
        for (int n = 1; n <= tau.length; n++) {
            assertEquals(BigInteger.valueOf(tau[n - 1]), one.trace(12, n), "tau(" + n + ")");
            assertEquals(BigInteger.valueOf(tau[n - 1]), one.newTrace(12, n), "tau(" + n + ")");
        }
    }

    /**
     * The curve y² + y = x³ − x² − 10x − 20 of conductor 11 has a_2 = −2, a_3 = −1, a_5 = 1, a_7 = −2
     * (Diamond–Shurman §8.8 / Stein's book, from memory); S_2(Γ0(11)) is one-dimensional.
     */
    @Test
    void level11WeightTwo() {
        TraceFormula tf = TraceFormula.forLevel(11, TABLE);
        assertEquals(BigInteger.valueOf(-2), tf.trace(2, 2));
        assertEquals(BigInteger.valueOf(-1), tf.trace(2, 3));
        assertEquals(BigInteger.valueOf(1), tf.trace(2, 5));
        assertEquals(BigInteger.valueOf(-2), tf.trace(2, 7));
        // a_11 = 1 (split multiplicative reduction; from memory) — T_11 = U_11, trace formula with (n, N) > 1
        assertEquals(BigInteger.ONE, tf.trace(2, 11));
    }

    /** Tr T_1 is the dimension: consistency with {@link Dimensions} (itself checked against PARI/GP). */
    @Test
    void traceOfIdentityIsDimension() {
        HurwitzClassNumbers small = HurwitzClassNumbers.upTo(4);
        for (int n = 1; n <= 400; n++) {
            TraceFormula tf = TraceFormula.forLevel(n, small);
            for (int k = 2; k <= 20; k += 2) {
                assertEquals(BigInteger.valueOf(Dimensions.cuspForms(n, k)), tf.trace(k, 1), "N=" + n + " k=" + k);
                assertEquals(BigInteger.valueOf(Dimensions.newforms(n, k)), tf.newTrace(k, 1), "N=" + n + " k=" + k);
            }
        }
    }

    /** The factorised new-space evaluation equals the naive β-weighted sum of full traces (fixed seed). */
    @Test
    void factorisedNewTraceEqualsLevelByLevelSum() {
        Random rnd = new Random(99L);
        HurwitzClassNumbers t = HurwitzClassNumbers.upTo(800);
        for (int i = 0; i < 200; i++) {
            int level = 1 + rnd.nextInt(3000);
            if (i % 3 == 0) {
                level = 4 * 9 * 25 * (1 + rnd.nextInt(10)); // squares of small primes
            }
            TraceFormula tf = TraceFormula.forLevel(level, t);
            int k = new int[] {2, 4, 12, 40}[rnd.nextInt(4)];
            for (int j = 0; j < 5; j++) {
                long n = 1 + rnd.nextInt(200);
                if (Arith.gcd(n, level) == 1) {
                    assertEquals(tf.newTraceBySummingLevels(k, n), tf.newTrace(k, n),
                            "N=" + level + " k=" + k + " n=" + n);
                }
            }
        }
    }

    /** Large weights overflow long and take the BigInteger path; level 1, k = 30 is in the PARI fixture too. */
    @Test
    void largeWeightUsesExactBigIntegers() {
        TraceFormula one = TraceFormula.forLevel(1, TABLE);
        // dim S_k(1) for k = 1000: ⌊1000/12⌋ = 83 (k ≢ 2 mod 12; Diamond–Shurman §3.5, from memory)
        assertEquals(BigInteger.valueOf(83), one.trace(1000, 1));
        // Deligne's bound |Tr T_p| ≤ 2 dim · p^{(k−1)/2}: for p = 2, k = 200, squared: Tr² ≤ 4 dim² 2^{199}
        BigInteger tr = one.trace(200, 2);
        long dim = Dimensions.cuspForms(1, 200);
        assertTrue(tr.pow(2).compareTo(BigInteger.valueOf(4 * dim * dim).shiftLeft(199)) <= 0);
        assertTrue(tr.bitLength() > 64);
    }

    /**
     * Fixture traces-chi.csv: for 24 spaces S_k(N, χ) (orders 2 to 12, odd weights, two and three generators,
     * imprimitive χ), Tr_{Q(χ)/Q} of the n-th coefficient of mftraceform([N,k,χ],1) and mftraceform([N,k,χ],0) from
     * PARI/GP, n = 1..60 (script in the fixture header; it checks the trace against the sum over the orbit).
     */
    @Test
    void matchesPariWithCharacter() {
        List<String[]> rows = Fixtures.rows("traces-chi.csv");
        assertEquals(48, rows.size());
        HurwitzClassNumbers t = HurwitzClassNumbers.upTo(240);
        int checked = 0;
        for (String[] r : rows) {
            int level = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            DirichletCharacter chi = DimensionsTest.character(r[2], level);
            assertEquals(Integer.parseInt(r[3]), chi.order());
            assertEquals(Integer.parseInt(r[4]), chi.conductor());
            boolean full = r[5].equals("1");
            String[] coeffs = r[6].split(" ");
            assertEquals(60, coeffs.length);
            TraceFormula tf = TraceFormula.forCharacter(chi, t);
            for (int n = 1; n <= 60; n++) {
                BigInteger expected = new BigInteger(coeffs[n - 1]);
                String what = "orbit trace of T_" + n + " on S_" + k + (full ? "" : "^new") + "(" + level + ", "
                        + r[2] + ")";
                if (full) {
                    assertEquals(expected, tf.trace(k, n), what);
                    checked++;
                } else if (Arith.gcd(n, level) == 1) {
                    assertEquals(expected, tf.newTrace(k, n), what);
                    assertEquals(expected, tf.newTraceBySummingLevels(k, n), what + " level by level");
                    checked++;
                }
            }
        }
        assertTrue(checked > 2000, "checked " + checked);
    }

    /**
     * Fixture traces-chi-wide.csv: one χ per Galois orbit for every N in 3..80 and 81, 96, 100, 121, 125, 128, 144, 169,
     * 243, 256 (the least weight with S_k(N, χ) ≠ 0 among the two of the right parity), orbit traces of the n-th
     * coefficient of mftraceform([N,k,χ],1) and mftraceform([N,k,χ],0) from PARI/GP, n = 1..40.
     */
    @Test
    void matchesPariWithCharacterForManyLevels() {
        List<String[]> rows = Fixtures.rows("traces-chi-wide.csv");
        assertEquals(1350, rows.size());
        HurwitzClassNumbers t = HurwitzClassNumbers.upTo(160);
        for (String[] r : rows) {
            int level = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            DirichletCharacter chi = DimensionsTest.character(r[2], level);
            assertEquals(Integer.parseInt(r[4]), chi.conductor());
            boolean full = r[5].equals("1");
            String[] coeffs = r[6].split(" ");
            TraceFormula tf = TraceFormula.forCharacter(chi, t);
            for (int n = 1; n <= 40; n++) {
                BigInteger expected = new BigInteger(coeffs[n - 1]);
                String what = "orbit trace of T_" + n + " on S_" + k + (full ? "" : "^new") + "(" + level + ", "
                        + r[2] + ")";
                if (full) {
                    assertEquals(expected, tf.trace(k, n), what);
                } else if (Arith.gcd(n, level) == 1) {
                    assertEquals(expected, tf.newTrace(k, n), what);
                }
            }
        }
    }

    /** Tr T_1 with a character is [Q(χ):Q]·dim, and dim comes from the Cohen–Oesterlé formula (checked against gp). */
    @Test
    void traceOfIdentityIsDimensionWithCharacter() {
        HurwitzClassNumbers small = HurwitzClassNumbers.upTo(4);
        for (String[] r : Fixtures.rows("dimensions-chi.csv")) {
            int level = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            DirichletCharacter chi = DimensionsTest.character(r[2], level);
            TraceFormula tf = TraceFormula.forCharacter(chi, small);
            long orbit = chi.orbitSize();
            assertEquals(BigInteger.valueOf(orbit * Long.parseLong(r[4])), tf.trace(k, 1), level + " " + k + " " + r[2]);
            assertEquals(BigInteger.valueOf(orbit * Long.parseLong(r[5])), tf.newTrace(k, 1), level + " " + k + " " + r[2]);
        }
    }

    @Test
    void oddWeightIsZero() {
        TraceFormula tf = TraceFormula.forLevel(23, TABLE);
        assertEquals(BigInteger.ZERO, tf.trace(3, 5));
        assertEquals(BigInteger.ZERO, tf.newTrace(13, 5));
    }

    @Test
    void rejectsBadArguments() {
        TraceFormula tf = TraceFormula.forLevel(60, TABLE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> tf.newTrace(2, 6));
        assertTrue(e.getMessage().contains("coprime"));
        assertThrows(IllegalArgumentException.class, () -> tf.newTrace(2, 2));
        assertThrows(IllegalArgumentException.class, () -> tf.trace(1, 7));
        assertThrows(IllegalArgumentException.class, () -> tf.trace(0, 7));
        assertThrows(IllegalArgumentException.class, () -> tf.trace(2, 0));
        assertThrows(IllegalArgumentException.class, () -> tf.trace(2, 1001)); // needs H up to 4004 > 4000
        assertEquals(60, tf.level());
        assertThrows(IllegalArgumentException.class, () -> TraceFormula.forLevel(0, TABLE));
        assertThrows(NullPointerException.class, () -> TraceFormula.forLevel(5, null));
        // the last n the table allows: 4n = 4000
        assertTrue(TraceFormula.forLevel(1, TABLE).trace(12, 1000) != null);
    }

    /**
     * The closed-form local root count against brute-force enumeration of
     * #{x mod p^a : p ∤ x, x² − tx + n ≡ 0 mod p^{a+b}} for random t, n and every admissible b
     * (p^b | f, f² | t² − 4n, (t² − 4n)/f² ≡ 0, 1 mod 4). Fixed seed.
     */
    @Test
    void localCountAgreesWithBruteForce() {
        Random rnd = new Random(20261202L);
        long[] primes = {2, 3, 5, 7, 11};
        int deep = 0;
        for (int iter = 0; iter < 4000; iter++) {
            long p = primes[rnd.nextInt(primes.length)];
            int a = 1 + rnd.nextInt(p == 2 ? 6 : 3);
            long pa = Arith.powExact(p, a);
            long n;
            long t;
            if (rnd.nextBoolean()) {
                n = 1 + rnd.nextInt(5000);
                t = rnd.nextInt((int) Arith.isqrt(4 * n - 1) + 1);
            } else {
                // discriminant divisible by a high power of p: D = −p^{2c + r}·w with −w ≡ 0, 1 mod 4
                long w = 4L * rnd.nextInt(20) + (rnd.nextBoolean() ? 3 : 4);
                long d = -Arith.powExact(p, 2 * rnd.nextInt(a + 1) + rnd.nextInt(2)) * w;
                if (Math.floorMod(d, 4) > 1) {
                    continue;
                }
                t = 2L * rnd.nextInt(30) + (d & 1);
                n = (t * t - d) / 4;
            }
            long disc = t * t - 4 * n;
            for (int b = 0; b <= a; b++) {
                if (!admissible(disc, p, b)) {
                    continue;
                }
                long pe = Arith.powExact(p, a + b);
                long brute = 0;
                for (long x = 0; x < pa; x++) {
                    if (x % p != 0 && Math.floorMod(x * x - t * x + n, pe) == 0) {
                        brute++;
                    }
                }
                boolean[] qr = null;
                if (p != 2 && rnd.nextBoolean()) {
                    qr = new boolean[(int) p];
                    for (long x = 1; x < p; x++) {
                        qr[(int) (x * x % p)] = true;
                    }
                }
                assertEquals(brute, TraceFormula.localCount(p, a, b, t, n, disc, qr),
                        "p=" + p + " a=" + a + " b=" + b + " t=" + t + " n=" + n);
                if (b > 0 && brute > 0) {
                    deep++;
                }
            }
        }
        // the cases p^b | f with b > 0 and solutions present must be exercised
        assertTrue(deep > 200, "deep cases: " + deep);
    }

    private static boolean admissible(long disc, long p, int b) {
        long pb = Arith.powExact(p, b);
        long q = disc / (pb * pb);
        return disc % (pb * pb) == 0 && Math.floorMod(q, 4) <= 1;
    }

    /**
     * U_j(t, n) = (ρ^j − ρ̄^j)/(ρ − ρ̄): U_{11}(0, 1) = −1 and U_j(2, 1) = j (double root 1); the tabulated
     * expansion Σ_j (−1)^j C(k−2−j, j) t^{k−2−2j} n^j agrees with the recurrence (weights up to 160).
     */
    @Test
    void lucasSequence() {
        assertEquals(BigInteger.ZERO, TraceFormula.lucasUBig(5, 7, 0));
        assertEquals(BigInteger.ONE, TraceFormula.lucasUBig(5, 7, 1));
        assertEquals(BigInteger.valueOf(-1), TraceFormula.lucasUBig(0, 1, 11));
        for (int j = 0; j < 30; j++) {
            assertEquals(BigInteger.valueOf(j), TraceFormula.lucasUBig(2, 1, j));
        }
        BigInteger a = new BigInteger("123456789012345678901234567890");
        long[] acc = new long[8];
        TraceFormula.addMul(acc, TraceFormula.toWords(a), (1L << 30) - 1);
        TraceFormula.mulSmall(acc, (1L << 31) - 1);
        assertEquals(a.multiply(BigInteger.valueOf((1L << 30) - 1)).multiply(BigInteger.valueOf((1L << 31) - 1)),
                TraceFormula.toBig(acc));
    }

    /** High weights go through the tabulated expansion; they agree with the plain BigInteger recurrence. */
    @Test
    void tabulatedHighWeightAgreesWithRecurrence() {
        HurwitzClassNumbers t = HurwitzClassNumbers.upTo(2000);
        for (int level : new int[] {1, 2, 11, 30}) {
            TraceFormula tf = TraceFormula.forLevel(level, t);
            for (int k : new int[] {24, 60, 160}) {
                for (long n = 1; n <= 500; n += 37) {
                    assertEquals(tf.trace(k, n), tf.traceByRecurrence(k, n), "N=" + level + " k=" + k + " n=" + n);
                }
            }
        }
    }
}
