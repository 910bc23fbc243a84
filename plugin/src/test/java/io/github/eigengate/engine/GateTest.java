package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The gate on small real datasets. Coefficients: the weight-2 newform of level 11, a_1..a_12 = 1, -2, -1, 2, 1, 2,
 * -2, 0, -2, -2, 1, -2 (OEIS A006571); one orbit of S_2(Γ0(23)) with field x^2 - x - 1, computed with PARI/GP 2.15.2
 * (Debian pari-gp): {@code apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 12))}.
 */
class GateTest {

    static final String FORMS = "id,level,weight,character,field\n"
            + "f11,11,2,,\n"
            + "f23,23,2,1,x^2 - x - 1\n";
    static final String[] A11 = {"1", "-2", "-1", "2", "1", "2", "-2", "0", "-2", "-2", "1", "-2"};
    static final String[] A23 = {"1", "-x", "2*x - 1", "x - 1", "-2*x", "-x - 2", "-2*x + 2", "2*x - 1", "2",
        "2*x + 2", "2*x - 4", "-x + 3"};

    @TempDir
    Path dir;

    static String rows(String form, String[] values, int from, int to) {
        StringBuilder b = new StringBuilder();
        for (int n = from; n <= to; n++) {
            b.append(form).append(',').append(n).append(',').append(values[n - 1]).append('\n');
        }
        return b.toString();
    }

    static String coefficients() {
        return "form,n,value\n" + rows("f11", A11, 1, 12) + rows("f23", A23, 1, 12);
    }

    @Test
    void trueDataPass() {
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", coefficients()));
        assertEquals(List.of(), Datasets.lines(r));
        assertFalse(r.failed());
        assertEquals(2, r.forms());
        assertEquals(24, r.rows());
    }

    @Test
    void everyMalformedCellOfARunIsReported() {
        String c = "form,n,value\n" + rows("f11", A11, 1, 3) + "f11,4,two\nf11,x,1\nf99,1,1\nf99,2,1\nf23,1,1\nf23,2,-x^\n"
                + "f23,3,\"[1,2,3]\"\nf23,4,\"[-1,1]\"\nf23,5,[0,1]\n";
        String forms = FORMS + "f1,0,2,,\nf2,3,-4,,\nf3,3,2,chi,\nf4,3,2,,x^2-1\nf5,3,2,,2*x+1\nf6,3,2,,x^2+1/2\n"
                + "f11,11,2,,\n";
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", forms, "coefficients.csv", c));
        List<String> expected = List.of(
                "data/forms.csv:4:2: error [table-format] form=f1: expected an integer in [1, 2147483647], found 0; "
                        + "'level' is out of range",
                "data/forms.csv:5:3: error [table-format] form=f2: expected an integer in [1, 10000], found -4; "
                        + "'weight' is out of range",
                "data/forms.csv:6:4: error [table-format] form=f3: expected empty, 1, or g:a/b pairs joined by ';' "
                        + "with units 1 < g < N that generate (Z/NZ)^×, found chi; pair 1 'chi' is not of the form g:a/b",
                "data/forms.csv:7:5: error [table-format] form=f4: expected a monic irreducible polynomial in x with "
                        + "integer coefficients, found x^2-1; the field polynomial is reducible over Q: it factors "
                        + "as (x - 1)*(x + 1)",
                "data/forms.csv:8:5: error [table-format] form=f5: expected a monic irreducible polynomial in x with "
                        + "integer coefficients, found 2*x+1; the field polynomial is not monic",
                "data/forms.csv:9:5: error [table-format] form=f6: expected a monic irreducible polynomial in x with "
                        + "integer coefficients, found x^2+1/2; the field polynomial has non-integral coefficients",
                "data/forms.csv:10:1: error [table-format] form=f11: expected a unique id, found f11; the id is "
                        + "already used at line 2",
                "data/coefficients.csv:5:3: error [table-format] form=f11 n=4: expected an integer, found two; the "
                        + "form has rational coefficients (no field), so a_n must be an integer",
                "data/coefficients.csv:6:2: error [table-format] form=f11: expected an integer in [1, 2147483647], "
                        + "found x; 'n' must be a decimal integer",
                "data/coefficients.csv:7:1: error [table-format] form=f99: expected a form id from forms.csv, found "
                        + "f99; no form with this id is declared; its rows are skipped",
                "data/coefficients.csv:10:3: error [table-format] form=f23 n=2: expected a polynomial in x with "
                        + "rational coefficients or a vector [c0, ..., c1], found -x^; the expression cannot be read "
                        + "at character 4: expected a nonnegative integer exponent",
                "data/coefficients.csv:11:3: error [table-format] form=f23 n=3: expected a polynomial in x with "
                        + "rational coefficients or a vector [c0, ..., c1], found [1,2,3]; the vector has 3 entries "
                        + "but the field has degree 2",
                "data/coefficients.csv:13:3: error [table-format] form=f23 n=5: expected a polynomial in x with "
                        + "rational coefficients or a vector [c0, ..., c1], found [0; the vector was split at its "
                        + "commas: quote the cell, e.g. \"[1, 2]\"");
        List<String> errors = Datasets.errors(r);
        assertEquals(expected.size(), errors.size(), String.join("\n", errors));
        for (int i = 0; i < expected.size(); i++) {
            String e = expected.get(i);
            if (e.contains("cannot be read at character")) {
                assertTrue(errors.get(i).startsWith(e.substring(0, e.indexOf("at character"))), errors.get(i));
            } else {
                assertEquals(e, errors.get(i));
            }
        }
        assertTrue(r.failed());
    }

