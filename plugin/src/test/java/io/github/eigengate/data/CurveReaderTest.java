package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Datasets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad cells of curves.csv are table-format errors with file, line and column, and the good rows still go through.
 * The good rows are real: the level-11 form (a_n = ellan(ellinit([0,-1,1,-10,-20]), 12), PARI/GP; OEIS A006571) and
 * its curve.
 */
class CurveReaderTest {

    private static final String FORMS = "id,level,weight,field\nf11,11,2,\nf23,23,2,x^2 - x - 1\nf11k4,11,4,\n";
    private static final String COEFFS = "form,n,value\n"
            + "f11,1,1\nf11,2,-2\nf11,3,-1\nf11,4,2\nf11,5,1\nf11,6,2\nf11,7,-2\nf11,8,0\nf11,9,-2\nf11,10,-2\n"
            + "f11,11,1\nf11,12,-2\n";

    @Test
    void everyBadCellIsReportedWithItsColumn(@TempDir Path dir) {
        Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", COEFFS, "curves.csv",
                "form,curve,torsion\n"
                        + "f11,\"[0,-1,1,-10,-20]\",5\n"
                        + "f11,\"[0,-1,1,-10]\",\n"
                        + "f11,0 -1 1 -10 -20,\n"
                        + "f11,\"[0,-1,1,x,-20]\",\n"
                        + "f11,\"[0,0,0,0,0]\",\n"
                        + "f99,\"[0,-1,1,-10,-20]\",\n"
                        + "f23,\"[0,-1,1,-10,-20]\",\n"
                        + "f11k4,\"[0,-1,1,-10,-20]\",\n"
                        + "f11,\"[0,-1,1,-10,-20]\",zero\n"
                        + "f11,\"[ 0, -1, +1, -10, -20 ]\",5\n");
        assertEquals(List.of(
                "data/curves.csv:3:2: error [table-format] form=f11: expected [a1,a2,a3,a4,a6] with five integers, "
                        + "found [0,-1,1,-10]; a Weierstrass model has five coefficients a1, a2, a3, a4, a6; this "
                        + "cell has 4",
                "data/curves.csv:4:2: error [table-format] form=f11: expected [a1,a2,a3,a4,a6] with five integers, "
                        + "found 0 -1 1 -10 -20; a curve is written in brackets, e.g. [0,-1,1,-10,-20]",
                "data/curves.csv:5:2: error [table-format] form=f11: expected [a1,a2,a3,a4,a6] with five integers, "
                        + "found [0,-1,1,x,-20]; a4 = 'x' is not a decimal integer",
                "data/curves.csv:6:2: error [table-format] form=f11: expected a model with nonzero discriminant, "
                        + "found discriminant 0; the cubic [0,0,0,0,0] is singular (a node or a cusp), not an "
                        + "elliptic curve",
                "data/curves.csv:7:1: error [table-format] form=f99: expected the id of a form in forms.csv, found "
                        + "f99; the curve names a form that forms.csv does not declare",
                "data/curves.csv:8:1: error [table-format] form=f23: expected a form over Q of weight 2 with the "
                        + "trivial character, found weight 2, field x^2 - x - 1; an elliptic curve over Q corresponds "
                        + "to a rational newform of weight 2 and trivial character (modularity)",
                "data/curves.csv:9:1: error [table-format] form=f11k4: expected a form over Q of weight 2 with the "
                        + "trivial character, found weight 4; an elliptic curve over Q corresponds to a rational "
                        + "newform of weight 2 and trivial character (modularity)",
                "data/curves.csv:10:3: error [table-format] form=f11: expected an integer in [1, 1000000], found "
                        + "zero; 'torsion' must be a decimal integer"),
                Datasets.errors(Datasets.run(dir)).stream().filter(l -> l.contains("curves.csv")).toList());
    }
}
