package io.github.eigengate.theory.congruence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.theory.congruence.CongruenceBounds.Plan;
import io.github.eigengate.theory.congruence.CongruenceBounds.Route;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.SortedMap;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * The bound formulas against hand computations from Sturm's theorem (LNM 1240, Thm 1: B = ⌊W·[SL2(Z):Γ0(M)]/12⌋)
 * and the index formula m(M) = M ∏_{q | M}(1 + 1/q); each expected value is worked out in the comment beside it.
 */
class CongruenceBoundsTest {

    private static BigInteger big(long n) {
        return BigInteger.valueOf(n);
    }

    @Test
    void indexOfGammaZero() {
        assertEquals(big(1), SturmBound.index(1));
        assertEquals(big(3), SturmBound.index(2));          // 2·(3/2)
        assertEquals(big(12), SturmBound.index(11));        // 11·(12/11)
        assertEquals(big(72), SturmBound.index(36));        // 36·(3/2)(4/3)
        assertEquals(big(552), SturmBound.index(529));      // 23²·(24/23) = 23·24
        // 2²·11²·29² = 407044; ·(3/2)(12/11)(30/29) = (2·3)(11·12)(29·30) = 6·132·870
        assertEquals(big(689040), SturmBound.index(407044));
        assertEquals(Map.of(2L, 2, 11L, 2, 29L, 2), SturmBound.factor(407044));
        assertThrows(IllegalArgumentException.class, () -> SturmBound.index(0));
    }