    @Test
    void duplicateIndexWithOtherValueIsAnErrorAndWithSameValueAWarning() {
        String c = coefficients() + "f11,5,-1\nf11,6,2\n";
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", c));
        assertEquals(List.of(
                "data/coefficients.csv:26:3: error [table-format] form=f11 n=5: expected 1, found -1; a_5 is given "
                        + "twice with different values (first at data/coefficients.csv:6)",
                "data/coefficients.csv:27:3: warning [table-format] form=f11 n=6: expected each (form, n) once, found "
                        + "2; a_6 is given again with the same value (first at data/coefficients.csv:7)"),
                Datasets.lines(r));
    }

    /** Records every delivered form and the indices it arrived with. */
    static final class Recording implements Check {
        final List<String> seen = new ArrayList<>();

        @Override
        public String id() {
            return "recording";
        }

        @Override
        public String title() {
            return "records deliveries";
        }

        @Override
        public Pass start(Catalog catalog) {
            seen.clear();
            return (FormData<?> form, FindingSink out) ->
                    seen.add(form.form().id() + ":" + form.coefficients().size() + ":" + form.coefficients().maxIndex());
        }
    }

    @Test
    void formsWhoseRowsAreScatteredAcrossRunsAndShardsArriveWholeAndOnce() {
        String main = "form,n,value\n" + rows("f11", A11, 1, 4) + rows("f23", A23, 1, 6) + rows("f11", A11, 5, 8);
        String shard = "value,n,form\n" + A23[6] + ",7,f23\n" + A11[8] + ",9,f11\n";
        Datasets.write(dir, "forms.csv", FORMS + "f37,37,2,,\n", "coefficients.csv", main,
                "coefficients-2.csv", shard);
        Recording rec = new Recording();
        Report r = new Gate(Settings.defaults(), List.of(rec)).run(List.of(new Gate.Dataset(dir, "data")));
        assertEquals(List.of(), Datasets.lines(r));
        assertEquals(List.of("f11:9:9", "f23:7:7", "f37:0:0"), rec.seen.stream().sorted().toList());
    }

    @Test
    void duplicatesAcrossRunsAreFoundWhenRowsAreScattered() {
        String c = "form,n,value\n" + rows("f11", A11, 1, 3) + rows("f23", A23, 1, 2) + "f11,2,5\n";
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", c));
        assertEquals(List.of("data/coefficients.csv:7:3: error [table-format] form=f11 n=2: expected -2, found 5; "
                + "a_2 is given twice with different values (first at data/coefficients.csv:3)"), Datasets.lines(r));
    }

