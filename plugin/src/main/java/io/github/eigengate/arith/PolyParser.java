package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Reader for the polynomial notation shared by {@link QPoly} and {@link FpPoly}.
 *
 * <p>Grammar (whitespace is ignored anywhere):
 *
 * <pre>
 *   poly  := [sign] term (sign term)*
 *   term  := coeff ['*'] ['x' ['^' digits]]  |  'x' ['^' digits]
 *   coeff := digits ['/' digits]
 *   sign  := '+' | '-'
 * </pre>
 *
 * Repeated powers are summed.
 */
final class PolyParser {
    /** Largest exponent accepted (see {@link Limits#MAX_EXPONENT}). */
    static final int MAX_EXPONENT = Limits.MAX_EXPONENT;

    private final String text;
    private final char[] s;
    private final int[] at;
    private int i;

    private PolyParser(String text) {
        this.text = text;
        char[] buf = new char[text.length()];
        int[] pos = new int[text.length() + 1];
        int n = 0;
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            if (!Character.isWhitespace(c)) {
                buf[n] = c;
                pos[n] = k;
                n++;
            }
        }
        pos[n] = text.length();
        this.s = java.util.Arrays.copyOf(buf, n);
        this.at = pos;
    }

    /** @return coefficients low to high, trailing zeros removed (empty list for the zero polynomial) */
    static List<Rational> parse(String text) {
        if (text.length() > Limits.MAX_EXPRESSION_LENGTH) {
            throw new ExpressionSyntaxException(text, Limits.MAX_EXPRESSION_LENGTH,
                    "an expression of at most " + Limits.MAX_EXPRESSION_LENGTH + " characters");
        }
        return new PolyParser(text).run();
    }

    private ExpressionSyntaxException error(String expected) {
        return new ExpressionSyntaxException(text, at[i], expected);
    }

    private boolean more() {
        return i < s.length;
    }

    private List<Rational> run() {
        List<Rational> coeffs = new ArrayList<>();
        boolean first = true;
        do {
            boolean negative = false;
            if (more() && (s[i] == '+' || s[i] == '-')) {
                negative = s[i] == '-';
                i++;
            } else if (!first) {
                throw error("'+', '-' or end of text");
            }
            if (!more()) {
                throw error(first && i == 0 ? "a sign, a digit or 'x'" : "a digit or 'x'");
            }
            Rational c = Rational.ONE;
            boolean haveCoeff = false;
            boolean fraction = false;
            if (Rational.isDigit(s[i])) {
                c = Rational.of(digits());
                haveCoeff = true;
                if (more() && s[i] == '/') {
                    i++;
                    if (!more() || !Rational.isDigit(s[i])) {
                        throw error("a digit");
                    }
                    int denAt = i;
                    BigInteger d = digits();
                    if (d.signum() == 0) {
                        i = denAt;
                        throw error("a nonzero denominator");
                    }
                    c = Rational.of(c.num(), d);
                    fraction = true;
                }
            }
            int exponent = 0;
            boolean star = false;
            if (haveCoeff && more() && s[i] == '*') {
                i++;
                star = true;
                if (!more() || s[i] != 'x') {
                    throw error("'x'");
                }
            }
            if (more() && s[i] == 'x') {
                i++;
                exponent = 1;
                if (more() && s[i] == '^') {
                    i++;
                    if (!more() || !Rational.isDigit(s[i])) {
                        throw error("a digit");
                    }
                    int expAt = i;
                    BigInteger e = digits();
                    if (e.compareTo(BigInteger.valueOf(MAX_EXPONENT)) > 0) {
                        i = expAt;
                        throw error("an exponent at most " + MAX_EXPONENT);
                    }
                    exponent = e.intValue();
                }
            } else if (!haveCoeff) {
                throw error(first && i == 0 ? "a sign, a digit or 'x'" : "a digit or 'x'");
            }
            if (more() && !(s[i] == '+' || s[i] == '-')) {
                if (exponent == 0 && !star) {
                    throw error(fraction ? "'*', 'x', '+', '-' or end of text" : "'/', '*', 'x', '+', '-' or end of text");
                }
                throw error(exponent == 1 && s[i - 1] == 'x' ? "'^', '+', '-' or end of text" : "'+', '-' or end of text");
            }
            while (coeffs.size() <= exponent) {
                coeffs.add(Rational.ZERO);
            }
            coeffs.set(exponent, coeffs.get(exponent).add(negative ? c.negate() : c));
            first = false;
        } while (more());
        int n = coeffs.size();
        while (n > 0 && coeffs.get(n - 1).signum() == 0) {
            n--;
        }
        return coeffs.subList(0, n);
    }

    private BigInteger digits() {
        int start = i;
        while (more() && Rational.isDigit(s[i])) {
            i++;
        }
        if (i - start > Limits.MAX_DIGITS) {
            i = start;
            throw error("a number of at most " + Limits.MAX_DIGITS + " digits");
        }
        return new BigInteger(new String(s, start, i - start));
    }
}
