package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The Descartes-based {@link RealRoots} against the independent Sturm-sequence decision ({@link Sturm}, which the
 * PARI/GP fixtures of {@link RealRootsTest} also check) on seeded random polynomials: counts in intervals, the
 * decision on a rational interval and the decision with irrational ends ±√c, including cases built to defeat the
 * floating-point proposal (clustered roots, roots on the ends, non-real pairs next to the interval).
 */
class DescartesVersusSturmTest {

    private static Rational r(long n, long d) {
        return Rational.of(BigInteger.valueOf(n), BigInteger.valueOf(d));
    }

    private static QPoly linear(Rational root) {
        return QPoly.x().subtract(QPoly.constant(root));
    }

    @Test
    void randomCoefficientsAndIntervals() {
        Random rnd = new Random(1302);
        for (int t = 0; t < 400; t++) {
            int d = 1 + rnd.nextInt(12);
            Rational[] c = new Rational[d + 1];
            for (int i = 0; i <= d; i++) {
                c[i] = r(rnd.nextInt(61) - 30, 1 + rnd.nextInt(7));
            }
            if (c[d].signum() == 0) {
                c[d] = Rational.ONE;
            }
            QPoly f = QPoly.of(c);
            if (rnd.nextInt(3) == 0) {
                f = f.multiply(linear(r(rnd.nextInt(21) - 10, 1 + rnd.nextInt(3))).pow(2));
            }
            Rational lo = r(rnd.nextInt(41) - 20, 1 + rnd.nextInt(3));
            Rational hi = lo.add(r(rnd.nextInt(30), 1 + rnd.nextInt(3)));
            String ctx = f + " on [" + lo + ", " + hi + "]";
            assertEquals(Sturm.countDistinctRootsIn(f, lo, hi), RealRoots.countDistinctRootsIn(f, lo, hi), ctx);
            assertEquals(Sturm.countDistinctRealRoots(f), RealRoots.countDistinctRealRoots(f), ctx);
            if (f.degree() >= 1) {
                assertEquals(Sturm.allRootsRealIn(f, lo, hi), RealRoots.allRootsRealIn(f, lo, hi), ctx);
            }
        }
    }

    /** Real-rooted products, often with roots on or just beside the ends and clusters closer than 2^-53. */
    @Test
    void realRootedProductsNearTheEnds() {
        Random rnd = new Random(97);
        int yes = 0;
        for (int t = 0; t < 80; t++) {
            int m = 1 + rnd.nextInt(12);
            QPoly f = QPoly.ONE;
            for (int k = 0; k < m; k++) {
                Rational root = r(rnd.nextInt(2001) - 1000, 1 + rnd.nextInt(100));
                if (rnd.nextInt(6) == 0) { // a cluster: a second root 10^-20 away
                    f = f.multiply(linear(root.add(r(1, 1).divide(Rational.of(BigInteger.TEN.pow(20))))));
                }
                f = f.multiply(linear(root));
            }
            if (rnd.nextInt(4) == 0) { // a non-real pair close to the real axis: a ± 10^-6 i
                Rational a = r(rnd.nextInt(201) - 100, 7);
                Rational eps = Rational.of(BigInteger.ONE, BigInteger.TEN.pow(12));
                f = f.multiply(linear(a).multiply(linear(a)).add(QPoly.constant(eps)));
            }
            Rational lo = r(-rnd.nextInt(1100), 1 + rnd.nextInt(2));
            Rational hi = r(rnd.nextInt(1100), 1 + rnd.nextInt(2));
            String ctx = f + " on [" + lo + ", " + hi + "]";
            boolean expected = Sturm.allRootsRealIn(f, lo, hi);
            assertEquals(expected, RealRoots.allRootsRealIn(f, lo, hi), ctx);
            assertEquals(Sturm.countDistinctRootsIn(f, lo, hi), RealRoots.countDistinctRootsIn(f, lo, hi), ctx);
            Rational c = Rational.of(rnd.nextInt(1_000_000) + 1);
            assertEquals(Sturm.allRootsRealWithSquareAtMost(f, c), RealRoots.allRootsRealWithSquareAtMost(f, c),
                    f + " with c = " + c);
            if (expected) {
                yes++;
            }
        }
        assertTrue(yes > 5 && yes < 75, "both answers occur: " + yes);
    }

    /** Irrational ends: c not a square, roots placed just inside and just outside ±√c. */
    @Test
    void irrationalEndsAgainstSturm() {
        Random rnd = new Random(5);
        int yes = 0;
        for (int t = 0; t < 300; t++) {
            BigInteger c = BigInteger.valueOf(2 + rnd.nextInt(10_000));
            BigInteger s = c.sqrt();
            QPoly f = QPoly.ONE;
            int m = 1 + rnd.nextInt(10);
            for (int k = 0; k < m; k++) {
                // roots s - j/1000 or (s+1) for a few: inside or outside √c
                long num = s.longValueExact() * 1000 - rnd.nextInt(2000 * (int) s.longValueExact() + 1);
                if (rnd.nextInt(8) == 0) {
                    num = (s.longValueExact() + 1) * 1000;
                }
                f = f.multiply(linear(r(num, 1000)));
            }
            if (rnd.nextInt(5) == 0) {
                f = f.multiply(QPoly.x().pow(2).subtract(QPoly.constant(Rational.of(c)))); // roots exactly ±√c
            }
            Rational bound = Rational.of(c);
            boolean expected = Sturm.allRootsRealWithSquareAtMost(f, bound);
            assertEquals(expected, RealRoots.allRootsRealWithSquareAtMost(f, bound), f + " with c = " + c);
            if (expected) {
                yes++;
            }
        }
        assertTrue(yes > 20 && yes < 280, "both answers occur: " + yes);
    }

    /** Huge ends (the shape of a weight-240 bound) with coefficients of thousands of bits. */
    @Test
    void hugeEnds() {
        BigInteger c = BigInteger.valueOf(4).multiply(BigInteger.valueOf(7).pow(239)); // 4 * 7^239
        BigInteger s = c.sqrt();
        Random rnd = new Random(240);
        for (int t = 0; t < 20; t++) {
            QPoly f = QPoly.ONE;
            QPoly small = QPoly.ONE; // six of the roots: small enough for the Sturm sequence
            for (int k = 0; k < 20; k++) {
                BigInteger root = new BigInteger(s.bitLength() - 1, rnd);
                if (rnd.nextBoolean()) {
                    root = root.negate();
                }
                f = f.multiply(linear(Rational.of(root)));
                if (k < 6) {
                    small = small.multiply(linear(Rational.of(root)));
                }
            }
            boolean outside = t % 3 == 0;
            if (outside) {
                f = f.multiply(linear(Rational.of(s.add(BigInteger.ONE))));
                small = small.multiply(linear(Rational.of(s.add(BigInteger.ONE))));
            }
            // the roots are explicit, so the answer is known
            assertEquals(!outside, RealRoots.allRootsRealWithSquareAtMost(f, Rational.of(c)), "trial " + t);
            assertEquals(!outside, RealRoots.allRootsRealWithSquareAtMost(small, Rational.of(c)), "trial " + t);
            if (t < 4) {
                assertEquals(!outside, Sturm.allRootsRealWithSquareAtMost(small, Rational.of(c)), "trial " + t);
            }
        }
    }
}
