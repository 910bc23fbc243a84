package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.List;
import java.util.Objects;

/**
 * An integral general Weierstrass equation y² + a1·xy + a3·y = x³ + a2·x² + a4·x + a6 with its invariants
 * b2, b4, b6, b8, c4, c6 and discriminant Δ (Silverman, <i>The Arithmetic of Elliptic Curves</i>, III.1). Immutable;
 * {@link #toString()} is the table notation {@code [a1,a2,a3,a4,a6]}. Δ may be 0 (a singular cubic): callers that
 * need an elliptic curve test {@link #isSingular()}.
 */
public final class WeierstrassModel {

    private static final BigInteger TWO = BigInteger.TWO;

    private final BigInteger a1;
    private final BigInteger a2;
    private final BigInteger a3;
    private final BigInteger a4;
    private final BigInteger a6;
    private final BigInteger b2;
    private final BigInteger b4;
    private final BigInteger b6;
    private final BigInteger b8;
    private final BigInteger c4;
    private final BigInteger c6;
    private final BigInteger discriminant;

    private WeierstrassModel(BigInteger a1, BigInteger a2, BigInteger a3, BigInteger a4, BigInteger a6) {
        this.a1 = a1;
        this.a2 = a2;
        this.a3 = a3;
        this.a4 = a4;
        this.a6 = a6;
        b2 = a1.multiply(a1).add(a2.shiftLeft(2));
        b4 = a4.shiftLeft(1).add(a1.multiply(a3));
        b6 = a3.multiply(a3).add(a6.shiftLeft(2));
        b8 = a1.multiply(a1).multiply(a6).add(a2.multiply(a6).shiftLeft(2)).subtract(a1.multiply(a3).multiply(a4))
                .add(a2.multiply(a3).multiply(a3)).subtract(a4.multiply(a4));
        c4 = b2.multiply(b2).subtract(b4.multiply(BigInteger.valueOf(24)));
        c6 = b2.pow(3).negate().add(b2.multiply(b4).multiply(BigInteger.valueOf(36)))
                .subtract(b6.multiply(BigInteger.valueOf(216)));
        discriminant = b2.multiply(b2).multiply(b8).negate().subtract(b4.pow(3).shiftLeft(3))
                .subtract(b6.multiply(b6).multiply(BigInteger.valueOf(27)))
                .add(b2.multiply(b4).multiply(b6).multiply(BigInteger.valueOf(9)));
    }

    public static WeierstrassModel of(BigInteger a1, BigInteger a2, BigInteger a3, BigInteger a4, BigInteger a6) {
        return new WeierstrassModel(Objects.requireNonNull(a1), Objects.requireNonNull(a2),
                Objects.requireNonNull(a3), Objects.requireNonNull(a4), Objects.requireNonNull(a6));
    }

    public static WeierstrassModel of(long a1, long a2, long a3, long a4, long a6) {
        return of(BigInteger.valueOf(a1), BigInteger.valueOf(a2), BigInteger.valueOf(a3), BigInteger.valueOf(a4),
                BigInteger.valueOf(a6));
    }

    /** From {@code [a1, a2, a3, a4, a6]}. */
    public static WeierstrassModel of(List<BigInteger> a) {
        if (a.size() != 5) {
            throw new IllegalArgumentException("a Weierstrass model has five coefficients, not " + a.size());
        }
        return of(a.get(0), a.get(1), a.get(2), a.get(3), a.get(4));
    }

    /**
     * The model after x = x' + r, y = y' + s·x' + t (u = 1 in Silverman, III.1, Table 3.1); the invariants b_i move
     * with r only, c4, c6 and Δ are unchanged.
     */
    public WeierstrassModel change(BigInteger r, BigInteger s, BigInteger t) {
        BigInteger n1 = a1.add(s.multiply(TWO));
        BigInteger n2 = a2.subtract(s.multiply(a1)).add(r.multiply(BigInteger.valueOf(3))).subtract(s.multiply(s));
        BigInteger n3 = a3.add(r.multiply(a1)).add(t.multiply(TWO));
        BigInteger n4 = a4.subtract(s.multiply(a3)).add(r.multiply(a2).multiply(TWO))
                .subtract(t.add(r.multiply(s)).multiply(a1)).add(r.multiply(r).multiply(BigInteger.valueOf(3)))
                .subtract(s.multiply(t).multiply(TWO));
        BigInteger n6 = a6.add(r.multiply(a4)).add(r.multiply(r).multiply(a2)).add(r.pow(3))
                .subtract(t.multiply(a3)).subtract(t.multiply(t)).subtract(r.multiply(t).multiply(a1));
        return new WeierstrassModel(n1, n2, n3, n4, n6);
    }

    /** The model with a_i replaced by a_i / u^i (x = u²x', y = u³y'); requires u^i | a_i. */
    public WeierstrassModel scaleDown(BigInteger u) {
        return new WeierstrassModel(exact(a1, u), exact(a2, u.pow(2)), exact(a3, u.pow(3)), exact(a4, u.pow(4)),
                exact(a6, u.pow(6)));
    }

    /** The model with a_i replaced by a_i · u^i: the same curve, Δ multiplied by u^12 (not minimal where u is not 1). */
    public WeierstrassModel scaleUp(BigInteger u) {
        return new WeierstrassModel(a1.multiply(u), a2.multiply(u.pow(2)), a3.multiply(u.pow(3)),
                a4.multiply(u.pow(4)), a6.multiply(u.pow(6)));
    }

    private static BigInteger exact(BigInteger a, BigInteger d) {
        BigInteger[] qr = a.divideAndRemainder(d);
        if (qr[1].signum() != 0) {
            throw new ArithmeticException(d + " does not divide " + a);
        }
        return qr[0];
    }

    public BigInteger a1() {
        return a1;
    }

    public BigInteger a2() {
        return a2;
    }

    public BigInteger a3() {
        return a3;
    }

    public BigInteger a4() {
        return a4;
    }

    public BigInteger a6() {
        return a6;
    }

    public BigInteger b2() {
        return b2;
    }

    public BigInteger b4() {
        return b4;
    }

    public BigInteger b6() {
        return b6;
    }

    public BigInteger b8() {
        return b8;
    }

    public BigInteger c4() {
        return c4;
    }

    public BigInteger c6() {
        return c6;
    }

    /** Δ = −b2²b8 − 8b4³ − 27b6² + 9b2b4b6. */
    public BigInteger discriminant() {
        return discriminant;
    }

    /** Whether Δ = 0, i.e. the cubic has a node or a cusp over Q and is not an elliptic curve. */
    public boolean isSingular() {
        return discriminant.signum() == 0;
    }

    public List<BigInteger> coefficients() {
        return List.of(a1, a2, a3, a4, a6);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WeierstrassModel m && a1.equals(m.a1) && a2.equals(m.a2) && a3.equals(m.a3)
                && a4.equals(m.a4) && a6.equals(m.a6);
    }

    @Override
    public int hashCode() {
        return Objects.hash(a1, a2, a3, a4, a6);
    }

    @Override
    public String toString() {
        return "[" + a1 + "," + a2 + "," + a3 + "," + a4 + "," + a6 + "]";
    }
}
