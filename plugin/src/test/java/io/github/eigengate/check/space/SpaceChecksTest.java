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
 * Completeness on real data: datasets/weight2 lists every newform orbit of S_2^new(Γ0(N)) for ten levels (PARI/GP
 * 2.15.2, fixtures-gp/weight2.gp; dim S_2^new(Γ0(37)) = 2, two rational orbits). Planted incompleteness: a missing
 * orbit, an orbit listed twice, one a_p changed within the Ramanujan bound.
 */
class SpaceChecksTest {

    @TempDir
    Path dir;

    private Report run(String forms, String coefficients, String spaces) {
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", coefficients, "spaces.csv", spaces);
        return new Gate(Settings.defaults(), List.of(new SpaceDimension(), new SpaceTraces()))
                .run(List.of(new Gate.Dataset(dir, "data")));
    }

    private static String read(String file) throws IOException {
        return Files.readString(Fixture.dataset("weight2").resolve(file));
    }

    private static String without(String text, String prefix) {
        return text.lines().filter(l -> !l.startsWith(prefix)).collect(Collectors.joining("\n", "", "\n"));
    }

    private static int spaceLine(String spaces, String levelWeight) {
        List<String> lines = spaces.lines().toList();
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(levelWeight)) {
                return i + 1;
            }
        }
        throw new IllegalArgumentException(levelWeight);
    }

    @Test
    void completeSpacesPass() throws IOException {
        Report r = run(read("forms.csv"), read("coefficients.csv"), read("spaces.csv"));
        assertEquals(List.of(), Datasets.lines(r));
    }

    @Test
    void aMissingOrbitIsFound() throws IOException {
        String spaces = read("spaces.csv");
        Report r = run(without(read("forms.csv"), "lev37_wt2_o2,"), without(read("coefficients.csv"),
                "lev37_wt2_o2,"), spaces);
        int line = spaceLine(spaces, "37,2");
        List<String> lines = Datasets.lines(r);
        assertEquals(2, lines.size(), String.join("\n", lines));
        assertEquals("data/spaces.csv:" + line + ": error [space-dimension] space=N=37 k=2: expected dim "
                + "S_k^new(Γ0(N)) = 2, found sum of field degrees = 1 (lev37_wt2_o1:1); the declared forms do not "
                + "fill the new subspace: an orbit is missing (or a field is too small)", lines.get(0));
        assertTrue(lines.get(1).startsWith("data/spaces.csv:" + line + ": error [space-traces] space=N=37 k=2 n=1: "
                + "expected Tr T_1 = 2, found sum of Tr(a_1) = 1; the declared forms' traces differ from the trace "
                + "formula at n = 1, 2, 3, 4, 5 and "), lines.get(1));
    }

    @Test
    void anOrbitListedTwiceIsFound() throws IOException {
        String forms = read("forms.csv") + "copy_of_o1,23,2,,x^2 - x - 1\n";
        String coefficients = read("coefficients.csv") + read("coefficients.csv").lines()
                .filter(l -> l.startsWith("lev23_wt2_o1,")).map(l -> l.replace("lev23_wt2_o1,", "copy_of_o1,"))
                .collect(Collectors.joining("\n", "", "\n"));
        String spaces = read("spaces.csv");
        List<String> lines = Datasets.lines(run(forms, coefficients, spaces));
        int line = spaceLine(spaces, "23,2");
        assertEquals("data/spaces.csv:" + line + ": error [space-dimension] space=N=23 k=2: expected dim "
                + "S_k^new(Γ0(N)) = 2, found sum of field degrees = 4 (lev23_wt2_o1:2, copy_of_o1:2); the declared "
                + "forms exceed the new subspace: an orbit is listed twice or a form is not new of this level and "
                + "weight", lines.get(0));
        assertTrue(lines.get(1).startsWith("data/spaces.csv:" + line + ": error [space-traces] space=N=23 k=2 n=1: "
                + "expected Tr T_1 = 2, found sum of Tr(a_1) = 4;"), lines.get(1));
    }

    @Test
    void oneCoefficientChangedWithinTheBoundIsFound() throws IOException {
        // a_97 of the level-11 form is -7 (the table, PARI/GP); -6 still satisfies 6^2 <= 4*97
        Fixture f = Fixture.of("datasets/weight2/coefficients.csv");
        assertEquals("-7", f.valueOf("lev11_wt2_o1", 97));
        f.plant("lev11_wt2_o1", 97, "-6");
        String spaces = read("spaces.csv");
        List<String> lines = Datasets.lines(run(read("forms.csv"), f.text(), spaces));
        assertEquals(List.of("data/spaces.csv:" + spaceLine(spaces, "11,2") + ": error [space-traces] space=N=11 k=2 "
                + "n=97: expected Tr T_97 = -7, found sum of Tr(a_97) = -6; the declared forms' traces differ from the "
                + "trace formula at n = 97 of 273 compared: an orbit is missing, listed twice, or a "
                + "coefficient is wrong"), lines);
    }

    @Test
    void emptySpaceIsANoteAndOddWeightIsRejected() {
        Report r = run("id,level,weight\n", "form,n,value\n", "level,weight\n13,2\n23,1\n");
        assertEquals(List.of(
                "data/spaces.csv:2: note [space-dimension] space=N=13 k=2: the space is empty (dimension 0) and no "
                        + "forms are declared",
                "data/spaces.csv:3:2: error [table-format] space=line 3: expected an even weight, found 1; with the "
                        + "trivial character there are no forms of odd weight (−I ∈ Γ0(N) acts as (−1)^k)"),
                Datasets.lines(r));
    }

    @Test
    void aSpaceWithFormsButNoCoefficientsIsNotPassedSilently() {
        Report r = run("id,level,weight\nf,11,2\n", "form,n,value\n", "level,weight\n11,2\n");
        assertEquals(List.of("data/spaces.csv:2: warning [space-traces] space=N=11 k=2: expected a_n for some n "
                + "coprime to N in every form, found none; not checked: no index n coprime to the level is given by "
                + "all forms of the space"), Datasets.lines(r));
    }
}
