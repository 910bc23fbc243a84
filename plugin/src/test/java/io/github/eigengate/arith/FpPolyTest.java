package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class FpPolyTest {
    /** Fixture: PARI/GP {@code factormod(f,p)}; the gp script is at the top of factormod.csv. */
    @Test
    void factorisationsAgreeWithPari() {
        assertEquals(36, checkFactorisations("factormod.csv"));
    }

    /** Fixture: PARI/GP {@code factormod(f,p)} on seeded random input; script at the top of factormod-random.csv. */
    @Test
    void randomFactorisationsAgreeWithPari() {
        assertEquals(60, checkFactorisations("factormod-random.csv"));
    }

    private static int checkFactorisations(String file) {
        int rows = 0;
        for (String[] row : Fixtures.rows(file)) {
            long p = Long.parseLong(row[1]);
            FpPoly f = FpPoly.parse(row[0], p);
            Set<String> expected = new HashSet<>();
            for (String part : row[2].split(" \\* ")) {
                int hat = part.lastIndexOf(")^");
                FpPoly g = FpPoly.parse(part.substring(1, hat), p);
                expected.add(g + "^" + Integer.parseInt(part.substring(hat + 2)));
            }
            List<FpPoly.Factor> got = f.factor();
            Set<String> actual = new HashSet<>();
            for (FpPoly.Factor fac : got) {
                actual.add(fac.factor() + "^" + fac.multiplicity());
            }
            assertEquals(expected, actual, row[0] + " mod " + p);
            assertEquals(expected.size(), got.size());
            for (int k = 1; k < got.size(); k++) {
                assertTrue(got.get(k - 1).factor().compareTo(got.get(k).factor()) < 0, "sorted");
            }
            rows++;
        }
        return rows;
    }

    @Test
    void irreducibilityAgreesWithFactorisation() {
        // gp: factormod(x^20-3*x+1, 2) has three factors; polisirreducible(Mod(1,2)*(x^5+x^2+1)) -> 1
        assertFalse(FpPoly.parse("x^20 - 3x + 1", 2).isIrreducible());
        assertTrue(FpPoly.parse("x^5 + x^2 + 1", 2).isIrreducible());
        assertTrue(FpPoly.parse("x^4 + 2*x^3 + 2", 3).isIrreducible());
        assertFalse(FpPoly.parse("x^4 + 1", 3).isIrreducible());
        assertFalse(FpPoly.parse("x^4 + 2x^2 + 1", 3).isIrreducible());
        assertTrue(FpPoly.parse("3x + 1", 7).isIrreducible());
        assertFalse(FpPoly.parse("5", 7).isIrreducible());
        assertFalse(FpPoly.zero(7).isIrreducible());
        Random rnd = new Random(5L);
        for (long p : new long[] {2, 3, 5, 101}) {
            for (int t = 0; t < 60; t++) {
                FpPoly f = random(rnd, p, 1 + rnd.nextInt(9));
                List<FpPoly.Factor> fac = f.factor();
                boolean irr = fac.size() == 1 && fac.get(0).multiplicity() == 1;
                assertEquals(irr, f.isIrreducible(), f + " mod " + p);
            }
        }
    }

    /** Property: the factors are monic irreducible, distinct, and multiply back to f / lc(f). */
    @Test
    void randomFactorisationsMultiplyBack() {
        Random rnd = new Random(123L);
        for (long p : new long[] {2, 3, 5, 7, 101, 65537, 2147483647L}) {
            for (int t = 0; t < 40; t++) {
                FpPoly f = random(rnd, p, 1 + rnd.nextInt(14));
                if (rnd.nextBoolean()) {
                    f = f.multiply(random(rnd, p, 1 + rnd.nextInt(3)).pow(1 + rnd.nextInt(4)));
                }
                if (f.isZero()) {
                    continue;
                }
                FpPoly prod = FpPoly.one(p);
                Set<FpPoly> seen = new HashSet<>();
                for (FpPoly.Factor fac : f.factor()) {
                    assertTrue(fac.factor().isMonic());
                    assertTrue(fac.factor().isIrreducible(), fac.toString());
                    assertTrue(seen.add(fac.factor()));
                    prod = prod.multiply(fac.factor().pow(fac.multiplicity()));
                }
                assertEquals(f.monic(), prod, f + " mod " + p);
            }
        }
    }

    @Test
    void arithmeticAndParsing() {
        FpPoly f = FpPoly.parse("x^2 - x - 1", 5);
        assertEquals("x^2 + 4*x + 4", f.toString());
        assertEquals(f, FpPoly.of(5, -1, -1, 1));
        assertEquals(f, FpPoly.fromQPoly(QPoly.parse("x^2 - x - 1"), 5));
        assertEquals(FpPoly.of(7, 4, 1), FpPoly.parse("1/2 + x", 7));
        assertThrows(ArithmeticException.class, () -> FpPoly.parse("1/7 + x", 7));
        assertThrows(ArithmeticException.class, () -> FpPoly.fromQPoly(QPoly.parse("1/5*x"), 5));
        assertThrows(ExpressionSyntaxException.class, () -> FpPoly.parse("x^", 5));
        assertThrows(IllegalArgumentException.class, () -> FpPoly.of(4, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> FpPoly.of(1L << 31, 1));
        assertThrows(IllegalArgumentException.class, () -> FpPoly.of(5, 1).add(FpPoly.of(7, 1)));
        assertEquals("0", FpPoly.zero(3).toString());
        assertEquals(-1, FpPoly.zero(3).degree());
        assertEquals("x", FpPoly.x(2).toString());
        assertEquals("2*x^3 + 1", FpPoly.of(3, 1, 0, 0, -1).toString());
        FpPoly a = FpPoly.parse("x^5 + 3x + 2", 7);
        FpPoly b = FpPoly.parse("2x^2 + 1", 7);
        FpPoly[] qr = a.divRem(b);
        assertEquals(a, qr[0].multiply(b).add(qr[1]));
        assertTrue(qr[1].degree() < 2);
        FpPoly[] egs = a.extendedGcd(b);
        assertEquals(egs[0], egs[1].multiply(a).add(egs[2].multiply(b)));
        assertEquals(a.gcd(b), egs[0]);
        assertEquals(FpPoly.zero(7), FpPoly.zero(7).gcd(FpPoly.zero(7)));
        assertEquals(FpPoly.parse("x + 3", 7), FpPoly.parse("2x + 6", 7).gcd(FpPoly.zero(7)));
        assertEquals(FpPoly.zero(5), FpPoly.parse("x^5 + 1", 5).derivative());
        assertEquals(0, FpPoly.parse("x^2 + 1", 5).evaluate(2));
        assertEquals(2, FpPoly.parse("x^2 + 1", 5).evaluate(-6));
        assertThrows(ArithmeticException.class, () -> a.divRem(FpPoly.zero(7)));
        assertThrows(ArithmeticException.class, () -> FpPoly.zero(7).factor());
        assertTrue(FpPoly.of(7, 3).factor().isEmpty());
    }

    @Test
    void powModAgreesWithRepeatedMultiplication() {
        // Fermat: x^(p^d) = x mod an irreducible of degree d
        FpPoly g = FpPoly.parse("x^5 + x^2 + 1", 2);
        assertEquals(FpPoly.x(2), FpPoly.x(2).powMod(BigInteger.valueOf(32), g));
        FpPoly h = FpPoly.parse("x^3 + x + 1", 7);
        assertEquals(FpPoly.x(7), FpPoly.x(7).powMod(BigInteger.valueOf(343), h));
        FpPoly a = FpPoly.parse("3x^2 + 5", 7);
        FpPoly acc = FpPoly.one(7);
        for (int e = 0; e < 30; e++) {
            assertEquals(acc, a.powMod(BigInteger.valueOf(e), h));
            acc = acc.multiply(a).mod(h);
        }
        assertThrows(IllegalArgumentException.class, () -> a.powMod(BigInteger.valueOf(-1), h));
        assertEquals(FpPoly.zero(7), a.powMod(BigInteger.TEN, FpPoly.one(7)));
    }

    static FpPoly random(Random rnd, long p, int degree) {
        long[] c = new long[degree + 1];
        for (int k = 0; k <= degree; k++) {
            c[k] = Math.floorMod(rnd.nextLong(), p);
        }
        if (c[degree] == 0) {
            c[degree] = 1;
        }
        return FpPoly.of(p, c);
    }
}
