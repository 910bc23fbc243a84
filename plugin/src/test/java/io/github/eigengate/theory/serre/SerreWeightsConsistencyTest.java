package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Exhaustive comparison of two independent recipes for every local shape and every prime 5 ≤ p &lt; 60:
 * Serre's k(ρ̄) (Serre, Duke Math. J. 54 (1987), §2) against the least weight in which some member of
 * the Buzzard–Diamond–Jarvis set W(ρ̄) (Duke Math. J. 155 (2010), §3) occurs. The relation
 * k(ρ̄) = min_{σ ∈ W(ρ̄)} minimalWeight(σ) is the comparison of Ash–Stevens (Duke Math. J. 53 (1986))
 * between weights k and Serre weights (from memory).
 */
class SerreWeightsConsistencyTest {

    static List<Integer> primes() {
        List<Integer> out = new ArrayList<>();
        for (int p = 5; p < 60; p++) {
            if (Primes.isPrime(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /** Every shape for p: all irreducible n, all split and non-split (a, b), all très ramifié (b + 1, b). */
    static List<LocalShape> allShapes(int p) {
        List<LocalShape> out = new ArrayList<>();
        for (int n = 0; n < p * p - 1; n++) {
            if (n % (p + 1) != 0) {
                out.add(LocalShape.irreducible(p, n));
            }
        }
        for (int a = 0; a < p - 1; a++) {
            for (int b = 0; b < p - 1; b++) {
                out.add(LocalShape.reducible(p, LocalShape.Kind.SPLIT, a, b));
                out.add(LocalShape.reducible(p, LocalShape.Kind.NONSPLIT, a, b));
            }
            out.add(LocalShape.reducible(p, LocalShape.Kind.TRES, a + 1, a));
        }
        return out;
    }

    @Test
    void serreWeightIsTheLeastWeightOfTheBdjSet() {
        int checked = 0;
        for (int p : primes()) {
            for (LocalShape rho : allShapes(p)) {
                Set<Weight> w = SerreWeights.bdj(rho);
                assertFalse(w.isEmpty(), () -> "W empty for " + rho);
                for (Weight sigma : w) {
                    assertTrue(sigma.isWeightFor(p), () -> sigma + " out of range for " + rho);
                }
                int k = SerreWeights.serreK(rho);
                assertTrue(2 <= k && k <= p * p - 1, () -> "k = " + k + " out of range for " + rho);
                assertEquals(k, SerreWeights.minimalWeight(w, p), () -> rho + " W = " + w);
                checked++;
            }
        }
        assertEquals(expectedShapeCount(), checked);
    }

    /** Number of shapes: (p² − 1) − (p − 1) irreducible, 2(p − 1)² reducible pairs (split counted twice), p − 1 très. */
    private static int expectedShapeCount() {
        int total = 0;
        for (int p : primes()) {
            total += (p * p - 1) - (p - 1) + 2 * (p - 1) * (p - 1) + (p - 1);
        }
        return total;
    }

    /**
     * The guess "k(ρ̄) = least r + 2 + s(p + 1) over W(ρ̄)" (a weight r + 2 form followed by θ^s) is an
     * upper bound only. It fails for p = 5, ρ̄|I_p ≅ (ω * ; 0 ω²) non-split: W = {Sym² ⊗ det²},
     * r + 2 + s(p + 1) = 16, but Serre's recipe (§2, level 1 not tame, α = 2, β = 1) gives
     * 1 + 5·1 + 2 = 8, and Sym² ⊗ det² is a constituent of Sym^6 (as Sym^6 ⊃ θ·Sym^0 ⊗ det with
     * quotient of constituents Sym² and Sym² ⊗ det²; the symConstituents test checks this against
     * Brauer characters).
     */
    @Test
    void naiveThetaFormulaIsOnlyAnUpperBound() {
        int differ = 0;
        for (int p : primes()) {
            for (LocalShape rho : allShapes(p)) {
                int naive = Integer.MAX_VALUE;
                for (Weight sigma : SerreWeights.bdj(rho)) {
                    naive = Math.min(naive, sigma.r() + 2 + sigma.s() * (p + 1));
                }
                int k = SerreWeights.serreK(rho);
                assertTrue(k <= naive, () -> rho.toString());
                if (k != naive) {
                    differ++;
                }
            }
        }
        assertTrue(differ > 0);
        LocalShape rho = LocalShape.reducible(5, LocalShape.Kind.NONSPLIT, 1, 2);
        assertEquals(Set.of(new Weight(2, 2)), SerreWeights.bdj(rho));
        assertEquals(8, SerreWeights.serreK(rho));
        assertTrue(SerreWeights.symConstituents(6, 5).contains(new Weight(2, 2)));
    }

    /**
     * Sizes of W(ρ̄) over Q_p, derived from BDJ 2010, §3, Def. 3.1: two weights in the irreducible case;
     * for reducible shapes one per admissible ordering, plus Sym^{p−1} ⊗ det^b beside Sym^0 ⊗ det^b when
     * a − b ≡ 1 and ρ̄ is peu ramifié (très ramifié: Sym^{p−1} ⊗ det^b alone).
     */
    @Test
    void sizesOfTheBdjSet() {
        for (int p : primes()) {
            for (LocalShape rho : allShapes(p)) {
                int size = SerreWeights.bdj(rho).size();
                int expected;
                if (rho.isIrreducible()) {
                    expected = 2;
                } else {
                    int d = Math.floorMod(rho.a() - rho.b(), p - 1);
                    switch (rho.kind()) {
                        case TRES -> expected = 1;
                        case NONSPLIT -> expected = d == 1 ? 2 : 1;
                        default -> expected = d == 0 ? 1 : (d == 1 || d == p - 2) ? 3 : 2;
                    }
                }
                assertEquals(expected, size, rho::toString);
            }
        }
    }

    /** W(ρ̄ ⊗ ω^j) = W(ρ̄) ⊗ det^j: the crystalline-lift condition of BDJ Def. 3.1 is twist-compatible. */
    @Test
    void bdjCommutesWithTwisting() {
        for (int p : new int[] {5, 7, 13, 31}) {
            for (LocalShape rho : allShapes(p)) {
                for (int j : new int[] {1, -1, p - 2, 3 * p}) {
                    assertEquals(SerreWeights.twist(SerreWeights.bdj(rho), j, p),
                            SerreWeights.bdj(rho.twist(j)), () -> rho + " twisted by " + j);
                }
            }
        }
    }

    /**
     * The range of k(ρ̄): least value 2 and largest value p² − 1, the latter only for the très ramifié
     * ρ̄ ≅ ω^{p−2} ⊗ (ω * ; 0 1) (Serre 1987, §2: (α + 1)(p + 1) with α = p − 2).
     */
    @Test
    void extremesOfSerreWeight() {
        for (int p : primes()) {
            int min = Integer.MAX_VALUE;
            int max = 0;
            List<LocalShape> argmax = new ArrayList<>();
            for (LocalShape rho : allShapes(p)) {
                int k = SerreWeights.serreK(rho);
                min = Math.min(min, k);
                if (k > max) {
                    max = k;
                    argmax.clear();
                }
                if (k == max) {
                    argmax.add(rho);
                }
            }
            assertEquals(2, min);
            assertEquals(p * p - 1, max);
            assertEquals(List.of(LocalShape.reducible(p, LocalShape.Kind.TRES, p - 1, p - 2)), argmax);
        }
    }
}
