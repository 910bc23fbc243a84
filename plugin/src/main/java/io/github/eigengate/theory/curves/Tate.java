package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;

/**
 * Tate's algorithm: the reduction type, conductor exponent, Kodaira symbol, Tamagawa number and a minimal model of an
 * elliptic curve over Q at a prime p, including p = 2 and p = 3. Follows Silverman, <i>Advanced Topics in the
 * Arithmetic of Elliptic Curves</i>, IV.9 (Tate's algorithm, steps 1–11) with the explicit changes of coordinates
 * of Cremona, <i>Algorithms for Modular Elliptic Curves</i> (2nd ed.), §3.2; the conductor exponent is
 * f = v(Δ) + 1 − m (Ogg's formula, m the number of components). A model that is not minimal at p is divided by p
 * (step 11) and the algorithm restarts, which is how Laska–Kraus–Connell minimality is reached prime by prime.
 */
public final class Tate {

    private static final BigInteger TWO = BigInteger.TWO;
    private static final BigInteger THREE = BigInteger.valueOf(3);

    private Tate() {
    }

    /**
     * @param e a nonsingular integral model
     * @param p a prime (not checked)
     */
    public static LocalReduction reduce(WeierstrassModel e, BigInteger p) {
        if (e.isSingular()) {
            throw new IllegalArgumentException("singular model " + e);
        }
        WeierstrassModel m = e;
        while (true) {
            int n = val(m.discriminant(), p);
            if (n == 0) {
                return new LocalReduction(p, 0, "I0", 1, LocalReduction.Type.GOOD, m, 0);
            }
            // step 2: the singular point of the reduction to (0, 0), so that p | a3, a4, a6
            BigInteger[] sing = singularPoint(m, p);
            m = m.change(sing[0], BigInteger.ZERO, sing[1]);
            if (!divides(p, m.b2())) {
                boolean split = hasRoot(BigInteger.ONE, m.a1(), m.a2().negate(), p);
                int c = split ? n : (n % 2 == 0 ? 2 : 1);
                return new LocalReduction(p, 1, "I" + n, c, split ? LocalReduction.Type.SPLIT
                        : LocalReduction.Type.NONSPLIT, m, n);
            }
            // steps 3–5
            if (val(m.a6(), p) < 2) {
                return additive(p, n, "II", 1, m);
            }
            if (val(m.b8(), p) < 3) {
                return additive(p, n - 1, "III", 2, m);
            }
            if (val(m.b6(), p) < 3) {
                boolean roots = hasRoot(BigInteger.ONE, m.a3().divide(p), m.a6().divide(p.pow(2)).negate(), p);
                return additive(p, n - 2, "IV", roots ? 3 : 1, m);
            }
            // step 6: p | a1, a2; p² | a3, a4; p³ | a6
            BigInteger s;
            BigInteger t;
            if (p.equals(TWO)) {
                s = m.a2().mod(TWO);
                t = TWO.multiply(m.a6().divide(BigInteger.valueOf(4)).mod(TWO));
            } else {
                BigInteger half = TWO.modInverse(p);
                s = m.a1().negate().multiply(half).mod(p);
                t = p.multiply(m.a3().divide(p).negate().multiply(half).mod(p));
            }
            m = m.change(BigInteger.ZERO, s, t);
            BigInteger p2 = p.pow(2);
            BigInteger p3 = p.pow(3);
            BigInteger b = m.a2().divide(p);
            BigInteger c = m.a4().divide(p2);
            BigInteger d = m.a6().divide(p3);
            // discriminant of T³ + bT² + cT + d
            BigInteger disc = b.pow(2).multiply(c.pow(2)).subtract(c.pow(3).shiftLeft(2))
                    .subtract(b.pow(3).multiply(d).shiftLeft(2)).subtract(d.pow(2).multiply(BigInteger.valueOf(27)))
                    .add(b.multiply(c).multiply(d).multiply(BigInteger.valueOf(18)));
            BigInteger x = c.multiply(THREE).subtract(b.pow(2));
            if (!divides(p, disc)) {
                return additive(p, n - 4, "I0*", 1 + CubicRoots.count(b, c, d, p), m);
            }
            if (!divides(p, x)) {
                return starred(p, n, m, b, c, d, x);
            }
            // step 8: a triple root, moved to T = 0, so that p² | a2, p³ | a4, p⁴ | a6
            BigInteger alpha;
            if (p.equals(TWO)) {
                alpha = b.mod(TWO);
            } else if (p.equals(THREE)) {
                alpha = d.negate().mod(THREE);
            } else {
                alpha = b.negate().multiply(THREE.modInverse(p)).mod(p);
            }
            m = m.change(p.multiply(alpha), BigInteger.ZERO, BigInteger.ZERO);
            BigInteger x3 = m.a3().divide(p2);
            BigInteger x6 = m.a6().divide(p.pow(4));
            if (!divides(p, x3.pow(2).add(x6.shiftLeft(2)))) {
                return additive(p, n - 6, "IV*", hasRoot(BigInteger.ONE, x3, x6.negate(), p) ? 3 : 1, m);
            }
            // step 9: the double root of Y² + a3,2·Y − a6,4 moved to 0, so that p³ | a3, p⁵ | a6
            BigInteger y0 = p.equals(TWO) ? x6.mod(TWO) : x3.negate().multiply(TWO.modInverse(p)).mod(p);
            m = m.change(BigInteger.ZERO, BigInteger.ZERO, p2.multiply(y0));
            if (val(m.a4(), p) < 4) {
                return additive(p, n - 7, "III*", 2, m);
            }
            if (val(m.a6(), p) < 6) {
                return additive(p, n - 8, "II*", 1, m);
            }
            // step 11: not minimal at p
            m = m.scaleDown(p);
        }
    }

