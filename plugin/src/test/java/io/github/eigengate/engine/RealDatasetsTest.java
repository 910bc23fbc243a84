package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The whole gate, every check, on real datasets computed with PARI/GP 2.15.2 (Debian package pari-gp): the scripts
 * under fixtures-gp/ and the header of each CSV name the exact commands. True data must produce no error.
 */
class RealDatasetsTest {

    @ParameterizedTest
    @ValueSource(strings = {"level1", "weight2", "higherlevel", "bigfields", "modp", "characters", "bigcharacter"})
    void realDataPassEveryCheck(String name) {
        Report r = new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(Fixture.dataset(name), name)));
        assertEquals(List.of(), Datasets.errors(r));
        assertTrue(r.forms() > 0);
    }

    /**
     * The congruences dataset (fixtures-gp/congruences.gp) gives a_n up to 1000 only, below the Sturm-type bound of
     * some of its true claims: with uncertified=warning nothing is an error, and those claims are warned about.
     */
    @org.junit.jupiter.api.Test
    void trueCongruencesPassOrAreNotCertified() {
        Report r = new Gate(new Settings(1000, java.util.Set.of(), true)).run(List.of(
                new Gate.Dataset(Fixture.dataset("congruences"), "congruences")));
        assertEquals(List.of(), Datasets.errors(r));
        assertTrue(r.certificates().size() >= 10, "certified: " + r.certificates().size());
        assertTrue(r.warnings() > 0);
    }
}