    @Test
    void indexIsMultiplicativeAndMatchesTheDefinitionOnRandomLevels() {
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 200; trial++) {
            int a = 1 + rnd.nextInt(5000);
            int b = 1 + rnd.nextInt(5000);
            if (BigInteger.valueOf(a).gcd(BigInteger.valueOf(b)).equals(BigInteger.ONE)) {
                assertEquals(SturmBound.index(a).multiply(SturmBound.index(b)), SturmBound.index(a * b));
            }
            // m(q^e) = q^e + q^(e-1) for a prime power
            int q = new int[] {2, 3, 5, 7, 11, 13}[rnd.nextInt(6)];
            int e = 1 + rnd.nextInt(6);
            long qe = BigInteger.valueOf(q).pow(e).longValue();
            assertEquals(big(qe + qe / q), SturmBound.index((int) qe));
        }
    }

    @Test
    void sturmBoundOnSmallSpaces() {
        SortedMap<Long, Integer> one = new TreeMap<>();
        assertEquals(big(1), SturmBound.bound(12, one));                    // ⌊12·1/12⌋
        assertEquals(big(2), SturmBound.bound(2, SturmBound.factor(11)));   // ⌊2·12/12⌋
        assertEquals(big(0), SturmBound.bound(0, SturmBound.factor(11)));
        assertEquals(big(4), SturmBound.bound(4, SturmBound.factor(13)));   // ⌊4·14/12⌋ = ⌊56/12⌋
        assertThrows(IllegalArgumentException.class, () -> SturmBound.bound(-1, one));
    }

    @Test
    void depletedLevelRaisesEveryBadPrimeButPToTheSquare() {
        // M = lcm(N_f, N_g, Q²), Q = product of the primes q ≠ p dividing N_f N_g
        assertEquals(Map.of(2L, 2, 11L, 2, 29L, 2), CongruenceBounds.depletedLevel(5, 11, 58));
        assertEquals(Map.of(11L, 1), CongruenceBounds.depletedLevel(11, 1, 11));      // p = 11 is not depleted
        assertEquals(Map.of(2L, 5, 3L, 2), CongruenceBounds.depletedLevel(5, 32, 3)); // 2^5 kept (a_2 = 0)
        assertEquals(Map.of(), CongruenceBounds.depletedLevel(7, 1));
    }

    @Test
    void determinantCondition() {
        assertTrue(CongruenceBounds.determinantsMatch(5, 12, 2, 1));    // 12 − 2 − 2 = 8 ≡ 0 mod 4
        assertFalse(CongruenceBounds.determinantsMatch(5, 12, 2, 0));   // 10 ≢ 0 mod 4
        assertTrue(CongruenceBounds.determinantsMatch(5, 12, 2, -3));   // −3 ≡ 1 mod 4
        assertTrue(CongruenceBounds.determinantsMatch(2, 12, 3, 7));    // mod 1: always
        assertTrue(CongruenceBounds.eisensteinDeterminantMatches(691, 12, 0, 11));
        assertTrue(CongruenceBounds.eisensteinDeterminantMatches(5, 2, 0, 1));
        assertFalse(CongruenceBounds.eisensteinDeterminantMatches(5, 2, 0, 3)); // 1 ≢ 3 mod 4
        assertThrows(IllegalArgumentException.class, () -> CongruenceBounds.determinantsMatch(4, 2, 2, 0));
    }

    @Test
    void twoWeightTwoFormsOfLevels11And58Mod5() {
        // DIRECT: f♭ − g♭, W = 2, M = 2²·11²·29² = 407044, m = 689040, B = ⌊2·689040/12⌋ = 114840.
        // THETA: θ f♭ − θ g♭, W = 2 + 6 = 8, B = ⌊8·689040/12⌋ = 459360.
        List<Plan> plans = CongruenceBounds.forForms(5, 2, 11, 2, 58, 0);
        assertEquals(2, plans.size());
        Plan direct = plans.get(0);
        assertEquals(Route.DIRECT, direct.route());
        assertEquals(2, direct.weight());
        assertEquals(big(407044), direct.levelValue());
        assertEquals(big(689040), direct.index());
        assertEquals(big(114840), direct.bound());
        assertTrue(direct.comparesAtP());
        assertEquals(Route.THETA, plans.get(1).route());
        assertEquals(8, plans.get(1).weight());
        assertEquals(big(459360), plans.get(1).bound());
    }

    @Test
    void deltaAgainstLevel11TwistedMod5() {
        // j = 1: θ^s Δ against θ^t f11♭ with t ≡ s + 1 mod 4. s = 1, t = 2: weights 12 + 6 = 18 and 2 + 12 = 14,
        // W = 18; s = 4, t = 1: 36 and 8, W = 36. M = 11², m = 132: B = ⌊18·132/12⌋ = 198 and 396.
        List<Plan> plans = CongruenceBounds.forForms(5, 12, 1, 2, 11, 1);
        assertEquals(2, plans.size());
        assertEquals(Route.THETA, plans.get(0).route());
        assertEquals(1, plans.get(0).leftTheta());
        assertEquals(2, plans.get(0).rightTheta());
        assertEquals(18, plans.get(0).weight());
        assertEquals(big(121), plans.get(0).levelValue());
        assertEquals(big(198), plans.get(0).bound());
        assertEquals(big(396), plans.get(1).bound());
    }

    @Test
    void deltaAgainstLevel11Mod11() {
        // p = 11 divides N_g, so nothing is depleted: M = 11, m = 12.
        // DIRECT: W = max(12, 2) = 12 (12 − 2 = 10 = p − 1),
        // B = 12. THETA: θΔ, θ f11 of weights 24, 14, W = 24, B = 24.
        List<Plan> plans = CongruenceBounds.forForms(11, 12, 1, 2, 11, 0);
        assertEquals(Route.DIRECT, plans.get(0).route());
        assertEquals(big(12), plans.get(0).bound());
        assertEquals(big(11), plans.get(0).levelValue());
        assertEquals(big(24), plans.get(1).bound());
    }

    @Test
    void smallPrimesUseE4AndE6() {
        // p = 2: weights 2 and 4; W − 2 and W − 4 must be 0 or even ≥ 4: W = 8. M = 11², m = 132, B = ⌊8·132/12⌋ = 88.
        List<Plan> plans = CongruenceBounds.forForms(2, 2, 11, 4, 11, 0);
        assertEquals(1, plans.size());
        assertEquals(8, plans.get(0).weight());
        assertEquals(big(88), plans.get(0).bound());
        assertEquals(8, CongruenceBounds.pad(3, 2, 4));
        assertEquals(6, CongruenceBounds.pad(3, 2, 6));
        assertEquals(-1, CongruenceBounds.pad(2, 2, 3));
        assertEquals(-1, CongruenceBounds.pad(5, 2, 4));
        // p = 3 with an odd twist needs θ: no plan
        assertEquals(List.of(), CongruenceBounds.forForms(3, 2, 11, 2, 11, 1));
        assertThrows(IllegalArgumentException.class, () -> CongruenceBounds.forForms(5, 12, 1, 2, 11, 0));
    }

    @Test
    void ramanujanMod691HasBoundOne() {
        // G_12 = −B_12/24 + Σ σ_11(n) q^n with B_12 = −691/2730 (PARI/GP: bernfrac(12)), so its constant term
        // 691/65520 ≡ 0 mod 691 and Δ − G_12 is a form of weight 12 on SL2(Z): B = ⌊12/12⌋ = 1, a_691 compared.
        assertEquals(Rational.parse("-691/2730"), CongruenceBounds.bernoulli(12));
        assertEquals(Rational.parse("-1/2"), CongruenceBounds.bernoulli(1));
        assertEquals(Rational.parse("1/6"), CongruenceBounds.bernoulli(2));      // PARI/GP: bernfrac(2)
        assertEquals(Rational.ZERO, CongruenceBounds.bernoulli(5));
        assertEquals(Rational.parse("-3617/510"), CongruenceBounds.bernoulli(16));  // PARI/GP: bernfrac(16)
        assertEquals(Rational.ONE, CongruenceBounds.bernoulli(0));
        assertTrue(CongruenceBounds.constantTermVanishes(691, 12));
        assertFalse(CongruenceBounds.constantTermVanishes(5, 12));
        List<Plan> plans = CongruenceBounds.forEisenstein(691, 12, 1, 0, 11);
        Plan best = plans.get(0);
        assertEquals(Route.DIRECT, best.route());
        assertEquals(12, best.eisensteinWeight());
        assertEquals(big(1), best.bound());
        assertTrue(best.comparesAtP());
    }

    @Test
    void levelOneWithAHugeWeightStaysFast() {
        // level 1, p = 5, i = 0, j = 3: k − 1 ≡ 3 mod 4; route DIRECT looks for G_w, w ≡ 0 mod 4, w ≤ k, whose
        // constant term is ≡ 0 mod 5; the Bernoulli numbers are computed once up to the cap. Route θ always exists.
        long t0 = System.nanoTime();
        List<Plan> plans = CongruenceBounds.forEisenstein(5, 100_000, 1, 0, 3);
        assertTrue(System.nanoTime() - t0 < 5_000_000_000L);
        assertTrue(plans.stream().anyMatch(pl -> pl.route() == Route.THETA));
    }

    @Test
    void mazurLevel11Mod5() {
        // i = 0, j = 1: G_w with w ≡ 2 mod 4, w ≥ 4: w = 6. M = 11², m = 132. DIRECT: W = max(2, 6) = 6, B = 66.
        // THETA: θ f♭ (weight 8) against θ G_6♭ (weight 12): W = 12, B = 132.
        List<Plan> plans = CongruenceBounds.forEisenstein(5, 2, 11, 0, 1);
        assertEquals(Route.DIRECT, plans.get(0).route());
        assertEquals(6, plans.get(0).eisensteinWeight());
        assertEquals(big(66), plans.get(0).bound());
        assertEquals(Route.THETA, plans.get(1).route());
        assertEquals(12, plans.get(1).weight());
        assertEquals(big(132), plans.get(1).bound());
    }

    @Test
    void level23Mod11AndRamanujanMod7() {
        // level 23, p = 11, i = 0, j = 1: w ≡ 2 mod 10, w = 12; W = 12 (12 − 2 = 10); M = 23², m = 552: B = 552.
        assertEquals(big(552), CongruenceBounds.forEisenstein(11, 2, 23, 0, 1).get(0).bound());
        // τ mod 7, i = 1, j = 4: no exponent ≡ 0 mod 6, THETA only; (1,4): r = 3, w = 4; s = 1, t = 2: weights
        // 12 + 8 = 20 and 4 + 16 = 20, W = 20, M = 1: B = ⌊20/12⌋ = 1.
        List<Plan> plans = CongruenceBounds.forEisenstein(7, 12, 1, 1, 4);
        assertEquals(Route.THETA, plans.get(0).route());
        assertEquals(20, plans.get(0).weight());
        assertEquals(big(1), plans.get(0).bound());
        // p = 2 at level 1: every constant term −B_w/2w has 2 in its denominator (von Staudt–Clausen): no plan
        assertEquals(List.of(), CongruenceBounds.forEisenstein(2, 12, 1, 0, 1));
        // p = 2 at level 11: DIRECT; G_4 would need W = 8 (see smallPrimesUseE4AndE6), G_6 needs W = 6 (f·E_4):
        // B = ⌊6·132/12⌋ = 66
        assertEquals(6, CongruenceBounds.forEisenstein(2, 2, 11, 0, 1).get(0).eisensteinWeight());
        assertEquals(big(66), CongruenceBounds.forEisenstein(2, 2, 11, 0, 1).get(0).bound());
    }

    @Test
    void everyPlanIsConsistentOnRandomInputs() {
        Random rnd = new Random(7L);
        long[] primes = {2, 3, 5, 7, 11, 13, 691};
        for (int trial = 0; trial < 300; trial++) {
            long p = primes[rnd.nextInt(primes.length)];
            int kf = 2 + 2 * rnd.nextInt(8);
            int kg = 2 + 2 * rnd.nextInt(8);
            int nf = 1 + rnd.nextInt(200);
            int ng = 1 + rnd.nextInt(200);
            long j = rnd.nextInt(20) - 10;
            if (!CongruenceBounds.determinantsMatch(p, kf, kg, j)) {
                continue;
            }
            for (Plan pl : CongruenceBounds.forForms(p, kf, nf, kg, ng, j)) {
                assertEquals(BigInteger.valueOf(pl.weight()).multiply(pl.index()).divide(big(12)), pl.bound());
                assertEquals(SturmBound.index(pl.level()), pl.index());
                assertTrue(pl.weight() >= Math.max(kf, kg));
                if (pl.route() == Route.THETA) {
                    // the twist is realised: t ≡ s + j mod p − 1, both in [1, p − 1]
                    assertEquals(Math.floorMod(pl.leftTheta() + j, p - 1), Math.floorMod(pl.rightTheta(), p - 1));
                    assertTrue(pl.leftTheta() >= 1 && pl.rightTheta() >= 1);
                } else {
                    assertEquals(0, Math.floorMod(j, p - 1));
                }
                assertTrue(pl.levelValue().mod(big(nf)).signum() == 0 && pl.levelValue().mod(big(ng)).signum() == 0);
            }
        }
    }

    /**
     * Eisenstein series with characters: the weight-1 dihedral form of level 23 against E_1^{1,χ}, χ = (−23/·) of
     * conductor 23 (Diamond–Shurman §4.8): p = 3, route DIRECT in weight 1 on Γ0(23²), B = ⌊1·552/12⌋ = 46; weight 2
     * with i = j = 0 violates k − 1 ≡ i + j mod 2.
     */
    @Test
    void eisensteinSeriesWithCharacters() {
        DirichletCharacter one = DirichletCharacter.trivial(23);
        DirichletCharacter chi = DirichletCharacter.fromValues(23, new long[] {5}, new long[] {11}, new long[] {22});
        List<Plan> plans = CongruenceBounds.forEisenstein(3, 1, 23, 0, 0, one, chi);
        assertEquals(Route.DIRECT, plans.get(0).route());
        assertEquals(1, plans.get(0).weight());
        assertEquals(1, plans.get(0).eisensteinWeight());
        assertEquals(big(46), plans.get(0).bound());
        assertThrows(IllegalArgumentException.class, () -> CongruenceBounds.forEisenstein(3, 2, 23, 0, 0, one, chi));
    }

    /** The generators of (Z/NZ)^× reach the whole group (counted by closure), for every N ≤ 200. */
    @Test
    void unitGeneratorsGenerate() {
        for (int n = 1; n <= 200; n++) {
            java.util.Set<Long> reached = new java.util.HashSet<>(List.of(1L % n));
            java.util.ArrayDeque<Long> todo = new java.util.ArrayDeque<>(reached);
            long[] gens = DirichletCharacter.generators(n);
            while (!todo.isEmpty()) {
                long x = todo.poll();
                for (long g : gens) {
                    long y = x * g % n;
                    if (reached.add(y)) {
                        todo.add(y);
                    }
                }
            }
            assertEquals(n == 1 ? 1 : io.github.eigengate.theory.Arith.phi(n), reached.size(), "N = " + n);
        }
    }
}
