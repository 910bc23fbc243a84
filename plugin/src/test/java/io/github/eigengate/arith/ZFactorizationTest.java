package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ZFactorizationTest {
    private static QPoly p(String s) {
        return QPoly.parse(s);
    }

    /** Fixture: PARI/GP {@code factor(f)} and {@code polisirreducible(f)}; script at the top of factor-over-q.csv. */
    @Test
    void factorisationsAgreeWithPari() {
        assertEquals(25, checkFactorisations("factor-over-q.csv"));
    }

    /** Fixture: PARI/GP {@code factor(f)} on seeded random products; script at the top of factor-over-q-random.csv. */
    @Test
    void randomFactorisationsAgreeWithPari() {
        assertEquals(40, checkFactorisations("factor-over-q-random.csv"));
    }

    private static int checkFactorisations(String file) {
        int rows = 0;
        for (String[] row : Fixtures.rows(file)) {
            QPoly f = p(row[0]);
            Map<QPoly, Integer> expected = new HashMap<>();
            for (String part : row[1].split(" \\* ")) {
                int hat = part.lastIndexOf(")^");
                expected.merge(p(part.substring(1, hat)), Integer.parseInt(part.substring(hat + 2)), Integer::sum);
            }
            Map<QPoly, Integer> actual = new HashMap<>();
            for (ZFactorization.Factor fac : ZFactorization.factorWithMultiplicity(f)) {
                actual.merge(fac.factor(), fac.multiplicity(), Integer::sum);
            }
            assertEquals(expected, actual, row[0]);
            assertEquals("1".equals(row[2]), ZFactorization.isIrreducible(f), row[0]);
            rows++;
        }
        return rows;
    }

    /** Cyclotomic polynomials are irreducible over Q (Gauss; e.g. Lang, <i>Algebra</i>, VI §3), and x^n - 1 = prod_{d | n} Phi_d. */
    @Test
    void cyclotomicPolynomials() {
        List<QPoly> phi = new ArrayList<>();
        phi.add(null);
        for (int n = 1; n <= 40; n++) {
            QPoly xn = QPoly.monomial(Rational.ONE, n).subtract(QPoly.ONE);
            QPoly c = xn;
            List<QPoly> divisors = new ArrayList<>();
            for (int d = 1; d < n; d++) {
                if (n % d == 0) {
                    c = c.divRem(phi.get(d))[0];
                    divisors.add(phi.get(d));
                }
            }
            phi.add(c);
            divisors.add(c);
            assertTrue(ZFactorization.isIrreducible(c), "Phi_" + n);
            List<QPoly> got = ZFactorization.factor(xn);
            assertEquals(divisors.size(), got.size(), "x^" + n + " - 1");
            assertTrue(got.containsAll(divisors));
        }
    }

    /** x^d - 2 is irreducible for every d >= 1 (Eisenstein's criterion at 2). */
    @Test
    void eisensteinPolynomials() {
        for (int d = 1; d <= 24; d++) {
            QPoly f = QPoly.monomial(Rational.ONE, d).subtract(QPoly.constant(Rational.of(2)));
            assertTrue(ZFactorization.isIrreducible(f), f.toString());
            assertEquals(List.of(f), ZFactorization.factor(f));
        }
    }

    @Test
    void productOfTwoDegreeTenIrreduciblesIsFastAndExact() {
        // gp: polisirreducible(A) -> 1 and polisirreducible(B) -> 1 for these two
        QPoly a = p("x^10 + 3*x^9 - 7*x^7 + 12*x^5 - 1234567*x^2 + x - 999999937");
        QPoly b = p("3*x^10 - 1180591620717411303424*x^3 + 17*x + 5");
        assertTimeoutPreemptively(Duration.ofSeconds(2), () -> {
            assertTrue(ZFactorization.isIrreducible(a));
            assertTrue(ZFactorization.isIrreducible(b));
            assertEquals(List.of(a, b), ZFactorization.factor(a.multiply(b)));
            assertFalse(ZFactorization.isIrreducible(a.multiply(b)));
        });
    }

    @Test
    void commonCaseDegreeTwentyIsFast() {
        QPoly f = p("x^20 - 3*x + 1").add(QPoly.monomial(Rational.of(new BigInteger("123456789012345678901234567890")), 7));
        ZFactorization.isIrreducible(f); // warm-up
        long t0 = System.nanoTime();
        boolean irr = ZFactorization.isIrreducible(f);
        long ms = (System.nanoTime() - t0) / 1_000_000;
        assertTrue(ms < 500, "took " + ms + " ms");
        // gp: polisirreducible(x^20 + 123456789012345678901234567890*x^7 - 3*x + 1) -> 1
        assertTrue(irr);
    }

    @Test
    void swinnertonDyerPolynomialsReducibleModEveryPrime() {
        // x^4 - 10x^2 + 1 (minimal polynomial of sqrt2 + sqrt3) is irreducible over Q but reducible modulo every
        // prime, since one of 2, 3, 6 is a square mod p; rows for p = 2, 3, 5, 7, 11, 97 of factormod.csv (PARI/GP) agree
        QPoly f = p("x^4 - 10x^2 + 1");
        for (long q : new long[] {2, 3, 5, 7, 11, 13, 17, 19, 23, 97, 101}) {
            assertFalse(FpPoly.fromQPoly(f, q).isIrreducible(), "mod " + q);
        }
        assertTrue(ZFactorization.isIrreducible(f));
        assertTrue(ZFactorization.isIrreducible(f.multiply(QPoly.constant(Rational.parse("-3/7")))));
        assertEquals(List.of(p("x^2 - 2x - 1"), p("x^2 + 2x - 1")), ZFactorization.factor(p("x^4 - 6x^2 + 1")));
    }

    @Test
    void boundaryCases() {
        assertThrows(IllegalArgumentException.class, () -> ZFactorization.factor(QPoly.ZERO));
        assertFalse(ZFactorization.isIrreducible(QPoly.ZERO));
        assertFalse(ZFactorization.isIrreducible(p("5")));
        assertTrue(ZFactorization.factor(p("-5")).isEmpty());
        assertTrue(ZFactorization.isIrreducible(p("2x + 2")));
        assertTrue(ZFactorization.isIrreducible(p("1/2x^2 + 1/3")));
        assertFalse(ZFactorization.isIrreducible(p("x^2")));
        assertFalse(ZFactorization.isIrreducible(p("x^3 + x")));
        assertEquals(List.of(p("x"), p("x"), p("x^2 + 1")), ZFactorization.factor(p("-4x^4 - 4x^2")));
        assertEquals(List.of(p("2x - 1"), p("3x + 1")), ZFactorization.factor(p("x^2 - 1/6x - 1/6")));
    }

    /** Property: products of random polynomials factor into irreducibles that multiply back. */
    @Test
    void randomProductsMultiplyBack() {
        Random rnd = new Random(8080L);
        for (int t = 0; t < 40; t++) {
            QPoly f = QPoly.ONE;
            int parts = 1 + rnd.nextInt(4);
            for (int k = 0; k < parts; k++) {
                long[] c = new long[2 + rnd.nextInt(5)];
                for (int i = 0; i < c.length; i++) {
                    c[i] = rnd.nextInt(2001) - 1000;
                }
                c[c.length - 1] = 1 + rnd.nextInt(5);
                f = f.multiply(QPoly.ofIntegers(c));
            }
            List<QPoly> fac = ZFactorization.factor(f);
            assertTrue(fac.size() >= 1);
            QPoly prod = QPoly.ONE;
            for (QPoly g : fac) {
                assertTrue(ZFactorization.isIrreducible(g), g.toString());
                assertTrue(g.hasIntegerCoefficients());
                assertTrue(g.leadingCoefficient().signum() > 0);
                prod = prod.multiply(g);
            }
            assertEquals(f.monic(), prod.monic(), f.toString());
            assertTrue(fac.size() >= 1 && fac.size() <= f.degree());
        }
    }
}
