package io.github.eigengate.check.form;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The level-23 orbit (PARI/GP, reference/small-levels.csv) has coefficient field Q(√5) = Q[x]/(x^2 - x - 1). */
class FieldSanityTest {

    @TempDir
    Path dir;

    @Test
    void realDataPass() {
        assertEquals(List.of(), Datasets.lines(Fixture.of("reference/small-levels.csv").run(dir,
                HeckeRelationsTest.SMALL, new FieldSanity())));
    }

    @Test
    void nonIntegralTraceIsAnError() {
        Fixture f = Fixture.of("reference/small-levels.csv").plant("lev23", 7, "1/2*x");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev23", 7) + ": error [field-sanity] "
                        + "form=lev23 n=7: expected an integer trace, found Tr(a_n) = 1/2; a_n is not an algebraic "
                        + "integer, since its trace to Q is not an integer"),
                Datasets.lines(f.run(dir, HeckeRelationsTest.SMALL, new FieldSanity())));
    }

    @Test
    void aFieldLargerThanTheCoefficientsNeedIsAWarning() {
        // The same coefficients written in K = Q[x]/(x^4 - 5), where y = (1 + x^2)/2 is a root of y^2 - y - 1.
        StringBuilder c = new StringBuilder("form,n,value\n");
        String[] a = {"1", "-y", "2*y - 1", "y - 1", "-2*y", "-y - 2", "-2*y + 2"};
        for (int n = 1; n <= a.length; n++) {
            c.append("g,").append(n).append(",\"").append(a[n - 1].replace("y", "(1/2 + 1/2*x^2)")
                    .replace("2*(1/2 + 1/2*x^2)", "1 + x^2").replace("-(1/2 + 1/2*x^2)", "-1/2 - 1/2*x^2")
                    .replace("(1/2 + 1/2*x^2)", "1/2 + 1/2*x^2")).append("\"\n");
        }
        Datasets.write(dir, "forms.csv", "id,level,weight,field\ng,23,2,x^4 - 5\n", "coefficients.csv", c.toString());
        var r = new io.github.eigengate.engine.Gate(io.github.eigengate.engine.Settings.defaults(),
                List.of(new FieldSanity())).run(List.of(new io.github.eigengate.engine.Gate.Dataset(dir, "data")));
        assertEquals(List.of("data/forms.csv:2: warning [field-sanity] form=g: expected the a_n generate the field of "
                + "degree 4, found they generate a subfield of degree 2; the field polynomial x^4 - 5 defines a larger "
                + "field than the coefficients need"), Datasets.lines(r));
    }
}
