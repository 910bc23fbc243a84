package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;

/**
 * An immutable polynomial with rational coefficients in the variable {@code x}.
 *
 * <p>Stored densely, low degree first, without leading zeros; equality is by coefficients. The
 * textual form (see {@link #parse(String)} and {@link #toString()}) is the readable notation
 * {@code "x^2 - x - 1"}, {@code "-1/72*x^2 + 2697*x + 478011548"}.
 */
public final class QPoly {
    private static final Rational[] NONE = new Rational[0];

    /** The zero polynomial. */
    public static final QPoly ZERO = new QPoly(NONE);
    /** The constant polynomial 1. */
    public static final QPoly ONE = new QPoly(new Rational[] {Rational.ONE});

    private static final QPoly X = new QPoly(new Rational[] {Rational.ZERO, Rational.ONE});

    private final Rational[] c;

    private QPoly(Rational[] c) {
        this.c = c;
    }

    /** Wraps an array known to be trimmed; no copy. */
    static QPoly wrap(Rational[] c) {
        int n = c.length;
        while (n > 0 && c[n - 1].signum() == 0) {
            n--;
        }
        if (n == 0) {
            return ZERO;
        }
        return new QPoly(n == c.length ? c : Arrays.copyOf(c, n));
    }

    /**
     * Parses the readable notation: a sum or difference of terms, each an optional rational
     * coefficient ({@code 3} or {@code a/b}), an optional {@code *}, and an optional {@code x} with
     * an optional {@code ^} and nonnegative integer exponent. A leading sign is allowed, whitespace
     * is ignored anywhere and repeated powers are summed. Examples: {@code "x^2 - x - 1"}, {@code
     * "3x"}, {@code "-x"}, {@code "7"}, {@code "1/2*x^3-x"}. Exponents above 100000 are rejected.
     *
     * @throws ExpressionSyntaxException with the offset of the problem and what was expected there
     */
    public static QPoly parse(String text) {
        return wrap(PolyParser.parse(text).toArray(NONE));
    }

    /** @return the polynomial with the given coefficients, lowest degree first */
    public static QPoly of(Rational... coeffsLowToHigh) {
        for (Rational r : coeffsLowToHigh) {
            if (r == null) {
                throw new NullPointerException("null coefficient");
            }
        }
        return wrap(coeffsLowToHigh.clone());
    }

    /** @return the polynomial with the given integer coefficients, lowest degree first */
    public static QPoly ofIntegers(long... coeffsLowToHigh) {
        Rational[] r = new Rational[coeffsLowToHigh.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = Rational.of(coeffsLowToHigh[k]);
        }
        return wrap(r);
    }

    static QPoly ofIntegers(BigInteger[] coeffsLowToHigh) {
        Rational[] r = new Rational[coeffsLowToHigh.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = Rational.of(coeffsLowToHigh[k]);
        }
        return wrap(r);
    }

    /** @return the polynomial {@code x} */
    public static QPoly x() {
        return X;
    }

    /** @return the constant polynomial {@code r} */
    public static QPoly constant(Rational r) {
        return wrap(new Rational[] {r});
    }

    /** @return {@code c x^k} */
    public static QPoly monomial(Rational coeff, int k) {
        if (k < 0) {
            throw new IllegalArgumentException("negative exponent " + k);
        }
        Rational[] r = new Rational[k + 1];
        Arrays.fill(r, Rational.ZERO);
        r[k] = coeff;
        return wrap(r);
    }

    /** @return the degree, or -1 for the zero polynomial */
    public int degree() {
        return c.length - 1;
    }

    /**
     * @return the coefficient of {@code x^i} (zero for {@code i > degree()})
     * @throws IndexOutOfBoundsException if {@code i < 0}
     */
    public Rational coefficient(int i) {
        if (i < 0) {
            throw new IndexOutOfBoundsException("negative index " + i);
        }
        return i < c.length ? c[i] : Rational.ZERO;
    }