    @Test
    void findingsBeyondTheCapAreCountedNotListed() {
        String c = "form,n,value\nf11,1,a\nf11,2,b\nf11,3,c\n";
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", c),
                new Settings(2, Set.of(), false));
        assertEquals(2, r.findings().size());
        assertEquals(3, r.errors());
        assertEquals(1, r.notKept());
        assertTrue(r.summary().endsWith("; 1 findings beyond the first 2 are counted but not listed"), r.summary());
    }

    @Test
    void missingDatasetAndMissingFormsFileAreErrors() {
        Report r = new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(dir.resolve("nope"), "nope"),
                new Gate.Dataset(Datasets.write(dir.resolve("empty")), "empty")));
        assertEquals(List.of(
                "nope: error [table-format] dataset=nope: expected a dataset directory, found nothing; the dataset "
                        + "directory does not exist",
                "empty/forms.csv: error [table-format] dataset=empty: expected a file forms.csv, found none; every "
                        + "dataset needs forms.csv"), Datasets.lines(r));
    }

    @Test
    void skippedChecksDoNotRun() {
        String c = "form,n,value\nf11,1,3\n";
        Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", c);
        assertTrue(Datasets.run(dir).failed());
        Report skipped = Datasets.run(dir, new Settings(10, Set.of("normalisation"), false));
        assertFalse(skipped.failed());
        assertFalse(skipped.checks().contains("normalisation"));
    }

    @Test
    void claimsTablesWithUnknownColumnsWarn() {
        Datasets.write(dir, "forms.csv", FORMS + "", "coefficients.csv", coefficients(),
                "spaces.csv", "level,weight,extra\n11,2,\n11,2,\n");
        Report r = Datasets.run(dir);
        assertEquals(2, r.warnings(), String.join("\n", Datasets.lines(r)));
        assertTrue(Datasets.lines(r).get(0).startsWith("data/spaces.csv:1:3: warning [table-format]"));
        assertEquals("data/spaces.csv:3: warning [table-format] space=N=11 k=2: expected each space once, found "
                + "N=11 k=2; the space is already declared at line 2", Datasets.lines(r).get(1));
    }

    @Test
    void edgeInputsAreReportedNotCrashed() {
        // a byte-order mark, an odd weight, a weight too large, a rejected form's rows, digits split by a space,
        // and an index near 2^31 (factored by trial division beyond the shared sieve)
        String forms = "\uFEFFid,level,weight\nf11,11,2\nodd,11,3\nhuge,11,20000\n";
        String c = "form,n,value\nf11,1,1\nf11,2,-2\nf11,3,- 1\nf11,5,1 0\nodd,1,1\nf11,2147483647,1\n"
                + "f11,2147483646,3\n";
        List<String> lines = Datasets.lines(Datasets.run(Datasets.write(dir, "forms.csv", forms,
                "coefficients.csv", c)));
        assertEquals(List.of(
                "data/forms.csv:3:3: error [table-format] form=odd: expected an even weight, found 3; with the trivial "
                        + "character there are no forms of odd weight (−I ∈ Γ0(N) acts as (−1)^k)",
                "data/forms.csv:4:3: error [table-format] form=huge: expected an integer in [1, 10000], found 20000; "
                        + "'weight' is out of range",
                "data/coefficients.csv:5:3: error [table-format] form=f11 n=5: expected an integer, found 1 0; "
                        + "whitespace separates two digits; write the number without it",
                "data/coefficients.csv:6:1: error [table-format] form=odd: expected a form id from forms.csv, found "
                        + "odd; the form's row in forms.csv has an error (reported there); its rows are skipped"),
                lines);
    }

    @Test
    void aColumnRepeatedUpToSpacesIsAnError() {
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", "id,level,weight, level\nf,11,2,5\n"));
        assertEquals(List.of("data/forms.csv:1:4: error [table-format] table=data/forms.csv: expected distinct column "
                + "names, found level; the column 'level' appears twice in the header (columns 2 and 4)"),
                Datasets.lines(r));
        assertEquals(0, r.forms());
    }

    @Test
    void aFieldOfHugeDegreeIsRefusedBeforeAnyFactorisation() {
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", "id,level,weight,field\nf,11,2,x^5000 - 2\n"));
        assertEquals(List.of("data/forms.csv:2:4: error [table-format] form=f: expected a monic irreducible polynomial "
                + "in x with integer coefficients, found x^5000 - 2; coefficient fields of degree above 1000 are not "
                + "supported (this one has degree 5000)"), Datasets.lines(r));
    }
}
