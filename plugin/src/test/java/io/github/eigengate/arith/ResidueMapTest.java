package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ResidueMapTest {
    private static QPoly p(String s) {
        return QPoly.parse(s);
    }

    /**
     * Fixture: PARI/GP {@code nfinit(f).index} and {@code idealprimedec(nf,p)} (e and f of each
     * prime); script at the top of primes-above.csv.
     */
    @Test
    void primesAboveAgreeWithPari() {
        int rows = 0;
        int thrown = 0;
        for (String[] row : Fixtures.rows("primes-above.csv")) {
            NumberField k = NumberField.of(p(row[0]));
            long prime = Long.parseLong(row[1]);
            String ctx = String.join(";", row);
            if ("1".equals(row[2])) {
                IndexDivisibleException e =
                        assertThrows(IndexDivisibleException.class, () -> ResidueMap.primesAbove(k, prime), ctx);
                assertEquals(prime, e.prime());
                assertTrue(e.getMessage().contains("index"), e.getMessage());
                thrown++;
            } else {
                List<String> ef = new ArrayList<>();
                List<ResidueMap> primes = ResidueMap.primesAbove(k, prime);
                for (ResidueMap r : primes) {
                    ef.add(r.ramificationIndex() + "/" + r.residueDegree());
                    assertEquals(r.residueDegree(), r.residueField().degree());
                    assertEquals(prime, r.residueField().prime());
                }
                Collections.sort(ef);
                assertEquals(List.of(row[3].split(",")), ef, ctx);
                // sum e_i f_i = [K : Q]
                int sum = 0;
                for (ResidueMap r : primes) {
                    sum += r.ramificationIndex() * r.residueDegree();
                }
                assertEquals(k.degree(), sum, ctx);
            }
            rows++;
        }
        assertEquals(44, rows);
        assertEquals(4, thrown);
    }

    @Test
    void goldenRatioFieldReductions() {
        NumberField k = NumberField.of(p("x^2 - x - 1"));
        // gp: factormod(x^2-x-1, 11) -> (x + 3)(x + 7): x maps to -3 = 8 and -7 = 4
        List<ResidueMap> above11 = ResidueMap.primesAbove(k, 11);
        assertEquals(2, above11.size());
        assertEquals(FpPoly.parse("x + 3", 11), above11.get(0).factor());
        assertEquals(above11.get(0).residueField().fromLong(8), above11.get(0).reduce(k.generator()));
        assertEquals(above11.get(1).residueField().fromLong(4), above11.get(1).reduce(k.generator()));
        assertEquals("(11, x + 3)", above11.get(0).toString());
        // (1 + sqrt5)/2 = x; 1/2 is 11-integral: 1/2 = 6 mod 11
        assertEquals(above11.get(0).residueField().fromLong(6), above11.get(0).reduce(k.fromRational(Rational.parse("1/2"))));
        // ramified at 5: (x + 2)^2
        ResidueMap five = ResidueMap.forFactor(k, 5, FpPoly.parse("x + 2", 5));
        assertEquals(2, five.ramificationIndex());
        assertEquals(five.residueField().fromLong(3), five.reduce(k.generator()));
        // inert at 7: residue field F_49
        ResidueMap seven = ResidueMap.primesAbove(k, 7).get(0);
        assertEquals(2, seven.residueDegree());
        assertEquals(seven.residueField().generator(), seven.reduce(k.generator()));
        assertThrows(ArithmeticException.class, () -> seven.reduce(k.element(p("1/7*x"))));
        IllegalArgumentException e = assertThrows(
                IllegalArgumentException.class, () -> ResidueMap.forFactor(k, 11, FpPoly.parse("x + 1", 11)));
        assertTrue(e.getMessage().contains("is not an irreducible factor of f modulo p"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ResidueMap.forFactor(k, 11, FpPoly.parse("x + 3", 13)));
        assertThrows(IllegalArgumentException.class, () -> ResidueMap.primesAbove(k, 12));
        assertThrows(IllegalArgumentException.class,
                () -> ResidueMap.primesAbove(k, 11).get(0).reduce(NumberField.of(p("x^2 + 1")).generator()));
    }

    @Test
    void rationalFieldIsOrdinaryReductionModP() {
        NumberField q = NumberField.of(p("x"));
        for (long prime : new long[] {2, 3, 101, 2147483647L}) {
            List<ResidueMap> above = ResidueMap.primesAbove(q, prime);
            assertEquals(1, above.size());
            ResidueMap r = above.get(0);
            assertEquals(1, r.ramificationIndex());
            assertEquals(1, r.residueDegree());
            Rational a = Rational.parse("-22/7");
            if (prime != 7) {
                assertEquals(r.residueField().fromLong(ResidueMap.reduceRational(a, prime)), r.reduce(q.fromRational(a)));
            }
        }
        assertEquals(2, ResidueMap.reduceRational(Rational.parse("-22/7"), 3)); // -22/7 = -1/1 = 2 mod 3
        assertEquals(4, ResidueMap.reduceRational(Rational.parse("1/3"), 11)); // 3 * 4 = 12 = 1 mod 11
        assertEquals(0, ResidueMap.reduceRational(Rational.ZERO, 2));
        assertEquals(1, ResidueMap.reduceRational(Rational.parse("-1"), 2));
        assertThrows(ArithmeticException.class, () -> ResidueMap.reduceRational(Rational.parse("1/6"), 3));
    }

    @Test
    void nonIntegralDefiningPolynomial() {
        NumberField k = NumberField.of(p("x^5 - x + 1/2"));
        assertThrows(IllegalArgumentException.class, () -> ResidueMap.primesAbove(k, 2));
        // gp: factormod(x^5-x+1/2, 3) -> irreducible (x^5 + 2*x + 2)
        List<ResidueMap> three = ResidueMap.primesAbove(k, 3);
        assertEquals(1, three.size());
        assertEquals(FpPoly.parse("x^5 + 2x + 2", 3), three.get(0).factor());
    }

    /** Property: reduction is a ring homomorphism on p-integral elements. */
    @Test
    void reductionIsARingHomomorphism() {
        Random rnd = new Random(606L);
        String[] fields = {"x^2 - x - 1", "x^3 - 2", "x^8 - x^7 + x^5 - x^4 + x^3 - x + 1", "x^6 + x + 1"};
        long[] primes = {2, 3, 5, 7, 31, 101};
        for (String f : fields) {
            NumberField k = NumberField.of(p(f));
            for (long prime : primes) {
                List<ResidueMap> above;
                try {
                    above = ResidueMap.primesAbove(k, prime);
                } catch (IndexDivisibleException e) {
                    continue;
                }
                for (ResidueMap r : above) {
                    FiniteField kk = r.residueField();
                    for (int t = 0; t < 15; t++) {
                        NumberField.Element a = integral(k, rnd, prime);
                        NumberField.Element b = integral(k, rnd, prime);
                        assertEquals(r.reduce(a).add(r.reduce(b)), r.reduce(a.add(b)));
                        assertEquals(r.reduce(a).multiply(r.reduce(b)), r.reduce(a.multiply(b)));
                    }
                    assertEquals(kk.one(), r.reduce(k.one()));
                    assertTrue(kk.evaluate(FpPoly.fromQPoly(k.polynomial(), prime), r.reduce(k.generator())).isZero());
                }
            }
        }
    }

    private static NumberField.Element integral(NumberField k, Random rnd, long prime) {
        List<Rational> c = new ArrayList<>();
        for (int i = 0; i < k.degree(); i++) {
            long den = 1 + rnd.nextInt(6);
            if (den % prime == 0) {
                den = 1;
            }
            c.add(Rational.of(java.math.BigInteger.valueOf(rnd.nextInt(201) - 100), java.math.BigInteger.valueOf(den)));
        }
        return k.element(c);
    }
}
