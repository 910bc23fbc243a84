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
    @ValueSource(strings = {"level1", "weight2", "higherlevel", "bigfields"})
    void realDataPassEveryCheck(String name) {
        Report r = new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(Fixture.dataset(name), name)));
        assertEquals(List.of(), Datasets.errors(r));
        assertTrue(r.forms() > 0);
    }
}
