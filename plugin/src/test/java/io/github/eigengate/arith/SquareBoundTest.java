package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@link RealRoots#allRootsRealWithSquareAtMost} evaluates a Sturm sequence at the irrational ends ±√c. Checked on
 * roots exactly on the ends (c a square, c rational, c irrational), and against an independent decision: the
 * root-squared polynomial F with F(x²) = ±f(x)f(−x) must have all its roots in [0, c] (a rational interval).
 */
class SquareBoundTest {

    private static boolean decide(String f, Rational c) {
        return RealRoots.allRootsRealWithSquareAtMost(QPoly.parse(f), c);
    }

    @Test
    void rootsOnTheEndsCount() {
        assertTrue(decide("x^2 - 4", Rational.of(4)));       // ±2, c a square
        assertTrue(decide("x - 2", Rational.of(4)));
        assertTrue(decide("x + 2", Rational.of(4)));
        assertTrue(decide("x^2 - x - 2", Rational.of(4)));   // 2 and −1
        assertFalse(decide("x^2 + x - 6", Rational.of(4)));  // 2 and −3
        assertTrue(decide("4*x^2 - 9", Rational.of(java.math.BigInteger.valueOf(9), java.math.BigInteger.valueOf(4))));
        assertFalse(decide("x^2 - 3", Rational.of(java.math.BigInteger.valueOf(9), java.math.BigInteger.valueOf(4))));
        assertTrue(decide("x^2 - 8", Rational.of(8)));       // ±2√2 on the ends
        assertTrue(decide("x^4 - 16*x^2 + 64", Rational.of(8))); // (x^2 - 8)^2: double roots on the ends
        assertFalse(decide("x^2 + 1", Rational.of(100)));    // not real
        assertTrue(decide("x", Rational.ZERO));
        assertFalse(decide("x - 1", Rational.ZERO));
    }

    @Test
    void agreesWithTheRootSquaredPolynomialOnRandomRealRootedPolynomials() {
        Random rnd = new Random(20261202);
        int yes = 0;
        for (int trial = 0; trial < 300; trial++) {
            // a product of (x − r_i) and (x^2 − s_i) with small integers: real roots, some irrational, some repeated
            QPoly f = QPoly.ONE;
            int factors = 1 + rnd.nextInt(4);
            for (int i = 0; i < factors; i++) {
                f = f.multiply(rnd.nextBoolean() ? QPoly.ofIntegers(-(rnd.nextInt(9) - 4), 1)
                        : QPoly.ofIntegers(-rnd.nextInt(12), 0, 1));
            }
            if (rnd.nextInt(5) == 0) {
                f = f.multiply(QPoly.ofIntegers(rnd.nextInt(5) + 1, 0, 1)); // a non-real pair
            }
            Rational c = Rational.of(rnd.nextInt(20));
            boolean expected = graeffe(f, c);
            assertEquals(expected, RealRoots.allRootsRealWithSquareAtMost(f, c), f + " with c = " + c);
            if (expected) {
                yes++;
            }
        }
        assertTrue(yes > 30 && yes < 270, "both answers occur: " + yes);
    }

    /** The root-squaring decision: F(x²) = ±g(x)g(−x) for g the squarefree part; all roots of F real in [0, c]. */
    private static boolean graeffe(QPoly f, Rational c) {
        QPoly g = f.squarefreePart();
        int d = g.degree();
        Rational[] m = new Rational[d + 1];
        for (int i = 0; i <= d; i++) {
            m[i] = i % 2 == 0 ? g.coefficient(i) : g.coefficient(i).negate();
        }
        QPoly prod = g.multiply(QPoly.of(m));
        Rational[] h = new Rational[d + 1];
        for (int i = 0; i <= d; i++) {
            h[i] = prod.coefficient(2 * i);
        }
        return RealRoots.allRootsRealIn(QPoly.of(h), Rational.ZERO, c);
    }
}
