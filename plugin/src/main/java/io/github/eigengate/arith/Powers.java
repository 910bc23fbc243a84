package io.github.eigengate.arith;

import java.util.function.BinaryOperator;

/** Binary (square-and-multiply) powering, shared by the ring types of this package (Knuth, TAOCP 2, §4.6.3). */
final class Powers {

    private Powers() {
    }

    /** base^e for e ≥ 0, with {@code one} the identity of {@code multiply}. */
    static <E> E power(E base, long e, E one, BinaryOperator<E> multiply) {
        if (e < 0) {
            throw new IllegalArgumentException("negative exponent " + e);
        }
        E result = one;
        while (e > 0) {
            if ((e & 1) != 0) {
                result = multiply.apply(result, base);
            }
            e >>= 1;
            if (e > 0) {
                base = multiply.apply(base, base);
            }
        }
        return result;
    }
}
