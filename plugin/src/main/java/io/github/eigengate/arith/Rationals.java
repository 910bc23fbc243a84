package io.github.eigengate.arith;

import java.math.BigInteger;

/** The field Q of rational numbers, as a {@link Field} over {@link Rational}. */
public final class Rationals {
    /** The field Q; its {@link Field#name()} is {@code "Q"}. */
    public static final Field<Rational> FIELD = new Field<>() {
        @Override
        public Rational zero() {
            return Rational.ZERO;
        }

        @Override
        public Rational one() {
            return Rational.ONE;
        }

        @Override
        public Rational add(Rational a, Rational b) {
            return a.add(b);
        }

        @Override
        public Rational subtract(Rational a, Rational b) {
            return a.subtract(b);
        }

        @Override
        public Rational multiply(Rational a, Rational b) {
            return a.multiply(b);
        }

        @Override
        public Rational negate(Rational a) {
            return a.negate();
        }

        @Override
        public Rational inverse(Rational a) {
            return a.inverse();
        }

        @Override
        public boolean isZero(Rational a) {
            return a.signum() == 0;
        }

        @Override
        public Rational fromInteger(BigInteger n) {
            return Rational.of(n);
        }

        @Override
        public String name() {
            return "Q";
        }

        @Override
        public String toString() {
            return "Q";
        }
    };

    private Rationals() {}
}
