package io.github.eigengate.check.congruence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.FiniteField;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.SourceLocation;
import java.math.BigInteger;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The residue helpers: fast reduction at degree-1 primes against the finite-field reduction, powMod against
 * BigInteger.modPow, the irreducible polynomials used for common extensions, and the primes above p (x^2 − x − 1 mod
 * 11 = (x + 3)(x + 7) and mod 2 irreducible: PARI/GP {@code factormod(x^2-x-1,11)}, {@code factormod(x^2-x-1,2)}).
 */
class ResiduesTest {

    static final NumberField K = NumberField.of(QPoly.parse("x^2 - x - 1"));

    @Test
    void primesAboveFollowTheFactorsModP() throws Exception {
        Form f = new Form("lev23", 23, 2, K, SourceLocation.row("forms.csv", 2));
        List<Residues.PrimeAbove> at11 = Residues.primesAbove(f, 11);
        assertEquals(List.of("(11, x + 3)", "(11, x + 7)"), at11.stream().map(Object::toString).toList());
        List<Residues.PrimeAbove> at2 = Residues.primesAbove(f, 2);
        assertEquals(1, at2.size());
        assertEquals(2, at2.get(0).field().degree());
        // x^2 − x − 1 = (x − 3)^2 mod 5 (5 ramifies; Z[x] is the maximal order, so 5 does not divide the index)
        List<Residues.PrimeAbove> at5 = Residues.primesAbove(f, 5);
        assertEquals(1, at5.size());
        assertEquals(2, at5.get(0).ramification());
        Form rational = new Form("f11", 11, 2, null, SourceLocation.row("forms.csv", 3));
        assertEquals("(7, x)", Residues.primesAbove(rational, 7).get(0).toString());
        Form bad = new Form("g", 7, 2, NumberField.of(QPoly.parse("x^2 + 3")), SourceLocation.row("forms.csv", 4));
        assertThrows(Residues.IndexDivisible.class, () -> Residues.primesAbove(bad, 2));
    }

    @Test
    void fastReductionAgreesWithTheFiniteField() {
        Random rnd = new Random(11L);
        for (long p : new long[] {2, 3, 11, 31, 1_000_003L}) {
            for (int trial = 0; trial < 200; trial++) {
                Rational a = Rational.of(BigInteger.valueOf(rnd.nextLong()), BigInteger.valueOf(1 + rnd.nextInt(50)));
                Rational b = Rational.of(rnd.nextInt(2001) - 1000);
                if (a.den().mod(BigInteger.valueOf(p)).signum() == 0) {
                    assertThrows(ArithmeticException.class, () -> Residues.reduceAt(a, 0, p));
                    continue;
                }
                long c = Math.floorMod(rnd.nextLong(), p);
                FiniteField fp = FiniteField.of(FpPoly.of(p, -c, 1)); // F_p[x]/(x − c), x ↦ c
                NumberField.Element e = K.element(List.of(a, b));
                assertEquals(Residues.reduce(e, fp), fp.fromLong(Residues.reduceAt(e, c, p)));
                assertEquals(Residues.reduce(a, fp), fp.fromLong(Residues.reduceAt(a, c, p)));
            }
        }
    }

    @Test
    void powModAgreesWithBigInteger() {
        Random rnd = new Random(3L);
        for (int trial = 0; trial < 500; trial++) {
            long p = BigInteger.probablePrime(31, rnd).longValue();
            long b = Math.floorMod(rnd.nextLong(), p);
            long e = rnd.nextInt(1 << 20);
            assertEquals(BigInteger.valueOf(b).modPow(BigInteger.valueOf(e), BigInteger.valueOf(p)).longValue(),
                    Residues.powMod(b, e, p));
        }
        assertEquals(1, Residues.powMod(0, 0, 2));
        assertEquals(0, Residues.powMod(0, 3, 2));
    }

    @Test
    void irreduciblePolynomialsOfEveryDegree() {
        for (long p : new long[] {2, 3, 5, 691}) {
            for (int d = 1; d <= 6; d++) {
                FpPoly u = Residues.irreducible(p, d);
                assertEquals(d, u.degree());
                assertTrue(u.isMonic() && u.isIrreducible(), u.toString());
            }
        }
        assertEquals("x^2 + x + 1", Residues.irreducible(2, 2).toString()); // the only one of degree 2 over F_2
    }
}
