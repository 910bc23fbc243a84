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
        // a_8, a_12, … are derived from a_2 alone, so the wrong a_4 breaks only its own relation
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("delta", 4) + ": error [hecke-relations] form=delta "
                + "n=4: expected -1472, found -1471; a_{p^e} from a_p by a_{p^(r+1)} = a_p a_{p^r} - p^(k-1) "
                + "a_{p^(r-1)} for p ∤ N (p=2, e=2, a_2=-24) (Diamond–Shurman Prop. 5.8.5)"),
                Datasets.lines(f.run(dir, DELTA, new HeckeRelations())));
    }

    @Test
    void atAPrimeDividingTheLevelPowersMultiply() {
        // a_121 = a_11^2 = 1 for the level-11 form
        Fixture f = Fixture.of("reference/level11.csv").plant("f11", 121, "-1");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("f11", 121) + ": error [hecke-relations] form=f11 "
                + "n=121: expected 1, found -1; a_{p^r} = a_p^r for p | N (p=11, r=2, a_11=1) (Diamond–Shurman Prop. "
                + "5.8.5)"), Datasets.lines(f.run(dir, F11, new HeckeRelations())));
    }

    @Test
    void plantedErrorInAQuadraticField() {
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev23", 10, "2*x + 3");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev23", 10) + ": error [hecke-relations] "
                        + "form=lev23 n=10: expected 2*x + 2, found 2*x + 3; a_mn = a_m a_n for coprime m=2, n=5, "
                        + "a_2=-x, a_5=-2*x (Diamond–Shurman Prop. 5.8.5)"),
                Datasets.lines(f.run(dir, SMALL, new HeckeRelations())));
    }

    @Test
    void aPrimePowerIsComparedEvenWhenTheIntermediatePowersAreMissing() {
        // τ(2) = -24, τ(8) = 84480 (reference/tau.csv); a_4 is not given
        String clean = "form,n,value\ndelta,1,1\ndelta,2,-24\ndelta,8,84480\n";
        Datasets.write(dir, "forms.csv", DELTA, "coefficients.csv", clean);
        assertEquals(List.of(), Datasets.lines(run()));
        Datasets.write(dir, "forms.csv", DELTA, "coefficients.csv", clean.replace("84480", "84481"));
        assertEquals(List.of("data/coefficients.csv:4: error [hecke-relations] form=delta n=8: expected 84480, found "
                + "84481; a_{p^e} from a_p by a_{p^(r+1)} = a_p a_{p^r} - p^(k-1) a_{p^(r-1)} for p ∤ N (p=2, e=3, "
                + "a_2=-24) (Diamond–Shurman Prop. 5.8.5)"), Datasets.lines(run()));
    }

    @Test
    void aWrongPrimeCoefficientIsNamedAsTheCulpritWithTheValueThatFitsAll() {
        // τ(13) = -577738 (reference/tau.csv): the 75 relations at n = 26, 39, …, 988 and 169, 338, … involve a_13
        Fixture f = Fixture.of("reference/tau.csv").plant("delta", 13, "-577737");
        List<String> lines = Datasets.lines(f.run(dir, DELTA, new HeckeRelations()));
        assertEquals(6, lines.size());
        assertEquals("data/coefficients.csv:" + f.lineOf("delta", 13) + ": error [hecke-relations] form=delta n=13: "
                + "expected -577738, found -577737; likely culprit: 75 relations fail, all involve a_13 (n = 26, 39, "
                + "52, 65, 78 and 70 more); a_13 = -577738 satisfies every relation it enters", lines.get(0));
        assertEquals("data/coefficients.csv:" + f.lineOf("delta", 26) + ": error [hecke-relations] form=delta n=26: "
                + "expected 13865688, found 13865712; a_mn = a_m a_n for coprime m=2, n=13, a_2=-24, a_13=-577737 "
                + "(Diamond–Shurman Prop. 5.8.5)", lines.get(1));
    }

    @Test
    void aGaloisConjugateValueIsNamedWithTheAutomorphism() {
        // level 23, K = Q[x]/(x^2 - x - 1) (reference/small-levels.csv): a_5 = -2*x; its conjugate under x ↦ 1 - x
        // is 2*x - 2, with the same trace -2 and norm -4
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev23", 5, "2*x - 2");
        List<String> lines = Datasets.lines(f.run(dir, SMALL, new HeckeRelations()));
        assertEquals("data/coefficients.csv:" + f.lineOf("lev23", 5) + ": error [hecke-relations] form=lev23 n=5: "
                + "expected -2*x, found 2*x - 2; likely culprit: 5 relations fail, all involve a_5 (n = 10, 15, 20, 25, "
                + "30); a_5 = -2*x satisfies every relation it enters; the value found is σ(-2*x) for the automorphism "
                + "σ: x ↦ -x + 1 of K", lines.get(0));
        assertEquals(6, lines.size());
    }

    @Test
    void valuesWrittenForAnotherFieldPolynomialGiveOneLine() {
        // the level-23 coefficients c0 + c1*y, y = (1 + √5)/2, rewritten in the basis 1, √5 — (c0 + c1/2) + (c1/2)*s —
        // but still declared over x^2 - x - 1
        Fixture clean = Fixture.of("reference/small-levels.csv");
        Fixture f = Fixture.of("reference/small-levels.csv");
        for (int n = 1; n <= 30; n++) {
            io.github.eigengate.arith.QPoly v = io.github.eigengate.arith.QPoly.parse(clean.valueOf("lev23", n));
            io.github.eigengate.arith.Rational c1 = v.coefficient(1).multiply(io.github.eigengate.arith.Rational.of(1)
                    .divide(io.github.eigengate.arith.Rational.of(2)));
            f.plant("lev23", n, io.github.eigengate.arith.QPoly.of(v.coefficient(0).add(c1), c1).toString());
        }
        assertEquals(List.of("data/forms.csv:4: error [hecke-relations] form=lev23: expected the Hecke relations, "
                + "found 18 of 19 relations fail; most relations fail (n = 4, 6, 8, 9, 10 and 13 more), with no single "
                + "coefficient to blame: the values are probably written in another basis or for another field "
                + "polynomial, or belong to another form"), Datasets.lines(f.run(dir, SMALL,
                new HeckeRelations())));
    }

    private io.github.eigengate.engine.Report run() {
        return new io.github.eigengate.engine.Gate(io.github.eigengate.engine.Settings.defaults(),
                List.of(new HeckeRelations())).run(List.of(new io.github.eigengate.engine.Gate.Dataset(dir, "data")));
    }
}
