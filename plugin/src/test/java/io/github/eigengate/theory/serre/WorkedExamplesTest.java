package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Worked examples: explicit W(ρ̄) and k(ρ̄) for the representations attached to forms of small weight.
 *
 * <p>Sources of the expected values (each row names one):
 * <ul>
 *   <li>[BDJ] derived by hand from Buzzard–Diamond–Jarvis, Duke Math. J. 155 (2010), §3, Def. 3.1 over
 *       Q_p; in particular ω₂^{r+1} ⊕ ω₂^{p(r+1)} has W = {Sym^r, Sym^{p−1−r} ⊗ det^r} (the standard
 *       form of this example, from memory).</li>
 *   <li>[Gross] the companion weight: a split ordinary ρ̄_f of weight k has a companion form of weight
 *       p + 1 − k, i.e. the extra weight Sym^{p−1−k} ⊗ det^{k−1} (B. Gross, <i>A tameness criterion for
 *       Galois representations associated to modular forms (mod p)</i>, Duke Math. J. 61 (1990),
 *       from memory).</li>
 *   <li>[Serre] k(ρ̄) by hand from Serre, Duke Math. J. 54 (1987), §2; for a form f of weight
 *       2 ≤ k ≤ p this is k, and for k = p + 1 it is 2 unless ρ̄_f is très ramifié (Edixhoven,
 *       Invent. Math. 109 (1992), §4 — from memory).</li>
 * </ul>
 * Shapes come from the form via Fontaine/Deligne (Edixhoven 1992, Thms 2.5–2.6).
 */
class WorkedExamplesTest {

    static Stream<Arguments> table() {
        return Stream.of(
                // p, k, supersingular, ordinary kind, W(ρ̄) [BDJ/Gross], k(ρ̄) [Serre]
                // supersingular weight k, 2 ≤ k ≤ p: {Sym^{k−2}, Sym^{p+1−k} ⊗ det^{k−2}} [BDJ]
                Arguments.of(7, 2, true, null, "(0,0);(6,0)", 2),
                Arguments.of(7, 4, true, null, "(2,0);(4,2)", 4),
                Arguments.of(5, 3, true, null, "(1,0);(3,1)", 3),
                Arguments.of(11, 11, true, null, "(1,9);(9,0)", 11),
                // supersingular k = p + 1: ω₂^p ⊕ ω₂, same ρ̄|I_p as k = 2 [BDJ], k(ρ̄) = 2 [Serre]
                Arguments.of(7, 8, true, null, "(0,0);(6,0)", 2),
                // ordinary non-split peu ramifié, 2 < k < p: {Sym^{k−2}} [BDJ]
                Arguments.of(7, 4, false, LocalShape.Kind.NONSPLIT, "(2,0)", 4),
                Arguments.of(11, 6, false, LocalShape.Kind.NONSPLIT, "(4,0)", 6),
                // split ordinary, 2 < k < p − 1: {Sym^{k−2}, Sym^{p−1−k} ⊗ det^{k−1}} [Gross]
                Arguments.of(7, 4, false, LocalShape.Kind.SPLIT, "(2,0);(2,3)", 4),
                Arguments.of(11, 3, false, LocalShape.Kind.SPLIT, "(1,0);(7,2)", 3),
                // split k = p − 1: companion weight 2 = Sym^0 ⊗ det^{p−2}, which also brings Sym^{p−1} ⊗ det^{p−2} [BDJ]
                Arguments.of(7, 6, false, LocalShape.Kind.SPLIT, "(0,5);(4,0);(6,5)", 6),
                // k = 2 ordinary: finite flat, Sym^0 and Sym^{p−1} [BDJ]; split adds Sym^{p−3} ⊗ det [Gross]
                Arguments.of(7, 2, false, LocalShape.Kind.NONSPLIT, "(0,0);(6,0)", 2),
                Arguments.of(7, 2, false, LocalShape.Kind.SPLIT, "(0,0);(4,1);(6,0)", 2),
                // k = p: ρ̄|I_p ≅ (1 * ; 0 1); tame = unramified (weight 1 counted as p), or wild [BDJ, Serre]
                Arguments.of(7, 7, false, LocalShape.Kind.SPLIT, "(5,0)", 7),
                Arguments.of(7, 7, false, LocalShape.Kind.NONSPLIT, "(5,0)", 7),
                // k = p + 1 ordinary: peu ramifié = same as weight 2; très ramifié only Sym^{p−1} [BDJ, Serre]
                Arguments.of(7, 8, false, LocalShape.Kind.NONSPLIT, "(0,0);(6,0)", 2),
                Arguments.of(7, 8, false, LocalShape.Kind.TRES, "(6,0)", 8),
                Arguments.of(5, 6, false, LocalShape.Kind.TRES, "(4,0)", 6),
                Arguments.of(7, 8, false, LocalShape.Kind.SPLIT, "(0,0);(4,1);(6,0)", 2));
    }

    @ParameterizedTest(name = "p={0} k={1} supersingular={2} {3}")
    @MethodSource("table")
    void weightsOfSmallWeightForms(int p, int k, boolean supersingular, LocalShape.Kind kind,
            String expectedW, int expectedK) {
        LocalShape rho = SerreWeights.fromForm(p, k, supersingular, kind);
        Set<Weight> w = SerreWeights.bdj(rho);
        assertEquals(Weight.parseSet(expectedW, p), w, rho::toString);
        assertEquals(expectedW, Weight.formatSet(w));
        assertEquals(expectedK, SerreWeights.serreK(rho), rho::toString);
    }

    static Stream<Arguments> shapes() {
        return Stream.of(
                // p, shape, W [BDJ], k [Serre]
                // (ω * ; 0 ω²) non-split, p = 5: Serre α = 2, β = 1, k = 1 + 5·1 + 2 = 8
                Arguments.of(5, "nonsplit", "1;2", "(2,2)", 8),
                // (ω² * ; 0 ω) = ω ⊗ (ω * ; 0 1) peu: θ of weight 2, k = 1 + 5 + 2 = 8
                Arguments.of(5, "nonsplit", "2;1", "(0,1);(4,1)", 8),
                // très ramifié twist of the same: (α + 1)(p + 1) = 12
                Arguments.of(5, "tres", "2;1", "(4,1)", 12),
                // wild (ω * ; 0 ω): Serre α = β = 1, k = 1 + (p + 1) = p + 2
                Arguments.of(7, "nonsplit", "1;1", "(5,1)", 9),
                // tame ω ⊕ ω: the same k = 1 + p + 1 (θ of a weight-1 form)
                Arguments.of(7, "split", "1;1", "(5,1)", 9),
                // ω₂^{37} ⊕ ω₂^{7·37}, p = 7: 37 = 2 + 7·5, so k = 1 + 7·2 + 5 = 20 [Serre];
                // 37 = 4·8 + 4 + 1 gives (4,4) and 7·37 ≡ 19 = 2·8 + 2 + 1 mod 48 gives (2,2) [BDJ]
                Arguments.of(7, "irreducible", "37", "(2,2);(4,4)", 20));
    }

    @ParameterizedTest(name = "p={0} {1} {2}")
    @MethodSource("shapes")
    void weightsOfExplicitShapes(int p, String word, String exponents, String expectedW, int expectedK) {
        LocalShape rho = LocalShape.parse(p, word, exponents);
        assertEquals(expectedW, Weight.formatSet(SerreWeights.bdj(rho)), rho::toString);
        assertEquals(expectedK, SerreWeights.serreK(rho), rho::toString);
    }
}
