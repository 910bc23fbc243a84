package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Checks {@link SerreWeights#symConstituents(int, int)} and {@link SerreWeights#minimalWeight(Weight, int)}.
 *
 * <p>Reference: Brauer characters. A finite-dimensional F̄_p-representation of a finite group has its
 * composition factors determined by its Brauer character (Serre, <i>Linear Representations of Finite
 * Groups</i>, §18.2, Cor. 1 of Thm 42 — section from memory). Every p-regular element of GL2(F_p) is
 * conjugate into the split torus F_p^× × F_p^× or the non-split torus F_{p²}^×, and on a torus the
 * Brauer character is a sum of characters of a finite abelian group, determined by their multiplicities.
 * On diag(x, y) the eigenvalues of Sym^m are x^i y^{m−i}; on ξ ∈ F_{p²}^× (eigenvalues ξ, ξ^p) they are
 * ξ^{i + p(m−i)}. So comparing these multisets of torus characters compares composition factors
 * exactly, independently of the θ-filtration used in the main code.
 */
class SymConstituentsTest {

    /** Multiplicities of torus characters: keys "S i j" (split, mod p − 1) and "N e" (non-split, mod p² − 1). */
    private static Map<String, Integer> torusCharacter(int p, int[][] monomials) {
        Map<String, Integer> out = new HashMap<>();
        int q = p * p - 1;
        for (int[] e : monomials) {
            out.merge("S " + Math.floorMod(e[0], p - 1) + " " + Math.floorMod(e[1], p - 1), 1, Integer::sum);
            out.merge("N " + Math.floorMod(e[0] + p * e[1], q), 1, Integer::sum);
        }
        return out;
    }

    private static int[][] symMonomials(int m) {
        int[][] out = new int[m + 1][];
        for (int i = 0; i <= m; i++) {
            out[i] = new int[] {i, m - i};
        }
        return out;
    }

    private static Map<String, Integer> characterOfSum(int p, List<Weight> weights) {
        Map<String, Integer> out = new HashMap<>();
        for (Weight w : weights) {
            int[][] mon = new int[w.r() + 1][];
            for (int i = 0; i <= w.r(); i++) {
                mon[i] = new int[] {i + w.s(), w.r() - i + w.s()};
            }
            torusCharacter(p, mon).forEach((k, v) -> out.merge(k, v, Integer::sum));
        }
        return out;
    }

    @Test
    void constituentsMatchBrauerCharacters() {
        for (int p : new int[] {5, 7, 11, 13}) {
            for (int m = 0; m <= p * p + 2 * p; m++) {
                List<Weight> jh = SerreWeights.symConstituents(m, p);
                int dim = jh.stream().mapToInt(Weight::dimension).sum();
                assertEquals(m + 1, dim, "dimension of Sym^" + m);
                assertEquals(torusCharacter(p, symMonomials(m)), characterOfSum(p, jh), "p = " + p + ", m = " + m);
            }
        }
    }

    /** Small cases by hand: Sym^p = Sym^1 + Sym^{p−2} ⊗ det; Sym^{p+1} = Sym^2 + Sym^{p−3} ⊗ det^2 + det. */
    @Test
    void smallCasesByHand() {
        assertEquals(List.of(new Weight(4, 0)), SerreWeights.symConstituents(4, 5));
        assertEquals(List.of(new Weight(1, 0), new Weight(3, 1)), SerreWeights.symConstituents(5, 5));
        assertEquals(List.of(new Weight(0, 1), new Weight(2, 0), new Weight(2, 2)), SerreWeights.symConstituents(6, 5));
        assertEquals(List.of(new Weight(0, 0)), SerreWeights.symConstituents(0, 7));
    }

    /** The closed formula equals the least m + 2 with σ among the constituents of Sym^m. */
    @Test
    void minimalWeightMatchesScan() {
        for (int p : new int[] {5, 7, 11, 13, 17, 23}) {
            Map<Weight, Integer> first = new HashMap<>();
            for (int m = 0; first.size() < p * (p - 1); m++) {
                for (Weight w : SerreWeights.symConstituents(m, p)) {
                    first.putIfAbsent(w, m + 2);
                }
            }
            for (int r = 0; r < p; r++) {
                for (int s = 0; s < p - 1; s++) {
                    Weight w = new Weight(r, s);
                    assertEquals(first.get(w), SerreWeights.minimalWeight(w, p), "p = " + p + ", " + w);
                }
            }
        }
    }

    @Test
    void rejectsBadArguments() {
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.symConstituents(-1, 5));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.symConstituents(3, 3));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.minimalWeight(new Weight(5, 0), 5));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.minimalWeight(new Weight(0, 4), 5));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.minimalWeight(List.of(), 5));
    }
}
