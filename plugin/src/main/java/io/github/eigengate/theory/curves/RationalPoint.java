package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.Rational;

/**
 * A point of y² = x³ + A·x + B over Q, or the point at infinity; the chord-and-tangent law (Silverman, AEC,
 * III.2.3).
 */
record RationalPoint(Rational x, Rational y, boolean infinity) {

    static final RationalPoint INFINITY = new RationalPoint(Rational.ZERO, Rational.ZERO, true);

    static RationalPoint of(Rational x, Rational y) {
        return new RationalPoint(x, y, false);
    }

    RationalPoint negate() {
        return infinity ? this : of(x, y.negate());
    }

    RationalPoint add(RationalPoint o, Rational a) {
        if (infinity) {
            return o;
        }
        if (o.infinity) {
            return this;
        }
        Rational lambda;
        if (x.equals(o.x)) {
            if (!y.equals(o.y) || y.signum() == 0) {
                return INFINITY;
            }
            lambda = x.multiply(x).multiply(Rational.of(3)).add(a).divide(y.multiply(Rational.of(2)));
        } else {
            lambda = o.y.subtract(y).divide(o.x.subtract(x));
        }
        Rational x3 = lambda.multiply(lambda).subtract(x).subtract(o.x);
        Rational y3 = lambda.multiply(x.subtract(x3)).subtract(y);
        return of(x3, y3);
    }

    RationalPoint times(int k, Rational a) {
        RationalPoint r = INFINITY;
        for (int i = 0; i < k; i++) {
            r = r.add(this, a);
        }
        return r;
    }
}
