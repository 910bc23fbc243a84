package io.github.eigengate.check.congruence;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * datasets/congruences (fixtures-gp/congruences.gp, PARI/GP 2.15.2): lev21_wt4_o2 ≡ ℓ^3·lev21_wt2_o1 mod 5 for
 * ℓ ∤ 105 (Gross's companion pair, checked in gp for ℓ ≤ 5000). Declared with twist 1 it is false; the finding says
 * that twist 3 makes it hold.
 */
class CongruenceDiagnosisTest {

    @TempDir
    Path dir;

    @Test
    void aFalseClaimThatHoldsWithAnotherTwistSaysWhich() {
        List<String> lines = Datasets.lines(Runs.run(dir, "forms.csv", Runs.all("datasets/congruences/forms.csv"),
                "coefficients.csv", Runs.all("datasets/congruences/coefficients.csv"), "congruences.csv",
                "form,other,p,twist\nlev21_wt4_o2,lev21_wt2_o1,5,1\n"));
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=lev21_wt4_o2~lev21_wt2_o1 p=5 "
                + "j=1: expected a_2(lev21_wt4_o2) = 2^1*a_2(lev21_wt2_o1) = 3 mod (5, x) and (5, x), found "
                + "a_2(lev21_wt4_o2) = 2; the congruence fails at l = 2, the first prime l not dividing 105 where the "
                + "residues differ; it holds for every tabulated l <= 1000 with twist j = 3 instead (mod (5, x) and "
                + "(5, x))"), lines);
    }

    @Test
    void aFalseClaimThatHoldsModAnotherPrimeSaysWhich() {
        // lev11_wt8_o1 (field Q(√15)) ≡ lev11_wt2_o1 mod (7, x + 6) with twist 0 (congruences.csv); x^2 - 15 ≡
        // (x + 1)(x + 6) mod 7 (gp: factormod(x^2-15,7)), and the claim declared at (7, x + 1) is false
        List<String> lines = Datasets.lines(Runs.run(dir, "forms.csv", Runs.all("datasets/congruences/forms.csv"),
                "coefficients.csv", Runs.all("datasets/congruences/coefficients.csv"), "congruences.csv",
                "form,other,p,twist,prime\nlev11_wt8_o1,lev11_wt2_o1,7,0,x + 1\n"));
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=lev11_wt8_o1~lev11_wt2_o1 p=7: "
                + "expected a_2(lev11_wt8_o1) = 2^0*a_2(lev11_wt2_o1) = 5 mod (7, x + 1) and (7, x), found "
                + "a_2(lev11_wt8_o1) = 1; the congruence fails at l = 2, the first prime l not dividing 77 where the "
                + "residues differ; it holds for every tabulated l <= 176 modulo (7, x + 6) and (7, x) instead"), lines);
    }
}
