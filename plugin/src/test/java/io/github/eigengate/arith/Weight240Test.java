package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * High weight, where a Sturm sequence swells: the degree-20 orbit of S_240(1), values from PARI/GP
 * (arith/weight240.csv, written by arith/weight240.gp, which states the commands). The decisions of
 * {@link RealRoots} and the characteristic polynomial of {@link NumberField.Element} must agree with gp.
 */
class Weight240Test {

    private static String comment(String key) throws IOException {
        try (InputStream in = Weight240Test.class.getResourceAsStream("/arith/weight240.csv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.startsWith("# " + key + ";")) {
                    return line.substring(key.length() + 3).trim();
                }
            }
        }
        throw new IllegalStateException("no " + key + " line");
    }

    /** gp: polsturm(h,[0,4p^239]) = 20 and polsturm(h,[0,m]) = 19, h the root-squared charpoly. */
    @Test
    void deligneBoundDecidedAsGpDoes() {
        List<String[]> rows = Fixtures.rows("weight240.csv");
        assertEquals(6, rows.size());
        for (String[] r : rows) {
            QPoly chi = QPoly.parse(r[1]);
            Rational b = Rational.parse(r[2]);
            Rational m = Rational.parse(r[4]);
            String ctx = "p=" + r[0];
            assertEquals(Integer.parseInt(r[3]) == 20, RealRoots.allRootsRealWithSquareAtMost(chi, b), ctx);
            assertEquals(Integer.parseInt(r[5]) == 20, RealRoots.allRootsRealWithSquareAtMost(chi, m), ctx);
            QPoly h = squared(chi);
            assertEquals(Integer.parseInt(r[3]), RealRoots.countDistinctRootsIn(h, Rational.ZERO, b), ctx);
            assertEquals(Integer.parseInt(r[5]), RealRoots.countDistinctRootsIn(h, Rational.ZERO, m), ctx);
            assertEquals(Integer.parseInt(r[5]) == 20, RealRoots.allRootsRealIn(h, Rational.ZERO, m), ctx);
        }
    }

    /** gp: charpoly(Mod(a_2, Q)). */
    @Test
    void characteristicPolynomialOfA2() throws IOException {
        NumberField k = NumberField.of(QPoly.parse(comment("field")));
        NumberField.Element a2 = k.element(QPoly.parse(comment("a_2")));
        assertEquals(QPoly.parse(Fixtures.rows("weight240.csv").get(0)[1]), a2.charPoly());
    }

    /** h(x²) = χ(x)χ(−x) (up to sign). */
    private static QPoly squared(QPoly chi) {
        int d = chi.degree();
        Rational[] m = new Rational[d + 1];
        for (int i = 0; i <= d; i++) {
            m[i] = i % 2 == 0 ? chi.coefficient(i) : chi.coefficient(i).negate();
        }
        QPoly prod = chi.multiply(QPoly.of(m));
        Rational[] h = new Rational[d + 1];
        for (int i = 0; i <= d; i++) {
            h[i] = prod.coefficient(2 * i);
        }
        return QPoly.of(h);
    }
}
