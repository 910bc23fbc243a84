package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class QPolyTest {
    private static QPoly p(String s) {
        return QPoly.parse(s);
    }

    private static Rational q(String s) {
        return Rational.parse(s);
    }

    @Test
    void parsesTheDocumentedExamples() {
        assertEquals(QPoly.ofIntegers(-1, -1, 1), p("x^2 - x - 1"));
        assertEquals(QPoly.of(q("478011548"), q("2697"), q("-1/72")), p("-1/72*x^2 + 2697*x + 478011548"));
        assertEquals(QPoly.ofIntegers(0, 3), p("3x"));
        assertEquals(QPoly.ofIntegers(0, -1), p("-x"));
        assertEquals(QPoly.ofIntegers(7), p("7"));
        assertEquals(QPoly.of(q("0"), q("-1"), q("0"), q("1/2")), p("1/2*x^3-x"));
        assertEquals(QPoly.ofIntegers(0, 0, 5), p("2x^2 + 3 x ^ 2"));
        assertEquals(QPoly.ZERO, p("x - x"));
        assertEquals(QPoly.ZERO, p("0"));
        assertEquals(QPoly.ofIntegers(1), p("x^0"));
        assertEquals(QPoly.ofIntegers(0, 1), p("+x^1"));
        assertEquals(QPoly.of(q("0"), q("1/2")), p("1/2x"));
        assertEquals(QPoly.ofIntegers(12), p("1 2"));
    }

    @Test
    void printsReadablyAndRoundTrips() {
        assertEquals("x^2 - x - 1", p("x^2 - x - 1").toString());
        assertEquals("-1/72*x^2 + 2697*x + 478011548", p("-1/72*x^2 + 2697*x + 478011548").toString());
        assertEquals("0", QPoly.ZERO.toString());
        assertEquals("-x", p("-x").toString());
        assertEquals("3*x", p("3x").toString());
        assertEquals("1/2*x^3 - x", p("1/2*x^3-x").toString());
        assertEquals("-7", p("-7").toString());
        Random rnd = new Random(99L);
        for (int k = 0; k < 500; k++) {
            QPoly f = random(rnd, rnd.nextInt(8));
            assertEquals(f, QPoly.parse(f.toString()), f.toString());
        }
    }

    @Test
    void syntaxErrorsPointAtTheProblem() {
        ExpressionSyntaxException e = assertThrows(ExpressionSyntaxException.class, () -> p(""));
        assertEquals(0, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^2 - "));
        assertEquals(6, e.offset());
        assertEquals("a digit or 'x'", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^ + 1"));
        assertEquals(3, e.offset());
        assertEquals("a digit", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("3*7"));
        assertEquals(2, e.offset());
        assertEquals("'x'", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x y"));
        assertEquals(2, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("1/0*x"));
        assertEquals(2, e.offset());
        assertEquals("a nonzero denominator", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^-2"));
        assertEquals(2, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("*x"));
        assertEquals(0, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^2 -- 1"));
        assertEquals(5, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("3/4/5"));
        assertEquals(3, e.offset());
        assertEquals("'*', 'x', '+', '-' or end of text", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("3 y"));
        assertEquals(2, e.offset());
        assertEquals("'/', '*', 'x', '+', '-' or end of text", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("3x2"));
        assertEquals(2, e.offset());
        assertEquals("'^', '+', '-' or end of text", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^2x"));
        assertEquals(3, e.offset());
        assertEquals("'+', '-' or end of text", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("3*"));
        assertEquals(2, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> p("x^999999999"));
        assertEquals(2, e.offset());
    }

    @Test
    void basicQueries() {
        QPoly f = p("-1/72*x^2 + 2697*x + 478011548");
        assertEquals(2, f.degree());
        assertEquals(-1, QPoly.ZERO.degree());
        assertEquals(q("-1/72"), f.leadingCoefficient());
        assertEquals(Rational.ZERO, f.coefficient(5));
        assertFalse(f.isMonic());
        assertFalse(f.hasIntegerCoefficients());
        assertTrue(p("x^2 - x - 1").isMonic());
        assertTrue(p("x^2 - x - 1").hasIntegerCoefficients());
        assertTrue(QPoly.ZERO.isZero());
        assertFalse(QPoly.ZERO.isMonic());
        assertEquals(Rational.ZERO, QPoly.ZERO.leadingCoefficient());
        assertThrows(IndexOutOfBoundsException.class, () -> f.coefficient(-1));
        assertEquals(p("x"), QPoly.x());
        assertEquals(p("5/3"), QPoly.constant(q("5/3")));
    }

    @Test
    void divisionAndGcd() {
        // Worked by hand: x^3 - 1 = (x - 1)(x^2 + x + 1)
        QPoly[] qr = p("x^3 - 1").divRem(p("2x - 2"));
        assertEquals(p("1/2x^2 + 1/2x + 1/2"), qr[0]);
        assertEquals(QPoly.ZERO, qr[1]);
        qr = p("x^3 + 2").divRem(p("x^2"));
        assertEquals(p("x"), qr[0]);
        assertEquals(p("2"), qr[1]);
        assertEquals(p("3"), p("x^4 + 3").mod(p("x")));
        assertThrows(ArithmeticException.class, () -> p("x").divRem(QPoly.ZERO));
        assertEquals(p("x - 1"), p("x^2 - 1").gcd(p("3x^2 - 6x + 3")));
        assertEquals(QPoly.ZERO, QPoly.ZERO.gcd(QPoly.ZERO));
        assertEquals(p("x + 1/2"), QPoly.ZERO.gcd(p("2x + 1")));
        assertEquals(QPoly.ONE, p("x^2 + 1").gcd(p("x^2 - 1")));
        assertEquals(QPoly.ONE, p("x^2 + 1").gcd(p("7")));
        // (x - 1)^2 (x + 1)^3, expanded by hand
        assertEquals(p("x^2 - 1"), p("x^5 + x^4 - 2x^3 - 2x^2 + x + 1").squarefreePart());
        assertEquals(p("2x^2 - 2"), p("2x^3 - 2x^2 - 2x + 2").squarefreePart());
        assertEquals(p("7"), p("7").squarefreePart());
        assertEquals(QPoly.ZERO, QPoly.ZERO.squarefreePart());
    }

    @Test
    void randomDivisionIdentity() {
        Random rnd = new Random(4242L);
        for (int k = 0; k < 200; k++) {
            QPoly a = random(rnd, rnd.nextInt(9));
            QPoly b = random(rnd, rnd.nextInt(5));
            if (b.isZero()) {
                continue;
            }
            QPoly[] qr = a.divRem(b);
            assertEquals(a, qr[0].multiply(b).add(qr[1]));
            assertTrue(qr[1].degree() < b.degree());
            QPoly c = random(rnd, 1 + rnd.nextInt(3));
            if (c.isZero()) {
                continue;
            }
            QPoly g = a.multiply(c).gcd(b.multiply(c));
            assertTrue(g.isMonic());
            assertTrue(a.multiply(c).mod(g).isZero());
            assertTrue(b.multiply(c).mod(g).isZero());
            if (!c.isZero()) {
                assertTrue(g.mod(c.monic()).isZero());
            }
        }
    }

    @Test
    void arithmeticAndEvaluation() {
        QPoly f = p("x^2 - x - 1");
        assertEquals(p("x^4 - 2x^3 - x^2 + 2x + 1"), f.pow(2));
        assertEquals(QPoly.ONE, f.pow(0));
        assertThrows(IllegalArgumentException.class, () -> f.pow(-1));
        assertEquals(p("2x - 1"), f.derivative());
        assertEquals(QPoly.ZERO, p("5").derivative());
        assertEquals(q("-1/4"), f.evaluate(q("3/2")));
        assertEquals(q("11"), f.evaluate(q("4")));
        assertEquals(p("1/2x^2 - 1/2x - 1/2"), f.scale(q("1/2")));
        assertEquals(QPoly.ZERO, f.subtract(f));
        assertEquals(p("x^2"), f.add(p("x + 1")));
    }

    static QPoly random(Random rnd, int degree) {
        Rational[] c = new Rational[degree + 1];
        for (int k = 0; k <= degree; k++) {
            c[k] = rnd.nextInt(3) == 0 ? Rational.ZERO : RationalTest.random(rnd);
        }
        return QPoly.of(c);
    }
}
