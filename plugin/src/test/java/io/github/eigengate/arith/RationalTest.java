package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

class RationalTest {
    @Test
    void canonicalForm() {
        Rational r = Rational.of(BigInteger.valueOf(6), BigInteger.valueOf(-8));
        assertEquals(BigInteger.valueOf(-3), r.num());
        assertEquals(BigInteger.valueOf(4), r.den());
        assertEquals("-3/4", r.toString());
        assertEquals(Rational.ZERO, Rational.of(BigInteger.ZERO, BigInteger.valueOf(-5)));
        assertEquals(BigInteger.ONE, Rational.of(BigInteger.ZERO, BigInteger.valueOf(-5)).den());
        assertTrue(Rational.of(BigInteger.valueOf(10), BigInteger.valueOf(5)).isInteger());
        assertEquals("2", Rational.of(BigInteger.valueOf(10), BigInteger.valueOf(5)).toString());
        assertThrows(ArithmeticException.class, () -> Rational.of(BigInteger.ONE, BigInteger.ZERO));
    }

    @Test
    void parseAcceptsTheDocumentedForms() {
        assertEquals(Rational.of(12), Rational.parse("12"));
        assertEquals(Rational.of(BigInteger.valueOf(-3), BigInteger.valueOf(4)), Rational.parse("-3/4"));
        assertEquals(Rational.of(5), Rational.parse("+5"));
        assertEquals(Rational.parse("3/4"), Rational.parse("6/8"));
        assertEquals(Rational.ZERO, Rational.parse("-0"));
        assertEquals("0", Rational.parse("-0").toString());
        String big = "123456789012345678901234567891/10";
        assertEquals(big, Rational.parse(big).toString());
    }

    @Test
    void parseErrorsCarryOffsetAndExpectation() {
        ExpressionSyntaxException e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse(""));
        assertEquals(0, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("-"));
        assertEquals(1, e.offset());
        assertEquals("a digit", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("3/"));
        assertEquals(2, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("3/0"));
        assertEquals(2, e.offset());
        assertEquals("a nonzero denominator", e.expected());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("12a"));
        assertEquals(2, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("1/2/3"));
        assertEquals(3, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse(" 1"));
        assertEquals(0, e.offset());
        e = assertThrows(ExpressionSyntaxException.class, () -> Rational.parse("3/-4"));
        assertEquals(2, e.offset());
        assertTrue(e.getMessage().contains("offset 2"), e.getMessage());
    }

    @Test
    void arithmetic() {
        Rational a = Rational.parse("-3/4");
        Rational b = Rational.parse("5/6");
        assertEquals(Rational.parse("1/12"), a.add(b));
        assertEquals(Rational.parse("-19/12"), a.subtract(b));
        assertEquals(Rational.parse("-5/8"), a.multiply(b));
        assertEquals(Rational.parse("-9/10"), a.divide(b));
        assertEquals(Rational.parse("-4/3"), a.inverse());
        assertEquals(Rational.parse("3/4"), a.negate());
        assertEquals(Rational.parse("16/9"), a.pow(-2));
        assertEquals(Rational.parse("-27/64"), a.pow(3));
        assertEquals(Rational.ONE, a.pow(0));
        assertEquals(Rational.ONE, Rational.ZERO.pow(0));
        assertEquals(Rational.ONE, Rational.ONE.pow(Integer.MIN_VALUE));
        assertEquals(Rational.ONE, Rational.of(-1).pow(Integer.MIN_VALUE));
        assertEquals(Rational.of(-1), Rational.of(-1).pow(Integer.MAX_VALUE));
        assertThrows(ArithmeticException.class, () -> Rational.of(2).pow(Integer.MIN_VALUE));
        assertThrows(ArithmeticException.class, () -> Rational.ZERO.inverse());
        assertThrows(ArithmeticException.class, () -> Rational.ZERO.pow(-1));
        assertThrows(ArithmeticException.class, () -> a.divide(Rational.ZERO));
        assertTrue(a.compareTo(b) < 0);
        assertEquals(0, Rational.parse("2/4").compareTo(Rational.parse("1/2")));
        assertEquals(-1, a.signum());
        assertFalse(a.isInteger());
        assertEquals(Rational.of(7), Rational.parse("7/2").add(Rational.parse("7/2")));
        assertTrue(Rational.parse("7/2").add(Rational.parse("7/2")).isInteger());
    }

    @Test
    void roundTripOnRandomValues() {
        Random rnd = new Random(20240601L);
        for (int k = 0; k < 2000; k++) {
            Rational r = random(rnd);
            assertEquals(r, Rational.parse(r.toString()));
            assertEquals(r.num().gcd(r.den()), r.signum() == 0 ? r.den() : BigInteger.ONE);
            assertEquals(1, r.den().signum());
        }
    }

    @Test
    void fieldAxioms() {
        Random rnd = new Random(7L);
        FieldAxioms.check(Rationals.FIELD, () -> random(rnd), 500);
        assertEquals("Q", Rationals.FIELD.name());
        assertSame(Rational.ZERO, Rationals.FIELD.zero());
    }

    static Rational random(Random rnd) {
        BigInteger n = new BigInteger(1 + rnd.nextInt(80), rnd);
        if (rnd.nextBoolean()) {
            n = n.negate();
        }
        if (rnd.nextInt(4) == 0) {
            return Rational.of(n);
        }
        BigInteger d = new BigInteger(1 + rnd.nextInt(40), rnd).add(BigInteger.ONE);
        return Rational.of(n, d);
    }
}
