package io.github.eigengate.check.curve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Report;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The three curve checks on the PARI/GP datasets of fixtures-gp/curves.gp: datasets/curves (37 rational newforms of
 * weight 2 with 111 curves, a_n = ellan for n ≤ 500, minimal and non-minimal models, additive reduction at 2 and 3,
 * every torsion group of Mazur's list) passes; datasets/curves-planted has one planted error per form, and the
 * values in the expected lines are those written by gp in the header of its curves.csv.
 */
class CurveChecksTest {

    @Test
    void aFormWithoutCoefficientsIsNotPassedSilently(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) {
        // [0,-1,1,-10,-20]: conductor 11, torsion 5 (PARI/GP: ellglobalred, elltors; curves/tate.csv, torsion.csv)
        Datasets.write(dir, "forms.csv", "id,level,weight\nf11,11,2\n", "curves.csv",
                "form,curve,torsion\nf11,\"[0,-1,1,-10,-20]\",5\n");
        assertEquals(List.of("data/curves.csv:2:2: warning [curve-traces] form=f11: expected a_p for some prime p, "
                + "found no a_p in the tables; the curve's a_p cannot be compared: the form has no coefficient at a "
                + "prime (not checked)"), Datasets.lines(Datasets.run(dir)));
    }

    @Test
    void rightCurvesPass() {
        Report r = Datasets.run(Fixture.dataset("curves"));
        assertEquals(List.of(), Datasets.lines(r));
    }

    /**
     * Beyond the header of curves-planted/curves.csv, from gp: elllocalred(ellinit([0,1,0,-165,1427]), 2) =
     * [4, -2, [1,0,0,0], 1] (f = 4, type II*, c = 1); the number of primes p ≤ 500 with differing ellan entries is 49
     * for [0,-1,1,-10,-20] against [0,1,0,-165,1427] and 84 for [0,0,1,-1,0] against [0,1,1,-23,-50]; ellan of the
     * latter at 2 is 0.
     */
    @Test
    void plantedErrorsFailWithFormAndPrime() {
        Report r = Datasets.run(Fixture.dataset("curves-planted"));
        assertEquals(List.of(
                "data/curves.csv:9:2: error [curve-conductor] form=f11_1 p=2: expected f_2 = 0 (level 11), found "
                        + "f_2 = 4 (Kodaira II*, c_2 = 1); the conductor of [0,1,0,-165,1427] is 176 by Tate's "
                        + "algorithm, but the level of the form is 11 (modularity: N_E = level)",
                "data/curves.csv:9:2: error [curve-traces] form=f11_1 p=2: expected a_2 = -2 "
                        + "(data/coefficients.csv:6), found a_2 = 0 (the curve); a_p of the curve "
                        + "[0,1,0,-165,1427] must equal a_p of the form (modularity); they differ at 49 of the 95 "
                        + "primes p ≤ 499 of the table; the curve looks like the twist by -4 of the form's curve "
                        + "(a_p(form) = (-4/p)·a_p(E) at every prime of the table)",
                "data/curves.csv:10:2: error [curve-traces] form=f37_1 p=2: expected a_2 = -2 "
                        + "(data/coefficients.csv:506), found a_2 = 0 (the curve); a_p of the curve [0,1,1,-23,-50] "
                        + "must equal a_p of the form (modularity); they differ at 84 of the 95 primes p ≤ 499 of "
                        + "the table",
                "data/curves.csv:11:3: error [curve-torsion] form=f5077_1 torsion: expected 1, found 3; E(Q)_tors of "
                        + "[0,0,1,-7,6] has order 1 (division polynomials, bounded by #E(F_p) at good primes)",
                "data/curves.csv:12:2: error [table-format] form=f27_1: expected a model with nonzero discriminant, "
                        + "found discriminant 0; the cubic [0,0,0,-3,2] is singular (a node or a cusp), not an "
                        + "elliptic curve"),
                Datasets.lines(r));
    }
}
