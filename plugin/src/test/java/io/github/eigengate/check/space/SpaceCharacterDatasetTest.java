package io.github.eigengate.check.space;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end through the readers: datasets/spaces-chi (PARI/GP 2.15.2, fixtures-gp/spaces-chi.gp; see
 * {@link SpaceCharacterTest}) read from disk, forms.csv with its character and zeta columns included.
 */
class SpaceCharacterDatasetTest {

    @TempDir
    Path dir;

    private static String read(String file) throws IOException {
        return Files.readString(Fixture.dataset("spaces-chi").resolve(file));
    }

    private static String without(String text, String prefix) {
        return text.lines().filter(l -> !l.startsWith(prefix)).collect(Collectors.joining("\n", "", "\n"));
    }

    private Report run(String forms, String coefficients) throws IOException {
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", coefficients, "spaces.csv", read("spaces.csv"));
        Report r = new Gate(Settings.defaults(), List.of(new SpaceDimension(), new SpaceTraces()))
                .run(List.of(new Gate.Dataset(dir, "data")));
        assertTrue(Datasets.lines(r).stream().noneMatch(l -> l.startsWith("data/forms.csv")),
                "the forms reader accepts every character row");
        return r;
    }

    private static int spaceLine(String prefix) throws IOException {
        List<String> lines = read("spaces.csv").lines().toList();
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(prefix)) {
                return i + 1;
            }
        }
        throw new IllegalArgumentException(prefix);
    }

    @Test
    void theCompleteDatasetPasses() throws IOException {
        Report r = run(read("forms.csv"), read("coefficients.csv"));
        assertEquals(List.of("data/spaces.csv:" + spaceLine("23,1,") + ": note [space-dimension] space=N=23 k=1 "
                + "χ=5:1/2: completeness of weight 1 not checkable: no formula gives dim S_1(N, χ), so the listing is "
                + "neither passed nor failed", "data/spaces.csv:" + spaceLine("23,1,") + ": note [space-traces] "
                + "space=N=23 k=1 χ=5:1/2: traces of weight 1 not checkable: the trace formula needs k >= 2, so the coefficients are neither passed nor "
                + "failed here"), Datasets.lines(r));
    }

    @Test
    void aMissingFormOfAConjugateCharacterFails() throws IOException {
        Report r = run(without(read("forms.csv"), "chi13_wt4_o2,"), without(read("coefficients.csv"),
                "chi13_wt4_o2,"));
        List<String> lines = Datasets.lines(r);
        int at = spaceLine("13,4,");
        assertEquals(4, lines.size(), String.join("\n", lines)); // and the two weight-1 notes
        assertEquals("data/spaces.csv:" + at + ": error [space-dimension] space=N=13 k=4 χ=2:1/3: expected "
                + "[Q(χ):Q]·dim S_k^new(N, χ) = 2·3 = 6, found sum of field degrees = 2 (chi13_wt4_o1:2); the declared "
                + "forms do not fill the new subspace: an orbit is missing (or a field is too small)", lines.get(0));
        assertTrue(lines.get(1).startsWith("data/spaces.csv:" + at + ": error [space-traces] space=N=13 k=4 χ=2:1/3 "
                + "n=1: expected Tr_{Q(χ)/Q} Tr T_1 = 6, found sum of Tr(a_1) = 2;"), lines.get(1));
    }
}
