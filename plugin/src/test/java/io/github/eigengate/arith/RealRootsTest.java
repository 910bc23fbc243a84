package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class RealRootsTest {
    private static QPoly p(String s) {
        return QPoly.parse(s);
    }

    private static Rational q(String s) {
        return Rational.parse(s);
    }

    /** Fixture: PARI/GP {@code polsturm(f,[lo,hi])}; the gp script is at the top of the file. */
    @Test
    void countsInClosedIntervalsAgreeWithPari() {
        int n = 0;
        for (String[] row : Fixtures.rows("real-roots-in-interval.csv")) {
            QPoly f = p(row[0]);
            int expected = Integer.parseInt(row[3]);
            assertEquals(expected, RealRoots.countDistinctRootsIn(f, q(row[1]), q(row[2])), String.join(";", row));
            n++;
        }
        assertEquals(30, n);
    }

    /** Fixture: PARI/GP {@code polsturm(f)}; the gp script is at the top of the file. */
    @Test
    void totalCountsAgreeWithPari() {
        for (String[] row : Fixtures.rows("real-roots-total.csv")) {
            assertEquals(Integer.parseInt(row[1]), RealRoots.countDistinctRealRoots(p(row[0])), row[0]);
        }
    }

    /** Fixture: PARI/GP {@code polsturm} on seeded random polynomials and intervals; script at the top of the file. */
    @Test
    void randomPolynomialsAgreeWithPari() {
        int n = 0;
        for (String[] row : Fixtures.rows("real-roots-random.csv")) {
            QPoly f = p(row[0]);
            String ctx = String.join(";", row);
            assertEquals(Integer.parseInt(row[3]), RealRoots.countDistinctRootsIn(f, q(row[1]), q(row[2])), ctx);
            assertEquals(Integer.parseInt(row[4]), RealRoots.countDistinctRealRoots(f), ctx);
            n++;
        }
        assertEquals(50, n);
    }

    @Test
    void allRootsRealIn() {
        assertTrue(RealRoots.allRootsRealIn(p("x^2 - 2"), q("-2"), q("2")));
        assertFalse(RealRoots.allRootsRealIn(p("x^2 - 2"), q("0"), q("2")));
        // double root at an end, simple root at the other end
        assertTrue(RealRoots.allRootsRealIn(p("x^3 - 5*x^2 + 7*x - 3"), q("1"), q("3")));
        assertFalse(RealRoots.allRootsRealIn(p("x^3 - 5*x^2 + 7*x - 3"), q("1"), q("2")));
        // complex pair
        assertFalse(RealRoots.allRootsRealIn(p("x^2 + 1"), q("-100"), q("100")));
        assertFalse(RealRoots.allRootsRealIn(p("x^3 - 1/3*x^2 + x - 1/3"), q("-100"), q("100")));
        assertTrue(RealRoots.allRootsRealIn(p("x - 5/3"), q("5/3"), q("5/3")));
        assertFalse(RealRoots.allRootsRealIn(p("x - 5/3"), q("0"), q("3/2")));
        assertThrows(IllegalArgumentException.class, () -> RealRoots.allRootsRealIn(p("7"), q("0"), q("1")));
        assertThrows(IllegalArgumentException.class, () -> RealRoots.allRootsRealIn(QPoly.ZERO, q("0"), q("1")));
    }

    @Test
    void rootsWithBoundedSquares() {
        // roots ±sqrt2: squares exactly 2
        assertTrue(RealRoots.allRootsRealWithSquareAtMost(p("x^2 - 2"), q("2")));
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x^2 - 2"), q("199/100")));
        // roots 1 and -3 (double): squares 1 and 9
        assertTrue(RealRoots.allRootsRealWithSquareAtMost(p("x^3 + 5x^2 + 3x - 9"), q("9")));
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x^3 + 5x^2 + 3x - 9"), q("8")));
        // complex roots ±i are rejected whatever the bound
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x^2 + 1"), q("100")));
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x - 1"), q("-1")));
        assertTrue(RealRoots.allRootsRealWithSquareAtMost(p("x"), q("0")));
        assertThrows(IllegalArgumentException.class, () -> RealRoots.allRootsRealWithSquareAtMost(p("3"), q("1")));
        // Ramanujan's tau: tau(2) = -24 (OEIS A000594; gp: ramanujantau(2) -> -24), so x^2 + 24x + 2^11 has |roots| = 2^(11/2)
        // (non-real); the real-root form of the bound is tau(2)^2 <= 4 * 2^11 = 8192: 576 <= 8192.
        assertTrue(RealRoots.allRootsRealWithSquareAtMost(p("x + 24"), q("8192")));
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x + 24"), q("575")));
        // golden-ratio field: roots (1 ± sqrt5)/2, squares (3 ± sqrt5)/2; gp: ((1+sqrt(5))/2)^2 -> 2.6180339887...
        assertTrue(RealRoots.allRootsRealWithSquareAtMost(p("x^2 - x - 1"), q("262/100")));
        assertFalse(RealRoots.allRootsRealWithSquareAtMost(p("x^2 - x - 1"), q("261/100")));
    }

    @Test
    void degreeTwentyWithSpreadRoots() {
        // prod_{k=1}^{20} (x - (k - 10) * 1000/3): roots -3000, ..., 10000/3
        QPoly f = QPoly.ONE;
        for (int k = 1; k <= 20; k++) {
            f = f.multiply(QPoly.x().subtract(QPoly.constant(Rational.of(1000L * (k - 10)).divide(Rational.of(3)))));
        }
        assertEquals(20, RealRoots.countDistinctRealRoots(f));
        assertTrue(RealRoots.allRootsRealIn(f, q("-3000"), q("10000/3")));
        assertFalse(RealRoots.allRootsRealIn(f, q("-3000"), q("9999/3")));
        assertFalse(RealRoots.allRootsRealIn(f.multiply(p("x^2 + 1")), q("-3000"), q("10000/3")));
        assertTrue(RealRoots.allRootsRealIn(f.multiply(f), q("-3000"), q("10000/3")));
        for (int k = 1; k <= 20; k++) {
            Rational r = Rational.of(1000L * (k - 10)).divide(Rational.of(3));
            assertEquals(1, RealRoots.countDistinctRootsIn(f, r, r));
            assertEquals(k, RealRoots.countDistinctRootsIn(f, q("-1000000"), r));
            assertEquals(21 - k, RealRoots.countDistinctRootsIn(f, r, q("1000000")));
        }
    }

    @Test
    void boundaryCases() {
        assertEquals(0, RealRoots.countDistinctRealRoots(p("7")));
        assertEquals(0, RealRoots.countDistinctRootsIn(p("-7"), q("-1"), q("1")));
        assertThrows(IllegalArgumentException.class, () -> RealRoots.countDistinctRealRoots(QPoly.ZERO));
        assertThrows(IllegalArgumentException.class, () -> RealRoots.countDistinctRootsIn(p("x"), q("1"), q("0")));
        assertEquals(1, RealRoots.countDistinctRootsIn(p("x"), q("0"), q("0")));
        assertEquals(1, RealRoots.countDistinctRootsIn(p("-3x^2"), q("-1"), q("0")));
        assertEquals(1, RealRoots.countDistinctRootsIn(p("-3x^2"), q("0"), q("1")));
        assertEquals(0, RealRoots.countDistinctRootsIn(p("-3x^2"), q("1/10"), q("1")));
    }

    /** Property: for products of distinct linear factors the counts are known exactly. */
    @Test
    void randomProductsOfLinearFactors() {
        Random rnd = new Random(2718L);
        for (int t = 0; t < 60; t++) {
            int m = 1 + rnd.nextInt(8);
            java.util.TreeSet<Rational> roots = new java.util.TreeSet<>();
            QPoly f = QPoly.constant(Rational.of(1 + rnd.nextInt(5)).negate());
            for (int k = 0; k < m; k++) {
                Rational r = Rational.of(java.math.BigInteger.valueOf(rnd.nextInt(41) - 20), java.math.BigInteger.valueOf(1 + rnd.nextInt(4)));
                roots.add(r);
                f = f.multiply(QPoly.x().subtract(QPoly.constant(r)));
            }
            f = f.multiply(p("x^2 + x + 1").pow(rnd.nextInt(2)));
            assertEquals(roots.size(), RealRoots.countDistinctRealRoots(f));
            Rational lo = Rational.of(java.math.BigInteger.valueOf(rnd.nextInt(41) - 20), java.math.BigInteger.valueOf(1 + rnd.nextInt(4)));
            Rational hi = lo.add(Rational.of(rnd.nextInt(10)));
            long inside = roots.stream().filter(r -> r.compareTo(lo) >= 0 && r.compareTo(hi) <= 0).count();
            assertEquals(inside, RealRoots.countDistinctRootsIn(f, lo, hi));
        }
    }
}
