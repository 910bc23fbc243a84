package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Real embeddings for the plots, against PARI/GP 2.15.2's polrootsreal. */
class EmbeddingsTest {

    @Test
    void goldenRatioField() {
        // polrootsreal(x^2-x-1) = [-0.6180339887498948482, 1.6180339887498948482]
        assertArrayEquals(new double[] {-0.6180339887498948482, 1.6180339887498948482},
                Embeddings.realRoots(QPoly.parse("x^2 - x - 1")), 1e-12);
    }

    @Test
    void aCubicWithOneRealRoot() {
        // polrootsreal(x^3-x-1) = [1.3247179572447460260]
        assertArrayEquals(new double[] {1.3247179572447460260}, Embeddings.realRoots(QPoly.parse("x^3 - x - 1")),
                1e-12);
    }

    @Test
    void aQuarticWithFourRealRootsCloseTogether() {
        // polrootsreal(x^4-10*x^2+1) = [-3.1462643699419723423, -0.31783724519578224473, 0.31783724519578224473,
        // 3.1462643699419723423]
        assertArrayEquals(new double[] {-3.1462643699419723423, -0.31783724519578224473, 0.31783724519578224473,
                3.1462643699419723423}, Embeddings.realRoots(QPoly.parse("x^4 - 10*x^2 + 1")), 1e-12);
    }

    @Test
    void noRealRoot() {
        assertEquals(0, Embeddings.realRoots(QPoly.parse("x^2 + 1")).length);
    }

    @Test
    void anElementIsEvaluatedAtTheRoot() {
        // a_2 = -x of the level-23 form (PARI/GP: mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 2)), at x = φ
        double phi = (1 + Math.sqrt(5)) / 2;
        assertEquals(-phi, Embeddings.evaluate(List.of(Rational.ZERO, Rational.of(-1)), phi), 1e-15);
        assertEquals(0.5, Embeddings.toDouble(Rational.parse("1/2")), 0);
    }
}
