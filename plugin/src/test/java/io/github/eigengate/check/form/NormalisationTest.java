package io.github.eigengate.check.form;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real coefficients: Δ has τ(1) = 1, τ(2) = −24 (OEIS A000594, reference/tau.csv); "phi" is the orbit of S_2(Γ0(23))
 * with field x^2 - x - 1, a_1 = 1, a_2 = −x (PARI/GP 2.15.2: {@code apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1],
 * 2))}, as in reference/small-levels.csv).
 */
class NormalisationTest {

    @TempDir
    Path dir;

    private List<String> run(String coefficients) {
        Datasets.write(dir, "forms.csv", "id,level,weight,field\ndelta,1,12,\nphi,23,2,x^2 - x - 1\n",
                "coefficients.csv", coefficients);
        Report r = new Gate(Settings.defaults(), List.of(new Normalisation())).run(
                List.of(new Gate.Dataset(dir, "data")));
        return Datasets.lines(r);
    }

    @Test
    void normalisedFormsPass() {
        assertEquals(List.of(), run("form,n,value\ndelta,1,1\ndelta,2,-24\nphi,1,\"[1,0]\"\nphi,2,-x\n"));
    }

    @Test
    void formsWithoutA1AreNotJudged() {
        assertEquals(List.of(), run("form,n,value\ndelta,2,-24\n"));
    }

    @Test
    void a1OtherThanOneFires() {
        assertEquals(List.of(
                "data/coefficients.csv:2: error [normalisation] form=delta n=1: expected 1, found -24; a newform is "
                        + "normalised so that a_1 = 1",
                "data/coefficients.csv:4: error [normalisation] form=phi n=1: expected 1, found x; a newform is "
                        + "normalised so that a_1 = 1"),
                run("form,n,value\ndelta,1,-24\ndelta,2,-24\nphi,1,x\nphi,2,-x\n"));
    }
}
