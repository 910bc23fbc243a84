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
    void anIntegralTraceDoesNotMakeAnAlgebraicInteger() {
        // S_2^new(Γ0(29)), field Q(√2) = Q[x]/(x^2 - 2): a_97 = -6*x - 4 (PARI/GP, fixtures-gp/primesonly.gp). The planted
        // 1/2*x - 4 (= -4 + x/2) has the same trace -8 but charpoly x^2 + 8x + 31/2, which is not in Z[x].
        String forms = Fixture.of("datasets/primesonly/forms.csv").text();
        Fixture clean = Fixture.of("datasets/primesonly/coefficients.csv");
        assertEquals("-6*x - 4", clean.valueOf("lev29_wt2_o1", 97));
        assertEquals(List.of(), Datasets.lines(clean.run(dir, forms, new FieldSanity())));
        Fixture f = Fixture.of("datasets/primesonly/coefficients.csv").plant("lev29_wt2_o1", 97, "1/2*x - 4");
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf("lev29_wt2_o1", 97) + ": error [field-sanity] "
                        + "form=lev29_wt2_o1 n=97: expected a characteristic polynomial in Z[x], found charpoly(a_n) = "
                        + "x^2 + 8*x + 31/2; a_n is not an algebraic integer: its trace is -8 but its characteristic "
                        + "polynomial over Q has a non-integral coefficient (Cohen GTM 138 §4.3)"),
                Datasets.lines(f.run(dir, forms, new FieldSanity())));
    }

    @Test
    void zetaMustBeAPrimitiveRootOfUnityOfTheCharacterOrder() {
        // χ mod 7 with χ(3) = e^(2πi/3) has order 3; in K = Q[x]/(x^2 + x + 1) the class of x is a primitive cube
        // root of unity (x^3 - 1 = (x - 1)(x^2 + x + 1)); 1 is not, nor x + 1 = -x^2 (of order 6).
        var k = io.github.eigengate.arith.NumberField.of(io.github.eigengate.arith.QPoly.parse("x^2 + x + 1"));
        var chi = io.github.eigengate.arith.DirichletCharacter.fromValues(7, new long[] {3}, new long[] {1},
                new long[] {3});
        var form = new io.github.eigengate.data.Form("g", 7, 2, k,
                io.github.eigengate.data.SourceLocation.row("data/forms.csv", 2), chi);
        var a = new io.github.eigengate.data.Coefficients.Builder<io.github.eigengate.arith.NumberField.Element>();
        a.put(1, k.one(), "data/coefficients.csv", 2);
        a.put(2, k.generator(), "data/coefficients.csv", 3);
        assertEquals(List.of(), sanity(new io.github.eigengate.data.FormData<>(form, k, a.build(), k.generator())));
        assertEquals(List.of("data/forms.csv:2: error [field-sanity] form=g zeta: expected a primitive root of unity "
                        + "of order 3 in K, found zeta^1 = 1 (zeta = 1); the character has order 3, so its values need "
                        + "Q(ζ_3) inside the coefficient field through a primitive root of unity"),
                sanity(new io.github.eigengate.data.FormData<>(form, k, a.build(), k.one())));
        assertEquals(List.of("data/forms.csv:2: error [field-sanity] form=g zeta: expected a primitive root of unity "
                        + "of order 3 in K, found zeta^3 = -1 (zeta = x + 1); the character has order 3, so its "
                        + "values need Q(ζ_3) inside the coefficient field through a primitive root of unity"),
                sanity(new io.github.eigengate.data.FormData<>(form, k, a.build(), k.generator().add(k.one()))));
    }

    private static List<String> sanity(io.github.eigengate.data.FormData<?> data) {
        List<String> lines = new java.util.ArrayList<>();
        new FieldSanity().check(data, null, new io.github.eigengate.check.FindingSink() {
            @Override
            public void report(io.github.eigengate.check.Finding finding) {
                lines.add(finding.line());
            }

            @Override
            public void examined(String check, io.github.eigengate.check.Subject unit) {
            }
        });
        return lines;
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
