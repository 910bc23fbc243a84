package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One planted error of each kind in a real orbit of degree 20 (lev389_wt2_o5: S_2^new(Γ0(389)), computed with
 * PARI/GP 2.15.2, see datasets/bigfields and fixtures-gp/bigfields.gp) is caught with the form and n named; the
 * unplanted data pass (RealDatasetsTest).
 */
class PlantedErrorsTest {

    static final String FORM = "lev389_wt2_o5";

    @TempDir
    Path dir;

    private List<String> plant(int n, String value) throws IOException {
        Path src = Fixture.dataset("bigfields");
        Fixture f = Fixture.of("datasets/bigfields/coefficients.csv");
        f.plant(FORM, n, value);
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv", f.text());
        Report r = new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(dir, "data")));
        return Datasets.errors(r);
    }

    private static String original(int n) {
        return Fixture.of("datasets/bigfields/coefficients.csv").valueOf(FORM, n);
    }

    private static int line(int n) {
        return Fixture.of("datasets/bigfields/coefficients.csv").lineOf(FORM, n);
    }

    @Test
    void heckeRelationAtAComposite() throws IOException {
        List<String> errors = plant(6, original(6) + " + 1");
        assertEquals(1, errors.size(), String.join("\n", errors));
        assertTrue(errors.get(0).startsWith("data/coefficients.csv:" + line(6) + ": error [hecke-relations] form="
                + FORM + " n=6: expected "), errors.get(0));
    }

    @Test
    void ramanujanBoundInSomeEmbedding() throws IOException {
        List<String> errors = plant(2, original(2) + " + 3");
        assertTrue(errors.stream().anyMatch(e -> e.startsWith("data/coefficients.csv:" + line(2)
                + ": error [ramanujan-bound] form=" + FORM + " n=2: expected every embedding with |a_p|^2 <= "
                + "4*p^(k-1) = 8, found ")), String.join("\n", errors));
    }

    @Test
    void primeDividingTheLevel() throws IOException {
        // S_2^new(Γ0(37)), datasets/weight2 (PARI/GP): 37 ‖ 37 forces a_37 = ±1; 3^2 | 63 forces a_3 = 0
        Path src = Fixture.dataset("weight2");
        Fixture f = Fixture.of("datasets/weight2/coefficients.csv");
        f.plant("lev37_wt2_o1", 37, "2").plant("lev63_wt2_o1", 3, "1");
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv", f.text());
        List<String> errors = Datasets.errors(new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(dir,
                "data"))));
        assertTrue(errors.contains("data/coefficients.csv:" + f.lineOf("lev37_wt2_o1", 37) + ": error [level-primes] "
                + "form=lev37_wt2_o1 n=37: expected a_p^2 = p^(k-2) = 1, found a_p^2 = 4; a_p = ±p^(k/2-1) when p "
                + "exactly divides the level (p=37, N=37; Atkin–Lehner 1970, Thm 3)"), String.join("\n", errors));
        assertTrue(errors.contains("data/coefficients.csv:" + f.lineOf("lev63_wt2_o1", 3) + ": error [level-primes] "
                + "form=lev63_wt2_o1 n=3: expected 0, found 1; a_p = 0 when p^2 divides the level (p=3, N=63; Li 1975, "
                + "Thm 3)"), String.join("\n", errors));
    }

    @Test
    void nonIntegralCoefficient() throws IOException {
        List<String> errors = plant(7, original(7) + " + 1/3");
        assertTrue(errors.contains("data/coefficients.csv:" + line(7) + ": error [field-sanity] form=" + FORM
                + " n=7: expected an integer trace, found Tr(a_n) = " + traceOf7PlusOneThird()
                + "; a_n is not an algebraic integer, since its trace to Q is not an integer"),
                String.join("\n", errors));
    }

    private static String traceOf7PlusOneThird() {
        var k = io.github.eigengate.arith.NumberField.of(io.github.eigengate.arith.QPoly.parse(
                formsField()));
        return k.element(io.github.eigengate.arith.QPoly.parse(original(7) + " + 1/3")).trace().toString();
    }

    private static String formsField() {
        try {
            for (String l : Files.readAllLines(Fixture.dataset("bigfields").resolve("forms.csv"))) {
                if (l.startsWith(FORM + ",")) {
                    return l.substring(l.lastIndexOf(',') + 1);
                }
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        throw new IllegalStateException("no " + FORM);
    }
}