    /** @return the coefficients, lowest degree first (empty for the zero polynomial) */
    public List<Rational> coefficients() {
        return Collections.unmodifiableList(Arrays.asList(c));
    }

    Rational[] coeffArray() {
        return c;
    }

    /** @return the leading coefficient (zero for the zero polynomial) */
    public Rational leadingCoefficient() {
        return c.length == 0 ? Rational.ZERO : c[c.length - 1];
    }

    /** @return whether this is the zero polynomial */
    public boolean isZero() {
        return c.length == 0;
    }

    /** @return whether the leading coefficient is 1 (false for zero) */
    public boolean isMonic() {
        return c.length > 0 && c[c.length - 1].equals(Rational.ONE);
    }

    /** @return whether every coefficient is an integer */
    public boolean hasIntegerCoefficients() {
        for (Rational r : c) {
            if (!r.isInteger()) {
                return false;
            }
        }
        return true;
    }

    /** @return {@code this + o} */
    public QPoly add(QPoly o) {
        int n = Math.max(c.length, o.c.length);
        Rational[] r = new Rational[n];
        for (int k = 0; k < n; k++) {
            r[k] = coefficient(k).add(o.coefficient(k));
        }
        return wrap(r);
    }

    /** @return {@code this - o} */
    public QPoly subtract(QPoly o) {
        int n = Math.max(c.length, o.c.length);
        Rational[] r = new Rational[n];
        for (int k = 0; k < n; k++) {
            r[k] = coefficient(k).subtract(o.coefficient(k));
        }
        return wrap(r);
    }

    /** @return {@code -this} */
    public QPoly negate() {
        return scale(Rational.minusOne());
    }

