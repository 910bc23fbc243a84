package io.github.eigengate.check.space;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.form.AtkinLehner;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * datasets/primesonly (fixtures-gp/primesonly.gp, PARI/GP 2.15.2): atkin_lehner from {@code mfatkineigenvalues},
 * root_number from {@code lfunrootres(lfunmf(mf, f))[3]} (numerical, independent of the signs), coefficients from
 * {@code mfcoefs}.
 */
class AtkinLehnerTest {

    @TempDir
    Path dir;

    private List<String> run(String forms, Check... checks) {
        Datasets.write(dir, "forms.csv", forms, "spaces.csv", Fixture.of("datasets/primesonly/spaces.csv").text(),
                "coefficients.csv", Fixture.of("datasets/primesonly/coefficients.csv").text());
        return Datasets.lines(new Gate(Settings.defaults(), List.of(checks)).run(List.of(new Gate.Dataset(dir,
                "data"))));
    }

    private static String forms() {
        return Fixture.of("datasets/primesonly/forms.csv").text();
    }

    private static int line(String text, String prefix) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith(prefix)) {
                return i + 1;
            }
        }
        throw new IllegalArgumentException(prefix);
    }

    @Test
    void gpSignsAndRootNumbersPass() {
        assertEquals(List.of(), run(forms(), new AtkinLehner(), new AtkinLehnerCount()));
    }

    @Test
    void aWrongSignAtAnExactDivisorFailsThreeWays() {
        // level 30: w_2 = +1, w_3 = -1, w_5 = +1, ε = +1 and a_2 = -w_2 = -1 (gp); the table claims w_2 = -1
        String forms = forms().replace("lev30_wt2_o1,30,2,,,2:+1;3:-1;5:+1,+1", "lev30_wt2_o1,30,2,,,2:-1;3:-1;5:+1,+1");
        int row = line(forms, "lev30_wt2_o1,");
        int aq = line(Fixture.of("datasets/primesonly/coefficients.csv").text(), "lev30_wt2_o1,2,");
        assertEquals(List.of("data/forms.csv:" + row + ":7: error [atkin-lehner] form=lev30_wt2_o1 root_number: expected -1, found "
                        + "+1; the root number is (-1)^(k/2) ∏_{q | N} w_q = -1 for these signs (Atkin–Lehner 1970, "
                        + "Thm 3): root_number or a sign is wrong",
                "data/spaces.csv:10: error [atkin-lehner-count] space=N=30 k=2 q=2: expected 1 with w_2 = +1, 0 with "
                        + "-1, found 0 with +1, 1 with -1 (lev30_wt2_o1:-1); Tr(W_2 | S_k^new) = 1 = -Tr(U_2)/2^(k/2-1) "
                        + "(Atkin–Lehner 1970, Thm 3): a sign in atkin_lehner is wrong or an orbit is missing",
                "data/coefficients.csv:" + aq + ": error [atkin-lehner] form=lev30_wt2_o1 q=2: expected "
                        + "a_2 = 1, found a_2 = -1 with w_2 = -1; for q ‖ N a newform has a_q = -w_q q^(k/2-1) "
                        + "(Atkin–Lehner 1970, Thm 3): the sign in atkin_lehner or a_2 is wrong"),
                run(forms, new AtkinLehner(), new AtkinLehnerCount()));
    }

    @Test
    void atASquareDivisorOnlyTheRootNumberSees() {
        // level 20 = 4·5: a_2 = 0 carries no sign; gp gives w_2 = -1, w_5 = +1, ε = +1
        String forms = forms().replace("lev20_wt2_o1,20,2,,,2:-1;5:+1,+1", "lev20_wt2_o1,20,2,,,2:+1;5:+1,+1");
        int row = line(forms, "lev20_wt2_o1,");
        assertEquals(List.of("data/forms.csv:" + row + ":7: error [atkin-lehner] form=lev20_wt2_o1 root_number: "
                        + "expected -1, found +1; the root number is (-1)^(k/2) ∏_{q | N} w_q = -1 for these signs "
                        + "(Atkin–Lehner 1970, Thm 3): root_number or a sign is wrong"),
                run(forms, new AtkinLehner(), new AtkinLehnerCount()));
    }

    @Test
    void malformedCellsAreTableFormatErrors() {
        String forms = forms().replace("2:+1;3:-1;5:+1,+1", "2:+1;3:-1,+1").replace("11:-1,+1", "11:-1,0")
                .replace("23:-1,+1", "23:minus,+1").replace("3:-1,+1\nlev29", "7:-1,+1\nlev29");
        assertEquals(List.of(
                "data/forms.csv:9:7: error [table-format] form=lev11_wt2_o1: expected +1 or -1, found 0; the root "
                        + "number is a sign",
                "data/forms.csv:11:6: error [table-format] form=lev23_wt2_o1: expected q:+1 or q:-1 for every prime "
                        + "q | N, separated by ';' (primes of 23: 23), found 23:minus; the entry '23:minus' is not of "
                        + "the form q:+1 or q:-1",
                "data/forms.csv:12:6: error [table-format] form=lev27_wt2_o1: expected q:+1 or q:-1 for every prime "
                        + "q | N, separated by ';' (primes of 27: 3), found 7:-1; 7 is not a prime dividing the level "
                        + "27",
                "data/forms.csv:14:6: error [table-format] form=lev30_wt2_o1: expected q:+1 or q:-1 for every prime "
                        + "q | N, separated by ';' (primes of 30: 2;3;5), found 2:+1;3:-1; no sign for the prime 5 of "
                        + "the level"),
                run(forms, new AtkinLehner()));
    }

    @Test
    void aNontrivialCharacterIsNotComparedAndSaysSo() {
        // χ mod 7 with χ(3) = e^(2πi/3) (order 3): W_7 maps such a form to one with character χ̄, so no sign exists
        var chi = io.github.eigengate.arith.DirichletCharacter.fromValues(7, new long[] {3}, new long[] {1},
                new long[] {3});
        var k = io.github.eigengate.arith.NumberField.of(io.github.eigengate.arith.QPoly.parse("x^2 + x + 1"));
        var at = io.github.eigengate.data.SourceLocation.row("data/forms.csv", 2);
        var form = new io.github.eigengate.data.Form("g", 7, 2, k, at, chi);
        var signs = new io.github.eigengate.data.AtkinLehnerSigns("g", java.util.Map.of(7, 1), at.column(6), 0, at);
        var catalog = new io.github.eigengate.data.Catalog(dir, "data", java.util.Map.of("g", form), java.util.Set.of(),
                List.of(), List.of(), List.of(), List.of(), List.of(), List.of(), java.util.Map.of("g", signs));
        var a = new io.github.eigengate.data.Coefficients.Builder<io.github.eigengate.arith.NumberField.Element>();
        a.put(1, k.one(), "data/coefficients.csv", 2);
        List<String> lines = new java.util.ArrayList<>();
        new AtkinLehner().check(new io.github.eigengate.data.FormData<>(form, k, a.build(), k.generator()), catalog,
                new io.github.eigengate.check.FindingSink() {
                    @Override
                    public void report(io.github.eigengate.check.Finding finding) {
                        lines.add(finding.line());
                    }

                    @Override
                    public void examined(String check, io.github.eigengate.check.Subject unit) {
                    }
                });
        assertEquals(List.of("data/forms.csv:2:6: note [atkin-lehner] form=g: not checked: the Atkin–Lehner signs are "
                + "compared for the trivial character only"), lines);
    }
}
