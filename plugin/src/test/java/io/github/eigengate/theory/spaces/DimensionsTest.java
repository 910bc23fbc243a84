package io.github.eigengate.theory.spaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.theory.Arith;
import java.util.List;
import org.junit.jupiter.api.Test;

class DimensionsTest {

    /** Fixture dimensions.csv: PARI/GP mfdim([N,k,1],1) and mfdim([N,k,1],0), N ≤ 300, k = 2..14 even. */
    @Test
    void matchesPariForAllLevelsUpTo300() {
        List<String[]> rows = Fixtures.rows("dimensions.csv");
        assertEquals(300 * 7, rows.size());
        for (String[] r : rows) {
            int n = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            assertEquals(Long.parseLong(r[2]), Dimensions.cuspForms(n, k), "dim S_" + k + "(" + n + ")");
            assertEquals(Long.parseLong(r[3]), Dimensions.newforms(n, k), "dim S_" + k + "^new(" + n + ")");
        }
    }

    /**
     * Fixture dimensions-chi.csv: PARI/GP mfdim([N,k,χ],1) and mfdim([N,k,χ],0), N ≤ 100, 2 ≤ k ≤ 6, one character
     * per Galois orbit, χ given on the generators of znstar(N,1).
     */
    @Test
    void matchesPariWithCharacterForAllLevelsUpTo100() {
        List<String[]> rows = Fixtures.rows("dimensions-chi.csv");
        assertEquals(4460, rows.size());
        int nontrivial = 0;
        for (String[] r : rows) {
            int n = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            DirichletCharacter chi = character(r[2], n);
            assertEquals(Integer.parseInt(r[3]), chi.order(), r[2] + " mod " + n);
            String what = "S_" + k + "(" + n + ", " + r[2] + ")";
            assertEquals(Long.parseLong(r[4]), Dimensions.cuspForms(chi, k), "dim " + what);
            assertEquals(Long.parseLong(r[5]), Dimensions.newforms(chi, k), "dim new " + what);
            nontrivial += chi.isTrivial() ? 0 : 1;
        }
        assertTrue(nontrivial > 3000);
    }

    /** dim S_k(N, χ) = Σ_{𝔣 | M | N} σ0(N/M) dim S_k^new(M, χ_M) (Atkin–Lehner–Li), one χ per Galois orbit mod N ≤ 100. */
    @Test
    void oldformMultiplicityRelationHoldsWithCharacter() {
        for (String[] r : Fixtures.rows("dimensions-chi.csv")) {
            int n = Integer.parseInt(r[0]);
            int k = Integer.parseInt(r[1]);
            DirichletCharacter chi = character(r[2], n);
            int cond = chi.conductor();
            long sum = 0;
            for (long m : Arith.divisors(Arith.factor(n / cond))) {
                sum += Arith.sigma0(n / cond / m) * Dimensions.newforms(chi.restrictTo((int) (m * cond)), k);
            }
            assertEquals(Dimensions.cuspForms(chi, k), sum, r[2] + " mod " + n + ", k = " + k);
        }
    }

    /** A character in the fixtures' g:a/b syntax ({@code 1} = trivial). */
    static DirichletCharacter character(String cell, int modulus) {
        if (cell.equals("1")) {
            return DirichletCharacter.trivial(modulus);
        }
        String[] pairs = cell.split(";");
        long[] g = new long[pairs.length];
        long[] a = new long[pairs.length];
        long[] b = new long[pairs.length];
        for (int i = 0; i < pairs.length; i++) {
            String[] ga = pairs[i].split(":");
            String[] ab = ga[1].split("/");
            g[i] = Long.parseLong(ga[0]);
            a[i] = Long.parseLong(ab[0]);
            b[i] = Long.parseLong(ab[1]);
        }
        return DirichletCharacter.fromValues(modulus, g, a, b);
    }

    /** Textbook values, from memory: Diamond–Shurman §3.9 / Stein, Modular Forms: A Computational Approach. */
    @Test
    void textbookValues() {
        // dim S_12(SL_2(Z)) = 1, spanned by Δ (Diamond–Shurman §3.9; from memory)
        assertEquals(1, Dimensions.cuspForms(1, 12));
        // S_k(SL_2(Z)) = 0 for k < 12 and k = 14 (from memory)
        for (int k = 2; k <= 10; k += 2) {
            assertEquals(0, Dimensions.cuspForms(1, k));
        }
        assertEquals(0, Dimensions.cuspForms(1, 14));
        // dim S_k(SL_2(Z)) = ⌊k/12⌋ − 1 if k ≡ 2 mod 12, else ⌊k/12⌋ (Diamond–Shurman §3.5; from memory)
        for (int k = 4; k <= 200; k += 2) {
            long expected = (k % 12 == 2) ? k / 12 - 1 : k / 12;
            assertEquals(expected, Dimensions.cuspForms(1, k), "k = " + k);
        }
        // X0(11) has genus 1, X0(37) and X0(23) genus 2, X0(N) genus 0 for N ≤ 10 (from memory)
        assertEquals(1, Dimensions.cuspForms(11, 2));
        assertEquals(1, Dimensions.genus(11));
        assertEquals(2, Dimensions.genus(23));
        assertEquals(2, Dimensions.genus(37));
        for (int n = 1; n <= 10; n++) {
            assertEquals(0, Dimensions.genus(n), "genus X0(" + n + ")");
        }
        // dim S_2(Γ0(389)) = 32, dim S_2^new(Γ0(389)) = 32 (prime level; from memory)
        assertEquals(32, Dimensions.cuspForms(389, 2));
        assertEquals(32, Dimensions.newforms(389, 2));
    }

    @Test
    void oddWeightGivesZero() {
        for (int n = 1; n <= 50; n++) {
            for (int k = 3; k <= 15; k += 2) {
                assertEquals(0, Dimensions.cuspForms(n, k));
                assertEquals(0, Dimensions.newforms(n, k));
            }
        }
    }

    /** dim S_k(N) = Σ_{M | N} σ0(N/M) dim S_k^new(M) (Atkin–Lehner; the relation inverted by newforms). */
    @Test
    void oldformMultiplicityRelationHolds() {
        for (int n = 1; n <= 600; n++) {
            for (int k = 2; k <= 8; k += 2) {
                long sum = 0;
                for (long m : Arith.divisors(Arith.factor(n))) {
                    sum += Arith.sigma0(n / m) * Dimensions.newforms((int) m, k);
                }
                assertEquals(Dimensions.cuspForms(n, k), sum, "N = " + n + ", k = " + k);
                assertTrue(Dimensions.newforms(n, k) >= 0);
            }
        }
    }

    @Test
    void rejectsBadArguments() {
        IllegalArgumentException w1 = assertThrows(IllegalArgumentException.class, () -> Dimensions.cuspForms(11, 1));
        assertTrue(w1.getMessage().contains("weight 1"));
        assertThrows(IllegalArgumentException.class, () -> Dimensions.newforms(11, 1));
        assertThrows(IllegalArgumentException.class, () -> Dimensions.cuspForms(11, 0));
        assertThrows(IllegalArgumentException.class, () -> Dimensions.cuspForms(0, 2));
        assertThrows(IllegalArgumentException.class, () -> Dimensions.newforms(-5, 2));
        assertThrows(IllegalArgumentException.class, () -> Dimensions.genus(0));
    }
}