    /** @return {@code this * o} */
    public QPoly multiply(QPoly o) {
        if (isZero() || o.isZero()) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length + o.c.length - 1];
        Work.charge(Work.BIG * c.length * o.c.length);
        Arrays.fill(r, Rational.ZERO);
        for (int i = 0; i < c.length; i++) {
            if (c[i].signum() == 0) {
                continue;
            }
            for (int j = 0; j < o.c.length; j++) {
                r[i + j] = r[i + j].add(c[i].multiply(o.c[j]));
            }
        }
        return wrap(r);
    }

    /** @return {@code s * this} */
    public QPoly scale(Rational s) {
        if (s.signum() == 0) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length];
        for (int k = 0; k < c.length; k++) {
            r[k] = c[k].multiply(s);
        }
        return wrap(r);
    }

    /** @return this divided by its leading coefficient ({@code ZERO} stays zero) */
    public QPoly monic() {
        return isZero() || isMonic() ? this : scale(leadingCoefficient().inverse());
    }

    /**
     * Euclidean division over Q.
     *
     * @return {@code {q, r}} with {@code this = q*d + r} and {@code deg r < deg d}
     * @throws ArithmeticException if {@code d} is zero
     */
    public QPoly[] divRem(QPoly d) {
        if (d.isZero()) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        int dd = d.degree();
        if (degree() < dd) {
            return new QPoly[] {ZERO, this};
        }
        Rational[] r = c.clone();
        Rational[] q = new Rational[degree() - dd + 1];
        Work.charge(Work.BIG * (degree() - dd + 1) * (dd + 1));
        Rational inv = d.leadingCoefficient().inverse();
        for (int k = degree(); k >= dd; k--) {
            Rational t = r[k].multiply(inv);
            q[k - dd] = t;
            if (t.signum() != 0) {
                for (int j = 0; j <= dd; j++) {
                    r[k - dd + j] = r[k - dd + j].subtract(t.multiply(d.c[j]));
                }
            }
        }
        return new QPoly[] {wrap(q), wrap(Arrays.copyOf(r, dd))};
    }

    /** @return the remainder of {@code this} modulo {@code d} */
    public QPoly mod(QPoly d) {
        return divRem(d)[1];
    }

    /**
     * @return the monic greatest common divisor; {@code gcd(0, 0) = 0}. Computed via the primitive
     *     polynomial remainder sequence over Z (Knuth, TAOCP vol. 2, §4.6.1) to avoid rational
     *     coefficient growth.
     */
    public QPoly gcd(QPoly o) {
        if (isZero() && o.isZero()) {
            return ZERO;
        }
        BigInteger[] g = ZPoly.gcd(ZPoly.primitiveOf(c), ZPoly.primitiveOf(o.c));
        return ofIntegers(g).monic();
    }

    /** @return the formal derivative */
    public QPoly derivative() {
        if (c.length <= 1) {
            return ZERO;
        }
        Rational[] r = new Rational[c.length - 1];
        for (int k = 1; k < c.length; k++) {
            r[k - 1] = c[k].multiply(Rational.of(k));
        }
        return wrap(r);
    }

    /** @return the value at {@code t} (Horner's rule) */
    public Rational evaluate(Rational t) {
        Rational acc = Rational.ZERO;
        for (int k = c.length - 1; k >= 0; k--) {
            acc = acc.multiply(t).add(c[k]);
        }
        return acc;
    }

    /**
     * @return {@code this / gcd(this, this')}: the product of the distinct irreducible factors,
     *     with the leading coefficient of {@code this}; zero for zero, and the polynomial itself for
     *     constants
     */
    public QPoly squarefreePart() {
        if (degree() <= 0 || squarefreeModuloSomePrime()) {
            return this;
        }
        QPoly g = gcd(derivative());
        return g.degree() == 0 ? this : divRem(g)[0];
    }

    /** Large primes for the modular squarefreeness test. */
    private static final long[] TEST_PRIMES = {2147483647L, 2147483629L, 2147483587L};

    /**
     * A sufficient test, cheap beside a gcd over Q: if f mod q is squarefree of the same degree for a prime q, then f
     * is squarefree over Q (a square factor g² of f over Z reduces to ḡ² of the same degree, since q does not divide
     * the leading coefficient). Returns false when no tested prime decides.
     */
    private boolean squarefreeModuloSomePrime() {
        for (long q : TEST_PRIMES) {
            FpPoly r;
            try {
                r = FpPoly.fromQPoly(this, q);
            } catch (ArithmeticException e) {
                continue; // q divides a denominator
            }
            if (r.degree() != degree()) {
                continue;
            }
            if (r.gcd(r.derivative()).degree() == 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * @return {@code this^e}
     * @throws IllegalArgumentException if {@code e < 0}
     */
    public QPoly pow(int e) {
        return Powers.power(this, e, ONE, QPoly::multiply);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof QPoly q && Arrays.equals(c, q.c);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(c);
    }

    /** @return the readable notation, e.g. {@code "-1/72*x^2 + 2697*x + 478011548"}; {@code "0"} for zero */
    @Override
    public String toString() {
        return format(c.length, k -> c[k].signum(), k -> c[k].abs().toString(), k -> c[k].abs().equals(Rational.ONE));
    }

    /** Shared formatter for {@link QPoly} and {@link FpPoly}. */
    static String format(
            int len,
            java.util.function.IntUnaryOperator sign,
            java.util.function.IntFunction<String> absText,
            java.util.function.IntPredicate absIsOne) {
        if (len == 0) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (int k = len - 1; k >= 0; k--) {
            int s = sign.applyAsInt(k);
            if (s == 0) {
                continue;
            }
            if (sb.length() == 0) {
                if (s < 0) {
                    sb.append('-');
                }
            } else {
                sb.append(s < 0 ? " - " : " + ");
            }
            if (k == 0) {
                sb.append(absText.apply(k));
            } else {
                if (!absIsOne.test(k)) {
                    sb.append(absText.apply(k)).append('*');
                }
                sb.append('x');
                if (k > 1) {
                    sb.append('^').append(k);
                }
            }
        }
        return sb.toString();
    }
}
