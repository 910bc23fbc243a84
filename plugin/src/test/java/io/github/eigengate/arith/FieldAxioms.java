package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.function.Supplier;

/** Checks the field axioms on seeded random elements (property-style). */
final class FieldAxioms {
    private FieldAxioms() {}

    static <E> void check(Field<E> k, Supplier<E> random, int rounds) {
        E zero = k.zero();
        E one = k.one();
        assertTrue(k.isZero(zero), k.name());
        assertFalse(k.isZero(one), k.name());
        assertEquals(one, k.fromInteger(BigInteger.ONE));
        assertEquals(zero, k.fromInteger(BigInteger.ZERO));
        assertThrows(ArithmeticException.class, () -> k.inverse(zero));
        for (int r = 0; r < rounds; r++) {
            E a = random.get();
            E b = random.get();
            E c = random.get();
            String ctx = k.name() + " a=" + a + " b=" + b + " c=" + c;
            assertEquals(k.add(a, b), k.add(b, a), ctx);
            assertEquals(k.multiply(a, b), k.multiply(b, a), ctx);
            assertEquals(k.add(k.add(a, b), c), k.add(a, k.add(b, c)), ctx);
            assertEquals(k.multiply(k.multiply(a, b), c), k.multiply(a, k.multiply(b, c)), ctx);
            assertEquals(k.multiply(a, k.add(b, c)), k.add(k.multiply(a, b), k.multiply(a, c)), ctx);
            assertEquals(a, k.add(a, zero), ctx);
            assertEquals(a, k.multiply(a, one), ctx);
            assertTrue(k.isZero(k.add(a, k.negate(a))), ctx);
            assertEquals(k.subtract(a, b), k.add(a, k.negate(b)), ctx);
            if (!k.isZero(a)) {
                assertEquals(one, k.multiply(a, k.inverse(a)), ctx);
            }
            assertEquals(k.add(k.fromInteger(BigInteger.valueOf(r)), one), k.fromInteger(BigInteger.valueOf(r + 1)), ctx);
        }
    }
}