    /** Step 7: type I_ν*, by the subprocedure that moves the double root (Silverman IV.9.4, Cremona §3.2). */
    private static LocalReduction starred(BigInteger p, int n, WeierstrassModel start, BigInteger b, BigInteger c,
                                          BigInteger d, BigInteger x) {
        BigInteger root = p.equals(TWO) ? c.mod(TWO)
                : b.multiply(c).subtract(d.multiply(BigInteger.valueOf(9))).multiply(x.shiftLeft(1).modInverse(p))
                        .mod(p);
        WeierstrassModel m = start.change(p.multiply(root), BigInteger.ZERO, BigInteger.ZERO);
        int ix = 3;
        int iy = 3;
        BigInteger mx = p.pow(2);
        BigInteger my = p.pow(2);
        int cp;
        while (true) {
            BigInteger xa2 = m.a2().divide(p);
            BigInteger xa3 = m.a3().divide(my);
            BigInteger xa4 = m.a4().divide(p.multiply(mx));
            BigInteger xa6 = m.a6().divide(mx.multiply(my));
            if (!divides(p, xa3.pow(2).add(xa6.shiftLeft(2)))) {
                cp = hasRoot(BigInteger.ONE, xa3, xa6.negate(), p) ? 4 : 2;
                break;
            }
            BigInteger y0 = p.equals(TWO) ? xa6.mod(TWO) : xa3.negate().multiply(TWO.modInverse(p)).mod(p);
            m = m.change(BigInteger.ZERO, BigInteger.ZERO, my.multiply(y0));
            my = my.multiply(p);
            iy++;
            xa2 = m.a2().divide(p);
            xa4 = m.a4().divide(p.multiply(mx));
            xa6 = m.a6().divide(mx.multiply(my));
            if (!divides(p, xa4.pow(2).subtract(xa2.multiply(xa6).shiftLeft(2)))) {
                cp = hasRoot(xa2, xa4, xa6, p) ? 4 : 2;
                break;
            }
            BigInteger x0 = p.equals(TWO) ? xa6.mod(TWO)
                    : xa4.negate().multiply(xa2.shiftLeft(1).modInverse(p)).mod(p);
            m = m.change(mx.multiply(x0), BigInteger.ZERO, BigInteger.ZERO);
            mx = mx.multiply(p);
            ix++;
        }
        int nu = ix + iy - 5;
        return additive(p, n - 4 - nu, "I" + nu + "*", cp, m);
    }

