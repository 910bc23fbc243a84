package io.github.eigengate.arith;

import java.math.BigInteger;

/**
 * An exact rational number {@code num/den}, always in lowest terms with {@code den > 0}.
 *
 * <p>Immutable; {@link #equals(Object)} compares numerator and denominator, which is value
 * equality because the representation is canonical. Integers ({@code den == 1}) take fast paths
 * that avoid gcd computations.
 */
public final class Rational implements Comparable<Rational> {
    /** The rational number 0. */
    public static final Rational ZERO = new Rational(BigInteger.ZERO, BigInteger.ONE);
    /** The rational number 1. */
    public static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);

    private static final Rational MINUS_ONE = new Rational(BigInteger.ONE.negate(), BigInteger.ONE);

    private final BigInteger num;
    private final BigInteger den;

    private Rational(BigInteger num, BigInteger den) {
        this.num = num;
        this.den = den;
    }

    /** @return the integer {@code n} as a rational */
    public static Rational of(long n) {
        if (n >= -CACHED && n <= CACHED) {
            return SMALL[(int) n + CACHED];
        }
        return new Rational(BigInteger.valueOf(n), BigInteger.ONE);
    }

    /** Small integers recur in every table (Hecke eigenvalues are small): shared instances, no allocation. */
    private static final int CACHED = 1024;
    private static final Rational[] SMALL = new Rational[2 * CACHED + 1];

    static {
        for (int i = -CACHED; i <= CACHED; i++) {
            SMALL[i + CACHED] = i == 0 ? ZERO : i == 1 ? ONE : new Rational(BigInteger.valueOf(i), BigInteger.ONE);
        }
    }

    /** @return the integer {@code n} as a rational */
    public static Rational of(BigInteger n) {
        if (n.signum() == 0) {
            return ZERO;
        }
        return new Rational(n, BigInteger.ONE);
    }

    /**
     * @return {@code num/den} in lowest terms with positive denominator
     * @throws ArithmeticException if {@code den} is zero
     */
    public static Rational of(BigInteger num, BigInteger den) {
        if (den.signum() == 0) {
            throw new ArithmeticException("zero denominator in " + num + "/0");
        }
        if (num.signum() == 0) {
            return ZERO;
        }
        if (den.equals(BigInteger.ONE)) {
            return new Rational(num, den);
        }
        if (den.signum() < 0) {
            num = num.negate();
            den = den.negate();
        }
        BigInteger g = num.gcd(den);
        if (!g.equals(BigInteger.ONE)) {
            num = num.divide(g);
            den = den.divide(g);
        }
        return new Rational(num, den);
    }

    /**
     * Parses a rational number written without whitespace: an optional sign {@code +} or {@code -},
     * decimal digits, and optionally {@code /} followed by decimal digits (a nonzero denominator).
     * Examples: {@code 12}, {@code -3/4}, {@code +5}, {@code 6/8} (read as 3/4).
     *
     * @throws ExpressionSyntaxException with the offset of the first offending character
     */
    public static Rational parse(String text) {
        int n = text.length();
        int i = 0;
        boolean negative = false;
        if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            negative = text.charAt(i) == '-';
            i++;
        }
        int start = i;
        while (i < n && isDigit(text.charAt(i))) {
            i++;
        }
        if (i == start) {
            throw new ExpressionSyntaxException(text, i, start == 0 ? "a sign or a digit" : "a digit");
        }
        if (i - start > Limits.MAX_DIGITS || n - i > Limits.MAX_DIGITS + 1) {
            throw new ExpressionSyntaxException(text, i - start > Limits.MAX_DIGITS ? start : i + 1,
                    "a number of at most " + Limits.MAX_DIGITS + " digits");
        }
        BigInteger num = new BigInteger(text.substring(start, i));
        if (negative) {
            num = num.negate();
        }
        if (i == n) {
            return of(num);
        }
        if (text.charAt(i) != '/') {
            throw new ExpressionSyntaxException(text, i, "a digit, '/' or end of text");
        }
        i++;
        int dstart = i;
        while (i < n && isDigit(text.charAt(i))) {
            i++;
        }
        if (i == dstart) {
            throw new ExpressionSyntaxException(text, i, "a digit");
        }
        if (i < n) {
            throw new ExpressionSyntaxException(text, i, "a digit or end of text");
        }
        BigInteger den = new BigInteger(text.substring(dstart, i));
        if (den.signum() == 0) {
            throw new ExpressionSyntaxException(text, dstart, "a nonzero denominator");
        }
        return of(num, den);
    }

    static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /** @return the numerator (sign carrier) */
    public BigInteger num() {
        return num;
    }

    /** @return the denominator, always positive */
    public BigInteger den() {
        return den;
    }

    /** @return whether the denominator is 1 */
    public boolean isInteger() {
        return den.equals(BigInteger.ONE);
    }

    /** @return -1, 0 or 1 according to the sign */
    public int signum() {
        return num.signum();
    }

    /** @return {@code this + o} */
    public Rational add(Rational o) {
        if (o.num.signum() == 0) {
            return this;
        }
        if (num.signum() == 0) {
            return o;
        }
        if (isInteger() && o.isInteger()) {
            return of(num.add(o.num));
        }
        if (den.equals(o.den)) {
            return of(num.add(o.num), den);
        }
        return of(num.multiply(o.den).add(o.num.multiply(den)), den.multiply(o.den));
    }

    /** @return {@code this - o} */
    public Rational subtract(Rational o) {
        return add(o.negate());
    }

    /** @return {@code this * o} */
    public Rational multiply(Rational o) {
        if (num.signum() == 0 || o.num.signum() == 0) {
            return ZERO;
        }
        if (isInteger() && o.isInteger()) {
            return new Rational(num.multiply(o.num), BigInteger.ONE);
        }
        // cross-cancel: gcd(num, o.den) and gcd(o.num, den) keep the result in lowest terms
        BigInteger g1 = num.gcd(o.den);
        BigInteger g2 = o.num.gcd(den);
        BigInteger n = num.divide(g1).multiply(o.num.divide(g2));
        BigInteger d = den.divide(g2).multiply(o.den.divide(g1));
        return new Rational(n, d);
    }

    /**
     * @return {@code this / o}
     * @throws ArithmeticException if {@code o} is zero
     */
    public Rational divide(Rational o) {
        return multiply(o.inverse());
    }

    /** @return {@code -this} */
    public Rational negate() {
        return num.signum() == 0 ? this : new Rational(num.negate(), den);
    }

    /**
     * @return {@code 1 / this}
     * @throws ArithmeticException if this is zero
     */
    public Rational inverse() {
        if (num.signum() == 0) {
            throw new ArithmeticException("inverse of zero");
        }
        return num.signum() > 0 ? new Rational(den, num) : new Rational(den.negate(), num.negate());
    }

    /**
     * @return {@code this^e}; negative {@code e} allowed ({@code 0^0 = 1})
     * @throws ArithmeticException if this is zero and {@code e < 0}
     */
    public Rational pow(int e) {
        if (isInteger() && num.abs().equals(BigInteger.ONE)) {
            return num.signum() > 0 || (e & 1) == 0 ? ONE : this;
        }
        if (e < 0) {
            Rational inv = inverse();
            // -Integer.MIN_VALUE overflows: split off one factor
            return e == Integer.MIN_VALUE ? inv.pow(Integer.MAX_VALUE).multiply(inv) : inv.pow(-e);
        }
        if (e == 0) {
            return ONE;
        }
        return new Rational(num.pow(e), den.pow(e));
    }

    /** @return the absolute value */
    public Rational abs() {
        return num.signum() < 0 ? negate() : this;
    }

    @Override
    public int compareTo(Rational o) {
        if (isInteger() && o.isInteger()) {
            return num.compareTo(o.num);
        }
        return num.multiply(o.den).compareTo(o.num.multiply(den));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rational r && num.equals(r.num) && den.equals(r.den);
    }

    @Override
    public int hashCode() {
        return 31 * num.hashCode() + den.hashCode();
    }

    /** @return {@code "7"}, {@code "-3/4"}: canonical, accepted by {@link #parse(String)} */
    @Override
    public String toString() {
        return isInteger() ? num.toString() : num + "/" + den;
    }

    static Rational minusOne() {
        return MINUS_ONE;
    }
}
