package io.github.eigengate.arith;

import java.math.BigInteger;

/**
 * A (commutative) field whose elements are represented by values of type {@code E}.
 *
 * <p>All operations are exact. Implementations throw {@link IllegalArgumentException} naming both
 * fields when handed an element of a different field.
 *
 * @param <E> element type
 */
public interface Field<E> {
    /** @return the additive identity */
    E zero();

    /** @return the multiplicative identity */
    E one();

    /** @return {@code a + b} */
    E add(E a, E b);

    /** @return {@code a - b} */
    E subtract(E a, E b);

    /** @return {@code a * b} */
    E multiply(E a, E b);

    /** @return {@code -a} */
    E negate(E a);

    /**
     * @return {@code 1 / a}
     * @throws ArithmeticException if {@code a} is zero
     */
    E inverse(E a);

    /** @return whether {@code a} is the zero element */
    boolean isZero(E a);

    /** @return the image of the integer {@code n} under the ring map Z → this field */
    E fromInteger(BigInteger n);

    /** @return a short human-readable name such as {@code Q}, {@code Q[x]/(x^2 - 5)} or {@code F_7} */
    String name();
}
