package io.github.eigengate.check.weights;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Report;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The four weight checks on forms computed with PARI/GP 2.15.2 (src/test/resources/weights: weights.gp writes
 * coefficients.csv; companion-search.gp found the companion pairs). The a_p residues used below, from that fixture:
 * e11 (newform of level 11, OEIS A006571): a_7 = −2, a_13 = 4, a_19 = 0, a_29 = 0; delta (τ, OEIS A000594):
 * τ(11) ≡ 1 mod 11, τ(13) ≡ 8 mod 13, τ(23) ≡ 1 mod 23, τ(2411) ≡ 0 mod 2411
 * ({@code ramanujantau(p) % p}); g27 (level 27, weight 6): a_5 = a_11 = 0, a_7 = −211 ≡ 6 mod 7; e21: a_5 = −2;
 * g21 (level 21, weight 4): a_5 = −18; w16 (level 1, weight 16): a_31 ≡ 1 mod 31, w18: a_17 ≡ 1 mod 17;
 * f23 (level 23, field x^2 − x − 1): a_11 ≡ 1 mod (11, x + 3), a_43 ≡ 0 mod (43, x^2 + 42x + 42)
 * ({@code lift(Mod(lift(a[p+1]), g))} for each factor g of {@code factormod(y^2-y-1, p)}).
 *
 * <p>Expected weights, each from a published statement applied to those residues:
 * <ul>
 *   <li>supersingular, 2 ≤ k ≤ p: k(ρ̄) = k (Serre 1987, §2; Edixhoven 1992, Thm 2.6 — from memory) and
 *       W = {Sym^{k−2}, Sym^{p+1−k} ⊗ det^{k−2}} (BDJ 2010, §3 — from memory); supersingular k = p + 1 as k = 2;</li>
 *   <li>ordinary non-split, 2 ≤ k ≤ p − 1: W = {Sym^{k−2}} (plus Sym^{p−1} when k = 2, peu ramifié);
 *       ordinary split adds Gross's companion weight Sym^{p−1−k} ⊗ det^{k−1} (Gross 1990; BDJ 2010, §3 — from
 *       memory); k(ρ̄) = k for 2 ≤ k ≤ p (Edixhoven 1992, §4 — from memory);</li>
 *   <li>ordinary of weight p + 1, très ramifié: W = {Sym^{p−1}}, k(ρ̄) = p + 1 (Serre 1987, §2 — from memory).
 *       For Δ at 11 and the weight-18 form at 17 this is the truth, not an assumption: peu ramifié or split would
 *       give k(ρ̄) = 2, and ρ̄ would come from S_2(SL2(Z)) = 0 (Serre's conjecture, level 1; Khare–Wintenberger).</li>
 *   <li>Δ is its own companion at 23: τ(ℓ) ≡ ℓ^11 τ(ℓ) mod 23, as τ(ℓ) ≡ 0 when (ℓ/23) = −1 (Serre, Sém. Bourbaki
 *       416 (1972) — from memory; checked for ℓ &lt; 300 with
 *       {@code select(l->l!=23 && (ramanujantau(l)-l^11*ramanujantau(l))%23, primes(300))}, which is empty); the
 *       weight-16 form is its own companion at 31 (companion-search.gp).</li>
 * </ul>
 */
class WeightChecksTest {

    @TempDir
    Path dir;

    static final String[] CORRECT = {
        "e11,19,,,2,\"(0,0);(18,0)\",,",            // supersingular, k = 2
        "e11,29,,,2,\"(0,0);(28,0)\",,",            // supersingular, k = 2
        "e11,7,,,2,\"(0,0);(6,0)\",,",              // ordinary, no companion (none at N = 11): non-split, peu
        "e21,5,,,2,\"(0,0);(4,0);(2,1)\",,",        // ordinary, companion g21: split
        "g21,5,,,4,\"(2,0);(0,3);(4,3)\",,",        // ordinary k = 4, companion e21: split
        "delta,23,,,12,\"(10,0);(10,11)\",,",       // its own companion
        "delta,11,,,12,\"(10,0)\",,",               // k = p + 1, très ramifié (assumed, and true)
        "delta,13,,,12,\"(10,0)\",,",               // ordinary, no companion (S_2(1) = 0)
        "delta,2411,,,12,\"(10,0);(2400,10)\",,",   // supersingular in weight 12
        "g27,11,,,6,\"(4,0);(6,4)\",,",             // supersingular in weight 6
        "g27,5,,,2,\"(0,0);(4,0)\",,",              // supersingular in weight p + 1 = 6
        "f23,43,x^2 + 42*x + 42,,2,\"(0,0);(42,0)\",,", // supersingular at an inert prime of Q(√5)
        "w16,31,,,16,\"(14,0);(14,15)\",,",         // its own companion
        "w18,17,,,18,\"(16,0)\",,",                 // k = p + 1, très ramifié
        ",5,,,8,\"(2,2)\",nonsplit,1;2",            // docs/theory-serre-weights.md: k = 8, not 16
    };

    @Test
    void correctTablesPassWithANoteForEachAssumption() {
        List<String> lines = Scenario.weights(CORRECT).congruences("g21,e21,5,3", "delta,delta,23,11", "w16,w16,31,15")
                .lines(dir);
        assertEquals(List.of(
                "data/modp-weights.csv:4:4: note [weight-of-form] form=e11 p=7: a_7 ≡ 5 mod 7: ordinary and no "
                        + "companion form of weight 6 is declared in congruences.csv: assumed non-split at 7 (Gross "
                        + "1990); write local=split if it splits",
                "data/modp-weights.csv:8:4: note [weight-of-form] form=delta p=11: a_11 ≡ 1 mod 11: ordinary of "
                        + "weight p + 1 = 12 with no 'local' and no congruence to a weight-2 form of level prime to "
                        + "11: assumed très ramifié (then k(ρ̄) = 12); write local=nonsplit if ρ̄ is peu ramifié (then "
                        + "k(ρ̄) = 2)",
                "data/modp-weights.csv:9:4: note [weight-of-form] form=delta p=13: a_13 ≡ 8 mod 13: ordinary and no "
                        + "companion form of weight 2 is declared in congruences.csv: assumed non-split at 13 (Gross "
                        + "1990); write local=split if it splits",
                "data/modp-weights.csv:15:4: note [weight-of-form] form=w18 p=17: a_17 ≡ 1 mod 17: ordinary of "
                        + "weight p + 1 = 18 with no 'local' and no congruence to a weight-2 form of level prime to "
                        + "17: assumed très ramifié (then k(ρ̄) = 18); write local=nonsplit if ρ̄ is peu ramifié (then "
                        + "k(ρ̄) = 2)"), lines);
    }

    @Test
    void declaringTheLocalShapeSilencesTheNotes() {
        List<String> lines = Scenario.weights("e11,7,,nonsplit,2,\"(0,0);(6,0)\",,", "delta,11,,tres,12,\"(10,0)\",,",
                "delta,13,,nonsplit,12,\"(10,0)\",,", "w18,17,,tres,18,\"(16,0)\",,").lines(dir);
        assertEquals(List.of(), lines);
    }

    @Test
    void wrongSerreWeightIsCaught() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:5: error [serre-weight] form=e11 p=19: expected 2, found 19; Serre's "
                        + "weight of ρ̄ with ρ̄|I_19 ≅ ω₂^1 ⊕ ω₂^19 [a_19 ≡ 0 mod 19: supersingular (Fontaine)] (Serre "
                        + "1987, §2)",
                "data/modp-weights.csv:3:5: error [serre-weight] form=delta p=11: expected 2, found 12; Serre's "
                        + "weight of ρ̄ with ρ̄|I_11 ≅ (ω^1 * ; 0 ω^0) non-split, peu ramifié [a_11 ≡ 1 mod 11: ordinary "
                        + "(Deligne), local=nonsplit] (Serre 1987, §2)"),
                Scenario.weights("e11,19,,,19,,,", "delta,11,,nonsplit,12,,,").lines(dir));
    }

    @Test
    void wrongWeightInTheSetIsCaught() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:6: error [weight-set] form=g27 p=11: expected (4,0);(6,4), found "
                        + "(4,0);(6,5); missing (6,4), extra (6,5); W(ρ̄) for ρ̄|I_11 ≅ ω₂^5 ⊕ ω₂^55 [a_11 ≡ 0 mod 11: "
                        + "supersingular (Fontaine)] (Buzzard–Diamond–Jarvis 2010, §3)"),
                Scenario.weights("g27,11,,,,\"(4,0);(6,5)\",,").lines(dir));
    }

    @Test
    void droppedCompanionWeightIsCaught() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:6: error [weight-set] form=e21 p=5: expected (0,0);(2,1);(4,0), found "
                        + "(0,0);(4,0); missing (2,1); W(ρ̄) for ρ̄|I_5 ≅ ω^0 ⊕ ω^1 [a_5 ≡ 3 mod 5: ordinary (Deligne), "
                        + "split: companion form declared at data/congruences.csv:2 (Gross 1990)] (Buzzard–Diamond–Jarvis "
                        + "2010, §3)"),
                Scenario.weights("e21,5,,,2,\"(0,0);(4,0)\",,")
                .congruences("g21,e21,5,3").lines(dir));
    }

    @Test
    void withoutTheDeclaredCompanionDeltaAt23IsAssumedNonSplitAndItsSetNoLongerFits() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:6: error [weight-set] form=delta p=23: expected (10,0), found "
                        + "(10,0);(10,11); extra (10,11); W(ρ̄) for ρ̄|I_23 ≅ (ω^11 * ; 0 ω^0) non-split [a_23 ≡ 1 mod "
                        + "23: ordinary (Deligne), non-split assumed] (Buzzard–Diamond–Jarvis 2010, §3)",
                "data/modp-weights.csv:2:4: note [weight-of-form] form=delta p=23: a_23 ≡ 1 mod 23: ordinary "
                        + "and no companion form of weight 12 is declared in congruences.csv: assumed non-split at 23 "
                        + "(Gross 1990); write local=split if it splits"),
                Scenario.weights("delta,23,,,12,\"(10,0);(10,11)\",,").lines(dir));
    }

    @Test
    void localContradictingTheDataIsAnError() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:4: error [weight-of-form] form=e11 p=19: expected an empty cell "
                        + "(supersingular), found split; a_19 ≡ 0 mod 19: the form is supersingular at 19, so ρ̄|I_19 is "
                        + "irreducible, ω₂^1 ⊕ ω₂^19 (Fontaine; Edixhoven 1992, Thm 2.6), and has no split/non-split shape",
                "data/modp-weights.csv:3:4: error [weight-of-form] form=g27 p=11: expected an empty cell "
                        + "(supersingular), found nonsplit; a_11 ≡ 0 mod 11: the form is supersingular at 11, so ρ̄|I_11 "
                        + "is irreducible, ω₂^5 ⊕ ω₂^55 (Fontaine; Edixhoven 1992, Thm 2.6), and has no split/non-split "
                        + "shape",
                "data/modp-weights.csv:4:4: error [weight-of-form] form=e11 p=7: expected split or nonsplit, "
                        + "found tres; très ramifié needs ω^(k−1) = ω and k ≠ 2 (weight 2 is finite flat), i.e. k = p + 1 "
                        + "= 8, but k = 2 (Serre 1987, §2; Edixhoven 1992, §2)"),
                Scenario.weights("e11,19,,split,,,,", "g27,11,,nonsplit,,,,",
                "e11,7,,tres,,,,").lines(dir));
    }

    @Test
    void declaredShapeIsCheckedAgainstAPAndTheFormsOwnWeight() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:7: error [weight-of-form] form=e11 p=19: expected irreducible, found "
                        + "nonsplit; a_19 ≡ 0 mod 19: the form is supersingular at 19, so ρ̄|I_19 is irreducible "
                        + "(Fontaine; Edixhoven 1992, Thm 2.6)",
                "data/modp-weights.csv:3:8: error [weight-of-form] form=e11 p=29: expected (0,0) in W(ρ̄), "
                        + "found W(ρ̄) = (1,0);(27,1); e11 has weight 2 and level prime to 29, so its own weight Sym^0 "
                        + "lies in W(ρ̄) (Buzzard–Diamond–Jarvis 2010, §3); ρ̄|I_29 ≅ ω₂^2 ⊕ ω₂^58 [shape=irreducible 2]",
                "data/modp-weights.csv:4:7: error [weight-of-form] form=e11 p=13: expected split, nonsplit or "
                        + "tres, found irreducible; a_13 ≡ 4 mod 13: the form is ordinary at 13, so ρ̄|I_13 is reducible, "
                        + "(ω^1 * ; 0 1) (Deligne; Edixhoven 1992, Thm 2.5)",
                "data/modp-weights.csv:5:8: error [weight-of-form] form=w16 p=13: expected one of "
                        + "(0,1);(2,0);(10,2) in W(ρ̄), found W(ρ̄) = (4,0);(6,5); w16 has weight 16 and level prime to "
                        + "13, so a Jordan–Hölder constituent of Sym^14 lies in W(ρ̄) (Ash–Stevens 1986; "
                        + "Buzzard–Diamond–Jarvis 2010, §3); ρ̄|I_13 ≅ ω^0 ⊕ ω^5 [shape=split 0;5]"),
                Scenario.weights("e11,19,,,,,nonsplit,1;0", "e11,29,,,,,irreducible,2",
                "e11,13,,,,,irreducible,1", "w16,13,,,,,split,0;5").lines(dir));
    }

    @Test
    void declaredShapeConsistentWithTheFormPasses() {
        // Sym^14 for p = 13 has the constituents (2,0), (10,2) and (0,1) (docs/theory-serre-weights.md, Q_m and θ);
        // W(ω₂^15 ⊕ ω₂^195) = {(0,1), (12,1)} meets them, and e11 at 29 is supersingular of weight 2.
        assertEquals(List.of(), Scenario.weights("w16,13,,,16,,irreducible,15", "e11,29,,,2,,irreducible,1",
                "e11,13,,,,,nonsplit,1;0").lines(dir));
    }

    @Test
    void congruenceTwistsWeightsInTheRightDirection() {
        // a_ℓ(g27) ≡ ℓ^5 a_ℓ(e27) and a_ℓ(e27) ≡ ℓ^1 a_ℓ(g27) mod 7 say the same (companion-search.gp); ℓ^1 in the
        // first direction does not.
        assertEquals(List.of(
                "data/congruences.csv:4: error [weight-congruence] congruence=g27~e27 p=7: expected "
                        + "(0,1);(4,2);(6,1), found (0,5);(4,0);(6,5); missing (0,1);(4,2);(6,1), extra "
                        + "(0,5);(4,0);(6,5); a_ℓ(g27) ≡ ℓ^1 a_ℓ(e27) mod 7 gives ρ̄_g27 ≅ ρ̄_e27 ⊗ ω^1, so W(ρ̄_g27) = "
                        + "W(ρ̄_e27) ⊗ det^1 (Buzzard–Diamond–Jarvis 2010, §3); rows at data/modp-weights.csv:3 [a_7 ≡ 6 "
                        + "mod 7: ordinary (Deligne), split: companion form declared at data/congruences.csv:2 (Gross "
                        + "1990)] and data/modp-weights.csv:2 [a_7 ≡ 6 mod 7: ordinary (Deligne), split: companion form "
                        + "declared at data/congruences.csv:2 (Gross 1990)]"),
                Scenario.weights("e27,7,,,,,,", "g27,7,,,,,,")
                .congruences("g27,e27,7,5", "e27,g27,7,1", "g27,e27,7,1").lines(dir));
        assertEquals(List.of(), Scenario.weights("e27,7,,,2,\"(0,0);(6,0);(4,1)\",,",
                "g27,7,,,6,\"(4,0);(0,5);(6,5)\",,").congruences("e27,g27,7,1").lines(dir.resolve("other")));
    }

    @Test
    void aDeclaredCompanionContradictsANonSplitRow() {
        assertEquals(List.of(
                "data/congruences.csv:2: error [weight-congruence] congruence=g27~e27 p=7: expected split at 7, "
                        + "found nonsplit 1;0 at data/modp-weights.csv:2; a_ℓ(g27) ≡ ℓ^5 a_ℓ(e27) mod 7 gives ρ̄_g27 ≅ "
                        + "ρ̄_e27 ⊗ ω^5 with weights 6 + 2 = p + 1 and j ≡ k − 1: a companion pair, so ρ̄|G_7 is split "
                        + "(Gross 1990; Coleman–Voloch 1992), but the row of e27 says (ω^1 * ; 0 ω^0) non-split, peu "
                        + "ramifié [a_7 ≡ 6 mod 7: ordinary (Deligne), local=nonsplit]"),
                Scenario.weights("e27,7,,nonsplit,,,,", "g27,7,,,,,,")
                .congruences("g27,e27,7,5").lines(dir));
    }

    @Test
    void theWeightOfAFormWithoutARowMustLieInTheTwistedSet() {
        assertEquals(List.of(
                "data/congruences.csv:3: error [weight-congruence] congruence=g21~e21 p=5: expected (2,0) in "
                        + "W(ρ̄_e21) ⊗ det^2, found W(ρ̄_e21) ⊗ det^2 = (0,2);(2,3);(4,2); a_ℓ(g21) ≡ ℓ^2 a_ℓ(e21) mod 5 "
                        + "gives ρ̄_g21 ≅ ρ̄_e21 ⊗ ω^2; g21 has weight 4 and level prime to 5, so its own weight Sym^2 "
                        + "lies in W(ρ̄) (Buzzard–Diamond–Jarvis 2010, §3); row of e21 at data/modp-weights.csv:2 [a_5 ≡ "
                        + "3 mod 5: ordinary (Deligne), split: companion form declared at data/congruences.csv:2 (Gross "
                        + "1990)]"),
                Scenario.weights("e21,5,,,,,,")
                .congruences("g21,e21,5,3", "g21,e21,5,2").lines(dir));
        assertEquals(List.of(
                "data/congruences.csv:3: error [weight-congruence] congruence=e21~g21 p=5: expected (2,0) in "
                        + "W(ρ̄_e21) ⊗ det^1, found W(ρ̄_e21) ⊗ det^1 = (0,1);(2,2);(4,1); a_ℓ(e21) ≡ ℓ^3 a_ℓ(g21) mod 5 "
                        + "gives ρ̄_e21 ≅ ρ̄_g21 ⊗ ω^3; g21 has weight 4 and level prime to 5, so its own weight Sym^2 "
                        + "lies in W(ρ̄) (Buzzard–Diamond–Jarvis 2010, §3); row of e21 at data/modp-weights.csv:2 [a_5 ≡ "
                        + "3 mod 5: ordinary (Deligne), split: companion form declared at data/congruences.csv:2 (Gross "
                        + "1990)]"),
                Scenario.weights("e21,5,,,,,,")
                .congruences("e21,g21,5,1", "e21,g21,5,3").lines(dir.resolve("other")));
    }

    @Test
    void formsDeclaredReducibleAreSkipped() {
        // e11 mod 5 is reducible, a_ℓ ≡ 1 + ℓ mod 5 (X_0(11) has a rational 5-torsion point): with PARI/GP,
        // E=ellinit([0,-1,1,-10,-20]); select(l->l!=11 && (ellap(E,l)-1-l)%5, primes(200)) is empty.
        // The congruence with e21 is not examined either.
        assertEquals(List.of(
                "data/modp-weights.csv:2: note [table-format] form=e11 p=5: ρ̄ is declared reducible at "
                        + "data/reducible.csv:2; the weight recipes assume ρ̄ irreducible, so this row is not checked",
                "data/modp-weights.csv:3:4: note [weight-of-form] form=e21 p=5: a_5 ≡ 3 mod 5: ordinary and no "
                        + "companion form of weight 4 is declared in congruences.csv: assumed non-split at 5 (Gross "
                        + "1990); write local=split if it splits"),
                Scenario.weights("e11,5,,,,,,", "e21,5,,,,,,")
                .congruences("e11,e21,5,0").reducible("e11,5,0,1").lines(dir));
    }

    @Test
    void malformedCellsAndUncheckableRowsAreTableFormatErrors() {
        List<String> lines = Scenario.weights("e11,3,,,,,,", "e11,4,,,,,,", "nope,7,,,,,,", "e11,7,,peu,,,,",
                "e11,13,,split,,,nonsplit,1;0", ",7,,,,,nonsplit,", "e11,7,x+1,,,,,", "f23,11,x + 4,,,,,",
                "f23,11,x + 3,,,,,", "f23,11,x+3,,,,,", "e11,7,,,1,\"(7,0)\",,", ",7,,,,,irreducible,8",
                ",7,,,,,tres,1;1", "fake,5,,,,,,", ",,,,,,,").lines(dir);
        assertEquals(List.of(
                "data/modp-weights.csv:2:2: error [table-format] form=e11 p=3: expected a prime p ≥ 5, found 3; "
                        + "p = 2 and p = 3 are not supported: the weight recipes used here assume p ≥ 5",
                "data/modp-weights.csv:3:2: error [table-format] form=e11 p=4: expected a prime p ≥ 5, found 4; "
                        + "'p' must be a prime number",
                "data/modp-weights.csv:4:1: error [table-format] form=nope p=7: expected a form id from "
                        + "forms.csv, found nope; no form with this id is declared",
                "data/modp-weights.csv:5:4: error [table-format] form=e11 p=7: expected split, nonsplit or "
                        + "tres, found peu; 'local' names the shape of an ordinary ρ̄ at p",
                "data/modp-weights.csv:6:4: error [table-format] form=e11 p=13: expected an empty cell, found "
                        + "split; give either 'local' (with the form's a_p) or 'shape' and 'exponents', not both",
                "data/modp-weights.csv:7:8: error [table-format] p=7: expected a;b, found an empty cell; "
                        + "'shape' is given, so 'exponents' is needed too",
                "data/modp-weights.csv:8:3: error [table-format] form=e11 p=7: expected an empty cell, found "
                        + "x+1; the form has rational coefficients: reduction is mod p",
                "data/modp-weights.csv:9:3: error [table-format] form=f23 p=11: expected one of x + 3; x + 7, "
                        + "found x + 4; not a monic irreducible factor of x^2 - x - 1 modulo 11",
                "data/modp-weights.csv:10:4: note [weight-of-form] form=f23 p=11 prime=x + 3: a_11 ≡ 1 mod (11, "
                        + "x + 3): ordinary and no companion form of weight 10 is declared in congruences.csv: assumed "
                        + "non-split at 11 (Gross 1990); write local=split if it splits",
                "data/modp-weights.csv:11: error [table-format] form=f23 p=11 prime=x + 3: expected one row per "
                        + "form, p and prime, found a second row; this representation already has a row at line 10; this "
                        + "row is left out",
                "data/modp-weights.csv:12:5: error [table-format] form=e11 p=7: expected an integer in [2, 48], "
                        + "found 1; Serre's weight is normalised to 2 ≤ k(ρ̄) ≤ p² − 1 (an unramified ρ̄ has k(ρ̄) = p)",
                "data/modp-weights.csv:12:6: error [table-format] form=e11 p=7: expected (r,s);(r,s);... with 0 "
                        + "≤ r ≤ 6, 0 ≤ s ≤ 5, found (7,0); weight set \"(7,0)\", column 2: r = 7 is out of range 0..6 "
                        + "for p = 7",
                "data/modp-weights.csv:12:4: note [weight-of-form] form=e11 p=7: a_7 ≡ 5 mod 7: ordinary and no "
                        + "companion form of weight 6 is declared in congruences.csv: assumed non-split at 7 (Gross "
                        + "1990); write local=split if it splits",
                "data/modp-weights.csv:13:8: error [table-format] p=7: expected n with n ≢ 0 mod p + 1, found "
                        + "8; irreducible shape with n = 8 for p = 7: n ≡ 0 mod p + 1 = 8, so ω₂^n = ω^1 has level 1 and "
                        + "ω₂^n ⊕ ω₂^{pn} is reducible; use split/nonsplit instead",
                "data/modp-weights.csv:14:8: error [table-format] p=7: expected a;b, found 1;1; très ramifié "
                        + "shape with a = 1, b = 1 for p = 7: très ramifié needs a − b ≡ 1 mod p − 1 = 6",
                "data/modp-weights.csv:15:3: error [table-format] form=fake p=5: expected a prime above 5 named "
                        + "by a factor of x^2 - 125 mod 5, found an empty cell; 5 divides the index of Z[x] in the ring "
                        + "of integers of Q[x]/(x^2 - 125) (Dedekind's criterion), so the primes above 5 cannot be named "
                        + "by the factors of the defining polynomial modulo 5",
                "data/modp-weights.csv:16:2: error [table-format] p=?: expected a prime p ≥ 5, found an empty "
                        + "cell; 'p' must be a prime number"), lines);
    }

    @Test
    void rowsThatNeedAShapeOrAMissingAPAreErrors() {
        assertEquals(List.of(
                "data/modp-weights.csv:2:7: error [table-format] form=w18 p=13: expected shape and exponents, "
                        + "found an empty cell; the weight 18 is outside 2 ≤ k ≤ p + 1 = 14: a_p decides ρ̄|I_p only for "
                        + "2 ≤ k ≤ p + 1 and p ∤ N (Deligne, Fontaine), so describe ρ̄ at p in 'shape' and 'exponents'",
                "data/modp-weights.csv:3:7: error [table-format] form=e11 p=11: expected shape and exponents, "
                        + "found an empty cell; p = 11 divides the level 11: a_p decides ρ̄|I_p only for 2 ≤ k ≤ p + 1 "
                        + "and p ∤ N (Deligne, Fontaine), so describe ρ̄ at p in 'shape' and 'exponents'",
                "data/modp-weights.csv:4:1: error [table-format] form=e11 p=61: expected a_61 in the "
                        + "coefficient tables, found none; a_61 of e11 is needed to tell ordinary from supersingular at 61",
                "data/modp-weights.csv:5:3: error [table-format] form=f23 p=11: expected one of x + 3; x + 7, "
                        + "found an empty cell; several primes lie above 11 in Q[x]/(x^2 - x - 1): name one in 'prime'",
                "data/modp-weights.csv:6:6: error [table-format] form=e11 p=19: expected (r,s);(r,s);... in one "
                        + "quoted cell, found (0; the weight set was split at its commas: quote the cell, e.g. "
                        + "\"(0,0);(4,0)\"; the row is left out"),
                Scenario.weights("w18,13,,,,,,", "e11,11,,,,,,", "e11,61,,,,,,",
                "f23,11,,,,,,", "e11,19,,,,(0,0);(18,0),,").lines(dir));
    }

    @Test
    void tableProblemsAreReportedOnceByTheFirstCheckThatRuns() {
        Scenario s = Scenario.weights("e11,3,,,,,,", "e11,19,,split,,,,");
        Report all = s.report(dir, Set.of());
        assertEquals(1, Datasets.lines(all).stream().filter(l -> l.contains("[table-format]")).count());
        assertEquals(List.of(
                "data/modp-weights.csv:2:2: error [table-format] form=e11 p=3: expected a prime p ≥ 5, found 3; "
                        + "p = 2 and p = 3 are not supported: the weight recipes used here assume p ≥ 5",
                "data/modp-weights.csv:3:4: error [weight-of-form] form=e11 p=19: expected an empty cell "
                        + "(supersingular), found split; a_19 ≡ 0 mod 19: the form is supersingular at 19, so ρ̄|I_19 is "
                        + "irreducible, ω₂^1 ⊕ ω₂^19 (Fontaine; Edixhoven 1992, Thm 2.6), and has no split/non-split shape"), Datasets.lines(s.report(dir, Set.of("serre-weight"))));
        Report none = s.report(dir, Set.copyOf(WeightChecks.IDS));
        assertEquals(List.of(), Datasets.lines(none));
    }

    @Test
    void congruencesMatchRowsByTheirNamedPrimes() {
        // A made-up twisted congruence at 43 between f23 at its inert prime (supersingular: a_43 ≡ 0, see the class
        // comment) and e11, ordinary at 43 (a_43 = -6 ≡ 37 mod 43, theory/serre/ap-mod-p.csv): both have
        // W = {(0,0),(42,0)} (weight 2, peu ramifié or supersingular) and a twist by det^1 cannot match.
        String weights = Scenario.WEIGHTS_HEADER + "f23,43,x^2 + 42*x + 42,,,,,\ne11,43,,nonsplit,,,,\n";
        String matched = "form,other,p,twist,prime\nf23,e11,43,1,x^2 + 42*x + 42\n";
        List<String> lines = Scenario.weights().file("modp-weights.csv", weights).file("congruences.csv", matched)
                .lines(dir);
        assertEquals(1, lines.size(), String.join("\n", lines));
        assertTrue(lines.get(0).startsWith("data/congruences.csv:2: error [weight-congruence] congruence=f23~e11 "
                + "p=43: expected (0,1);(42,1), found (0,0);(42,0); missing (0,1);(42,1), extra (0,0);(42,0); "
                + "a_ℓ(f23) ≡ ℓ^1 a_ℓ(e11) mod 43"), lines.get(0));
        String otherPrime = "form,other,p,twist,prime\nf23,e11,43,1,x^2 + 1\n";
        assertEquals(List.of(), Scenario.weights().file("modp-weights.csv", weights)
                .file("congruences.csv", otherPrime).lines(dir.resolve("other")));
    }

    @Test
    void weightPPlusOneIsPeuRamifieWhenACongruenceToWeightTwoIsDeclared() {
        // h11 (level 11, weight 8, field x^2 - 15) ≡ e11 mod (7, x + 6), twist 0 (weights.gp); a_7(h11) = 164x - 614
        // ≡ 5 there: ordinary of weight p + 1. Arising in weight 2, ρ̄ is peu ramifié and k(ρ̄) = 2 (Serre 1987, §2;
        // Edixhoven 1992, §4 — from memory), W = {(0,0),(6,0)}; at (7, x + 1), where no congruence is declared
        // (a_7 ≡ 6), très ramifié is assumed and noted. Declaring k(ρ̄) = 8 at the first prime is caught.
        String weights = Scenario.WEIGHTS_HEADER + "h11,7,x + 6,,2,\"(0,0);(6,0)\",,\n"
                + "h11,7,x + 1,,8,\"(6,0)\",,\ne11,7,,,2,\"(0,0);(6,0)\",,\n";
        String congruences = "form,other,p,twist,prime\nh11,e11,7,0,x + 6\n";
        List<String> lines = Scenario.weights().file("modp-weights.csv", weights).file("congruences.csv", congruences)
                .lines(dir);
        assertEquals(List.of(
                "data/modp-weights.csv:3:4: note [weight-of-form] form=h11 p=7 prime=x + 1: a_7 ≡ 6 mod (7, x + 1): "
                        + "ordinary of weight p + 1 = 8 with no 'local' and no congruence to a weight-2 form of level "
                        + "prime to 7: assumed très ramifié (then k(ρ̄) = 8); write local=nonsplit if ρ̄ is peu "
                        + "ramifié (then k(ρ̄) = 2)",
                "data/modp-weights.csv:4:4: note [weight-of-form] form=e11 p=7: a_7 ≡ 5 mod 7: ordinary and no "
                        + "companion form of weight 6 is declared in congruences.csv: assumed non-split at 7 (Gross "
                        + "1990); write local=split if it splits"), lines);
        String planted = weights.replace("h11,7,x + 6,,2,", "h11,7,x + 6,,8,");
        List<String> bad = Scenario.weights().file("modp-weights.csv", planted).file("congruences.csv", congruences)
                .lines(dir.resolve("bad"));
        assertEquals("data/modp-weights.csv:2:5: error [serre-weight] form=h11 p=7 prime=x + 6: expected 2, found 8; "
                + "Serre's weight of ρ̄ with ρ̄|I_7 ≅ (ω^1 * ; 0 ω^0) non-split, peu ramifié [a_7 ≡ 5 mod (7, x + 6): "
                + "ordinary (Deligne), peu ramifié: congruent to a weight-2 form at data/congruences.csv:2] (Serre "
                + "1987, §2)", bad.get(0));
    }

    @Test
    void primeCellsThatCannotBeReadAreNamed() {
        List<String> lines = Scenario.weights("f23,11,x +,,,,,", "f23,7,x + 1/7,,,,,", "f23,5,2*x + 4,,,,,").lines(dir);
        assertEquals(3, lines.size(), String.join("\n", lines));
        assertTrue(lines.get(0).startsWith("data/modp-weights.csv:2:3: error [table-format] form=f23 p=11: expected one "
                + "of x + 3; x + 7, found x +; "), lines.get(0));
        assertTrue(lines.get(1).startsWith("data/modp-weights.csv:3:3: error [table-format] form=f23 p=7: expected one "
                + "of x^2 + 6*x + 6, found x + 1/7; "), lines.get(1));
        // x^2 - x - 1 ≡ (x + 2)^2 mod 5: the only prime above 5 is (5, x + 2); 2*x + 4 is not monic
        assertEquals("data/modp-weights.csv:4:3: error [table-format] form=f23 p=5: expected one of x + 2, found "
                + "2*x + 4; not a monic irreducible factor of x^2 - x - 1 modulo 5", lines.get(2));
    }

    @Test
    void theGateRegistersTheFourChecks() {
        assertTrue(io.github.eigengate.engine.Gate.knownIds().containsAll(WeightChecks.IDS));
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", "id,level,weight\ne11,11,2\n", "coefficients.csv",
                "form,n,value\ne11,1,1\ne11,19,0\n", "modp-weights.csv", "form,p,serre_weight\ne11,19,2\n"));
        assertFalse(r.failed(), String.join("\n", Datasets.lines(r)));
        assertTrue(r.examined().containsKey(SerreWeightCheck.ID), r.examined().toString());
    }
}
