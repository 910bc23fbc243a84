package io.github.eigengate.check.form;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.QPoly;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real data must pass (τ(p), OEIS A000594; level 11, OEIS A006571; level 23, PARI/GP); values built on the
 * boundary of the bound itself must pass and values just beyond it must fail, in Q and in Q(√2).
 */
class RamanujanBoundTest {

    @TempDir
    Path dir;

    @Test
    void realDataPass() {
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/tau.csv").run(dir, HeckeRelationsTest.DELTA,
                new RamanujanBound())));
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/level11.csv").run(dir, HeckeRelationsTest.F11,
                new RamanujanBound())));
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/small-levels.csv").run(dir,
                HeckeRelationsTest.SMALL, new RamanujanBound())));
    }

    @Test
    void tauBeyondTheBoundFails() {
        // 4·7^11 = 7909306972, so |τ(7)| ≤ 88934.2…; 88935 is just beyond
        Fixture f = Fixture.of("reference/tau.csv").plant("delta", 7, "88935");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("delta", 7) + ": error [ramanujan-bound] "
                        + "form=delta n=7: expected a_p^2 <= 4*p^(k-1) = 7909306972, found a_p^2 = 7909434225; "
                        + "Deligne's bound |a_p| <= 2 p^((k-1)/2) fails at p=7"),
                Datasets.lines(f.run(dir, HeckeRelationsTest.DELTA, new RamanujanBound())));
    }

    @Test
    void rationalBoundaryIsInclusive() {
        // 4·p^(k−1) = 16 for p = 2, k = 3: a_2 = ±4 sits exactly on the bound. (With the trivial character real forms
        // have even k, where 4p^(k−1) is never a square, so the exact-boundary case is tested on the decision itself.)
        assertTrue(RamanujanBound.withinBound(QPoly.parse("x - 4"), BigInteger.valueOf(16)));
        assertTrue(RamanujanBound.withinBound(QPoly.parse("x + 4"), BigInteger.valueOf(16)));
        assertFalse(RamanujanBound.withinBound(QPoly.parse("x - 5"), BigInteger.valueOf(16)));
        // through the gate, k = 2, p = 2: |a_2| <= 2√2, so 2 passes and 3 fails
        String forms = "id,level,weight\ng,7,2\n";
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", "form,n,value\ng,2,-2\ng,3,0\n");
        assertEquals(List.of(), Datasets.lines(run()));
        Datasets.write(dir, "coefficients.csv", "form,n,value\ng,2,3\ng,3,0\n");
        assertEquals(List.of("data/coefficients.csv:2: error [ramanujan-bound] form=g n=2: expected a_p^2 <= "
                + "4*p^(k-1) = 8, found a_p^2 = 9; Deligne's bound |a_p| <= 2 p^((k-1)/2) fails at p=2"),
                Datasets.lines(run()));
    }

    @Test
    void quadraticBoundaryInEveryEmbedding() {
        // Q(√2), weight 2, p = 2: the bound is |a_2| ≤ 2√2.
        String forms = "id,level,weight,field\ng,7,2,x^2 - 2\n";
        for (String onOrInside : List.of("2*x", "-2*x", "x + 1", "x - 1", "0", "2")) {
            Datasets.write(dir, "forms.csv", forms, "coefficients.csv", "form,n,value\ng,2," + onOrInside + "\n");
            assertEquals(List.of(), Datasets.lines(run()), onOrInside);
        }
        for (String beyond : List.of("2*x + 1", "x + 2", "3", "3*x")) {
            Datasets.write(dir, "forms.csv", forms, "coefficients.csv", "form,n,value\ng,2," + beyond + "\n");
            assertEquals(1, Datasets.errors(run()).size(), beyond);
        }
    }

    @Test
    void aNonRealEmbeddingFails() {
        Datasets.write(dir, "forms.csv", "id,level,weight,field\ng,7,2,x^2 + 1\n",
                "coefficients.csv", "form,n,value\ng,2,x\n");
        assertEquals(List.of("data/coefficients.csv:2: error [ramanujan-bound] form=g n=2: expected every embedding "
                + "with |a_p|^2 <= 4*p^(k-1) = 8, found x with characteristic polynomial x^2 + 1; Deligne's bound "
                + "|a_p| <= 2 p^((k-1)/2) fails in some complex embedding at p=2 (or a_p is not totally real)"),
                Datasets.lines(run()));
    }

    @Test
    void squaresPolynomialDecidesTheBoundExactly() {
        BigInteger eight = BigInteger.valueOf(8);
        assertTrue(RamanujanBound.withinBound(QPoly.parse("x^2 - 8"), eight)); // ±2√2: on the bound
        assertFalse(RamanujanBound.withinBound(QPoly.parse("x^2 - 9"), eight));
        assertTrue(RamanujanBound.withinBound(QPoly.parse("x^2 - 2*x - 1"), eight)); // 1 ± √2
        assertFalse(RamanujanBound.withinBound(QPoly.parse("x^2 - 4*x + 2"), eight)); // 2 ± √2
    }

    private io.github.eigengate.engine.Report run() {
        return new io.github.eigengate.engine.Gate(io.github.eigengate.engine.Settings.defaults(),
                List.of(new RamanujanBound())).run(List.of(new io.github.eigengate.engine.Gate.Dataset(dir, "data")));
    }
}
