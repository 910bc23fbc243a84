package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The limits of docs/limits.md: each oversized cell found by fuzzing (issue 14) is a clean, fast table-format error
 * (or a form not decided within the budget), never a hang, an exhausted heap or a pass. The coefficients of the
 * level-11 form are OEIS A006571 (a_1..a_3 = 1, -2, -1).
 */
class LimitsTest {

    @TempDir
    Path dir;

    private List<String> run(String forms, String coefficients) {
        return assertTimeoutPreemptively(Duration.ofSeconds(20), () -> Datasets.lines(Datasets.run(
                Datasets.write(dir, "forms.csv", forms, "coefficients.csv", coefficients))));
    }

    @Test
    void aMillionDigitLevelIsRejectedFast() {
        String level = "1".repeat(1_000_000);
        List<String> lines = run("id,level,weight\nf," + level + ",2\n", "form,n,value\n");
        assertEquals(1, lines.size());
        assertEquals("data/forms.csv:2:2: error [table-format] form=f: expected an integer in [1, 2147483647], found "
                + "1".repeat(1000) + "… (1000000 characters); 'level' is out of range", lines.get(0));
    }

    @Test
    void exponentsBeyondTheLimitAreAnErrorAndLargeOnesAreFast() {
        String forms = "id,level,weight,field\nf,11,2,x^5 - x - 1\n";
        List<String> lines = run(forms, "form,n,value\nf,1,1\nf,2,x^100000\nf,3,x^9999 - x^9998\n");
        assertEquals("data/coefficients.csv:3:3: error [table-format] form=f n=2: expected a polynomial in x with "
                + "rational coefficients or a vector [c0, ..., c4], found x^100000; the expression cannot be read at "
                + "character 3: expected an exponent at most 10000", lines.get(0));
        assertTrue(lines.stream().noneMatch(l -> l.contains("n=3") && l.contains("table-format")), lines.toString());
    }

    @Test
    void numbersOfMoreThanAHundredThousandDigitsAreAnError() {
        String big = "7".repeat(100_001);
        List<String> lines = run("id,level,weight,field\nf,11,2,\ng,11,2,x^2 - 5\n",
                "form,n,value\nf,1,1\nf,2," + big + "\ng,1,1\ng,2," + big + "*x\n");
        assertEquals(List.of("data/coefficients.csv:3:3: error [table-format] form=f n=2: expected an integer, found "
                        + "7".repeat(1000) + "… (100001 characters); an integer of at most 100000 digits is accepted",
                "data/coefficients.csv:5:3: error [table-format] form=g n=2: expected a polynomial in x with rational "
                        + "coefficients or a vector [c0, ..., c1], found " + "7".repeat(1000) + "… (100003 characters); the "
                        + "expression cannot be read at character 1: expected a number of at most 100000 digits"),
                lines.stream().filter(l -> l.contains("table-format")).toList());
    }

    /** x^1000 − 2 is irreducible (Eisenstein at 2); deciding it by Zassenhaus costs more than the field allowance. */
    @Test
    void aFieldTooCostlyToFactorIsAClearError() {
        List<String> lines = run("id,level,weight,field\nf,11,2,x^1000 - 2\n", "form,n,value\nf,1,1\n");
        assertEquals("data/forms.csv:2:4: error [table-format] form=f: expected a monic irreducible polynomial in x "
                + "with integer coefficients, found x^1000 - 2; its irreducibility over Q was not decided within the "
                + "work budget of 1000000000 units (a field of this degree and shape is beyond what the gate factors "
                + "in a build; see docs/limits.md); the form is not checked", lines.get(0));
    }

    @Test
    void anOverlongExpressionIsAnError() {
        String sum = "1+".repeat(500_001) + "1";
        List<String> lines = run("id,level,weight,field\ng,11,2,x^2 - 5\n", "form,n,value\ng,1," + sum + "\n");
        assertEquals("data/coefficients.csv:2:3: error [table-format] form=g n=1: expected a polynomial in x with "
                + "rational coefficients or a vector [c0, ..., c1], found " + sum.substring(0, 1000) + "… (1000003 "
                + "characters); the expression cannot be read at character 1000001: expected an expression of at most "
                + "1000000 characters", lines.get(0));
    }

    /**
     * The degree-20 orbit of S_2^new(Γ0(389)) (datasets/bigfields, PARI/GP) under a budget far too small for its
     * Hecke relations: the form is not decided, an error (a warning when configured), the same at 1 and 2 threads.
     */
    @Test
    void aFormBeyondTheBudgetIsNotDecidedNeverPassed() {
        List<Gate.Dataset> sets = List.of(new Gate.Dataset(Fixture.dataset("bigfields"), "bigfields"));
        Settings tight = Settings.defaults().withWorkBudget(100_000, false);
        Report r = new Gate(tight).run(sets);
        String line = "bigfields/forms.csv:15: error [hecke-relations] form=lev389_wt2_o5: expected a verdict within "
                + "the budget, found work beyond 100000 units; not decided within the work budget of 100000 units "
                + "(parameter workBudget): the check was stopped for this form, which is therefore not passed";
        assertTrue(Datasets.lines(r).contains(line), String.join("\n", Datasets.lines(r)));
        assertTrue(r.failed());
        assertEquals(Datasets.lines(r), Datasets.lines(new Gate(tight.withThreads(2)).run(sets)));
        Report warned = new Gate(Settings.defaults().withWorkBudget(100_000, true)).run(sets);
        assertTrue(Datasets.lines(warned).contains(line.replace(": error [", ": warning [")));
        assertTrue(Datasets.errors(warned).stream().noneMatch(l -> l.contains("work budget")));
    }
}
