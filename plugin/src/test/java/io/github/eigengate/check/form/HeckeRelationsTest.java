package io.github.eigengate.check.form;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real data: τ(n), n ≤ 1000 (OEIS A000594; reference/tau.csv, computed with PARI/GP {@code ramanujantau});
 * the level-11 weight-2 newform, n ≤ 1000 (OEIS A006571; reference/level11.csv, PARI/GP {@code ellan}); a
 * quadratic-field orbit of level 23 (reference/small-levels.csv, PARI/GP {@code mfcoefs}).
 */
class HeckeRelationsTest {

    static final String DELTA = "id,level,weight\ndelta,1,12\n";
    static final String F11 = "id,level,weight\nf11,11,2\n";
    static final String SMALL = "id,level,weight,field\nlev27,27,2,\nlev5w4,5,4,\nlev23,23,2,x^2 - x - 1\n";

    @TempDir
    Path dir;

    @Test
    void realDataPass() {
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/tau.csv").run(dir, DELTA, new HeckeRelations())));
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/level11.csv").run(dir, F11,
                new HeckeRelations())));
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/small-levels.csv").run(dir, SMALL,
                new HeckeRelations())));
    }

    @Test
    void plantedCompositeCoefficientIsNamed() {
        Fixture f = Fixture.of("reference/tau.csv").plant("delta", 6, "6048");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("delta", 6) + ": error [hecke-relations] "
                        + "form=delta n=6: expected -6048, found 6048; a_mn = a_m a_n for coprime m=2, n=3, a_2=-24, "
                        + "a_3=252 (Diamond–Shurman Prop. 5.8.5)"),
                Datasets.lines(f.run(dir, DELTA, new HeckeRelations())));
    }

    @Test
    void plantedPrimePowerBreaksTheRecursion() {
        // τ(4) = τ(2)^2 − 2^11 = 576 − 2048 = −1472
        Fixture f = Fixture.of("reference/tau.csv").plant("delta", 4, "-1471");
        List<String> lines = Datasets.lines(f.run(dir, DELTA, new HeckeRelations()));
        assertEquals("data/coefficients.csv:" + f.lineOf("delta", 4) + ": error [hecke-relations] form=delta n=4: "
                + "expected -1472, found -1471; a_{p^(r+1)} = a_p a_{p^r} - p^(k-1) a_{p^(r-1)} for p ∤ N (p=2, "
                + "r+1=2) (Diamond–Shurman Prop. 5.8.5)", lines.get(0));
    }

    @Test
    void atAPrimeDividingTheLevelPowersMultiply() {
        // a_121 = a_11^2 = 1 for the level-11 form
        Fixture f = Fixture.of("reference/level11.csv").plant("f11", 121, "-1");
        List<String> lines = Datasets.lines(f.run(dir, F11, new HeckeRelations()));
        assertEquals("data/coefficients.csv:" + f.lineOf("f11", 121) + ": error [hecke-relations] form=f11 n=121: "
                + "expected 1, found -1; a_{p^r} = a_p^r for p | N (p=11) (Diamond–Shurman Prop. 5.8.5)", lines.get(0));
    }

    @Test
    void plantedErrorInAQuadraticField() {
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev23", 10, "2*x + 3");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev23", 10) + ": error [hecke-relations] "
                        + "form=lev23 n=10: expected 2*x + 2, found 2*x + 3; a_mn = a_m a_n for coprime m=2, n=5, "
                        + "a_2=-x, a_5=-2*x (Diamond–Shurman Prop. 5.8.5)"),
                Datasets.lines(f.run(dir, SMALL, new HeckeRelations())));
    }
}