    private static LocalReduction additive(BigInteger p, int f, String kodaira, int c, WeierstrassModel m) {
        return new LocalReduction(p, f, kodaira, c, LocalReduction.Type.ADDITIVE, m, val(m.discriminant(), p));
    }

    /** The singular point (x0, y0) of the reduction mod p of a model with p | Δ, as integers in [0, p). */
    static BigInteger[] singularPoint(WeierstrassModel m, BigInteger p) {
        if (p.compareTo(BigInteger.valueOf(5)) < 0) {
            int q = p.intValueExact();
            long[] a = {m.a1().mod(p).longValue(), m.a2().mod(p).longValue(), m.a3().mod(p).longValue(),
                    m.a4().mod(p).longValue(), m.a6().mod(p).longValue()};
            for (long x = 0; x < q; x++) {
                for (long y = 0; y < q; y++) {
                    long f = y * y + a[0] * x * y + a[2] * y - x * x * x - a[1] * x * x - a[3] * x - a[4];
                    long fx = a[0] * y - 3 * x * x - 2 * a[1] * x - a[3];
                    long fy = 2 * y + a[0] * x + a[2];
                    if (Math.floorMod(f, q) == 0 && Math.floorMod(fx, q) == 0 && Math.floorMod(fy, q) == 0) {
                        return new BigInteger[] {BigInteger.valueOf(x), BigInteger.valueOf(y)};
                    }
                }
            }
            throw new IllegalStateException("no singular point mod " + p + " on " + m);
        }
        // the double (or triple) root of 4x³ + b2x² + 2b4x + b6 (Cremona §3.2)
        BigInteger twelve = BigInteger.valueOf(12);
        BigInteger x0;
        if (divides(p, m.c4())) {
            x0 = m.b2().negate().multiply(twelve.modInverse(p)).mod(p);
        } else {
            x0 = m.c6().add(m.b2().multiply(m.c4())).negate().multiply(twelve.multiply(m.c4()).modInverse(p)).mod(p);
        }
        BigInteger y0 = m.a1().multiply(x0).add(m.a3()).negate().multiply(TWO.modInverse(p)).mod(p);
        return new BigInteger[] {x0, y0};
    }

    /** Whether a·X² + b·X + c has a root in F_p. */
    static boolean hasRoot(BigInteger a, BigInteger b, BigInteger c, BigInteger p) {
        if (p.equals(TWO)) {
            boolean at0 = !c.testBit(0);
            boolean at1 = !a.add(b).add(c).testBit(0);
            return at0 || at1;
        }
        if (divides(p, a)) {
            return !divides(p, b) || divides(p, c);
        }
        BigInteger disc = b.multiply(b).subtract(a.multiply(c).shiftLeft(2)).mod(p);
        return disc.signum() == 0 || Legendre.symbol(disc, p) == 1;
    }

    static boolean divides(BigInteger p, BigInteger a) {
        return a.mod(p).signum() == 0;
    }

    /** v_p(a); {@link Integer#MAX_VALUE} for a = 0. */
    static int val(BigInteger a, BigInteger p) {
        if (a.signum() == 0) {
            return Integer.MAX_VALUE;
        }
        if (p.equals(TWO)) {
            return a.getLowestSetBit();
        }
        int v = 0;
        BigInteger[] qr = a.divideAndRemainder(p);
        while (qr[1].signum() == 0) {
            v++;
            a = qr[0];
            qr = a.divideAndRemainder(p);
        }
        return v;
    }
}
