package io.github.eigengate.check.form;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Real data from PARI/GP (reference/small-levels.csv) and OEIS A006571 (level 11, a_11 = 1). */
class LevelPrimesTest {

    @TempDir
    Path dir;

    @Test
    void realDataPass() {
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/small-levels.csv").run(dir,
                HeckeRelationsTest.SMALL, new LevelPrimes())));
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/level11.csv").run(dir, HeckeRelationsTest.F11,
                new LevelPrimes())));
    }

    @Test
    void squareDividingTheLevelForcesZero() {
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev27", 3, "1");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev27", 3) + ": error [level-primes] "
                        + "form=lev27 n=3: expected 0, found 1; a_p = 0 when p^2 divides the level (p=3, N=27; "
                        + "Li 1975, Thm 3)"),
                Datasets.lines(f.run(dir, HeckeRelationsTest.SMALL, new LevelPrimes())));
    }

    @Test
    void primeExactlyDividingTheLevelForcesTheSquare() {
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev5w4", 5, "-4");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev5w4", 5) + ": error [level-primes] "
                        + "form=lev5w4 n=5: expected a_p^2 = p^(k-2) = 25, found a_p^2 = 16; a_p = ±p^(k/2-1) when p "
                        + "exactly divides the level (p=5, N=5; Atkin–Lehner 1970, Thm 3)"),
                Datasets.lines(f.run(dir, HeckeRelationsTest.SMALL, new LevelPrimes())));
    }
}
