package io.github.eigengate.check;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;

/** Trace and characteristic polynomial over Q of a coefficient, whether it lives in Q or in a number field. */
public final class Values {

    private Values() {
    }

    /** Tr_{K/Q}(a); for a ∈ Q the trace of Q over itself, a. */
    public static Rational trace(Object a) {
        if (a instanceof Rational r) {
            return r;
        }
        return ((NumberField.Element) a).trace();
    }

    /** The characteristic polynomial of multiplication by a on K over Q; {@code x - a} for a ∈ Q. */
    public static QPoly charPoly(Object a) {
        if (a instanceof Rational r) {
            return QPoly.of(r.negate(), Rational.ONE);
        }
        return ((NumberField.Element) a).charPoly();
    }
}
