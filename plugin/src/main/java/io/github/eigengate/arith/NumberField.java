package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;

/**
 * The algebra {@code K = Q[x]/(f)} for a monic polynomial {@code f} of degree {@code d >= 1} with
 * rational coefficients; a number field when {@code f} is irreducible.
 *
 * <p>Irreducibility is not checked here (see {@link ZFactorization#isIrreducible(QPoly)}); all ring
 * operations are valid for any monic {@code f}, but {@link Element#inverse()} only succeeds for
 * elements of nonzero norm, which are all nonzero elements exactly when {@code f} is irreducible,
 * and {@link Element#minPoly()} assumes irreducibility.
 *
 * <p>Elements are stored on the power basis {@code 1, x, ..., x^(d-1)} as integer numerators over
 * one common positive denominator (in lowest terms), and products are reduced with a precomputed
 * table of {@code x^k mod f} for {@code d <= k <= 2d-2}; traces use the power sums of the roots of
 * {@code f}, precomputed by Newton's identities.
 */
public final class NumberField extends ElementField<NumberField.Element> {
    private final QPoly f;
    private final int d;
    /** {@code x^(d+k) mod f = (1/redDen) * sum_j red[k][j] x^j} for {@code 0 <= k <= d-2}. */
    private final BigInteger[][] red;
    private final BigInteger redDen;
    /** {@code f = x^d + (1/fDen) * sum_{j<d} fNum[j] x^j}. */
    private final BigInteger[] fNum;
    private final BigInteger fDen;
    /** {@code traceOfPower[i] = Tr(x^i)} for {@code 0 <= i < d}. */
    private final Rational[] traceOfPower;
    private final BigInteger[] integralTraces; // Tr(x^k), k < d, when f is monic integral; else null
    private final Element zero;
    private final Element one;

    private NumberField(QPoly f) {
        this.f = f;
        this.d = f.degree();
        // f's lower coefficients over a common denominator
        Rational[] lower = Arrays.copyOf(f.coeffArray(), d);
        BigInteger[] fn = new BigInteger[d];
        BigInteger fd = commonDenominator(lower);
        for (int j = 0; j < d; j++) {
            fn[j] = lower[j].num().multiply(fd.divide(lower[j].den()));
        }
        this.fNum = fn;
        this.fDen = fd;
        // x^(d+k) mod f, iteratively: x^d = -(lower), x^(m+1) = x * x^m reduced
        Rational[][] rr = new Rational[Math.max(d - 1, 0)][];
        Rational[] cur = new Rational[d];
        for (int j = 0; j < d; j++) {
            cur[j] = lower[j].negate();
        }
        for (int k = 0; k < d - 1; k++) {
            rr[k] = cur;
            cur = timesX(cur, lower);
        }
        BigInteger e = BigInteger.ONE;
        for (Rational[] row : rr) {
            e = lcm(e, commonDenominator(row));
        }
        this.redDen = e;
        this.red = new BigInteger[rr.length][];
        for (int k = 0; k < rr.length; k++) {
            red[k] = new BigInteger[d];
            for (int j = 0; j < d; j++) {
                red[k][j] = rr[k][j].num().multiply(e.divide(rr[k][j].den()));
            }
        }
        // Newton's identities: s_k = -(k a_{d-k} + sum_{i=1}^{k-1} a_{d-i} s_{k-i})
        Rational[] s = new Rational[d];
        s[0] = Rational.of(d);
        for (int k = 1; k < d; k++) {
            Rational acc = Rational.of(k).multiply(f.coefficient(d - k));
            for (int i = 1; i < k; i++) {
                acc = acc.add(f.coefficient(d - i).multiply(s[k - i]));
            }
            s[k] = acc.negate();
        }
        this.traceOfPower = s;
        BigInteger[] it = null;
        if (fd.equals(BigInteger.ONE)) { // monic integral f: the traces of the powers of x are integers
            it = new BigInteger[d];
            for (int k = 0; k < d; k++) {
                it[k] = s[k].num();
            }
        }
        this.integralTraces = it;
        BigInteger[] z = new BigInteger[d];
        Arrays.fill(z, BigInteger.ZERO);
        this.zero = new Element(this, z, BigInteger.ONE);
        BigInteger[] o = z.clone();
        o[0] = BigInteger.ONE;
        this.one = new Element(this, o, BigInteger.ONE);
    }

    private volatile BigInteger[] hankel;

    /** Tr(x^m) for 0 ≤ m ≤ 2d − 2, f monic integral (Newton's identities for the power sums of the roots of f). */
    private BigInteger[] hankelTraces() {
        BigInteger[] t = hankel;
        if (t == null) {
            t = Arrays.copyOf(integralTraces, 2 * d - 1);
            for (int m = d; m < 2 * d - 1; m++) {
                BigInteger acc = BigInteger.ZERO; // s_m = −Σ_{i=1}^{d} f_{d−i} s_{m−i}
                for (int i = 1; i <= d; i++) {
                    acc = acc.add(fNum[d - i].multiply(t[m - i]));
                }
                t[m] = acc.negate();
            }
            hankel = t;
        }
        return t;
    }

    /**
     * The product of two integral coordinate vectors in Z[x]/(f), for f monic integral (then the reduction rows are
     * integral): no common denominator and no gcd.
     */
    private BigInteger[] multiplyIntegral(BigInteger[] a, BigInteger[] b) {
        return reduceByF(ZPoly.multiply(a, b));
    }

    /**
     * p mod f for f monic integral, by synthetic division from the top: x^k = x^(k-d) (x^d − f) + …, each step
     * multiplying by the (small) coefficients of f rather than by the reduction rows of x^(d+k), which grow with k.
     */
    private BigInteger[] reduceByF(BigInteger[] p) {
        BigInteger[] r = Arrays.copyOf(p, Math.max(p.length, d));
        for (int k = p.length; k < d; k++) {
            r[k] = BigInteger.ZERO;
        }
        for (int k = p.length - 1; k >= d; k--) {
            BigInteger t = r[k];
            if (t.signum() == 0) {
                continue;
            }
            for (int j = 0; j < d; j++) {
                if (fNum[j].signum() != 0) {
                    r[k - d + j] = r[k - d + j].subtract(t.multiply(fNum[j]));
                }
            }
        }
        return r.length == d ? r : Arrays.copyOf(r, d);
    }

    private static Rational[] timesX(Rational[] v, Rational[] lower) {
        int d = v.length;
        Rational top = v[d - 1];
        Rational[] r = new Rational[d];
        r[0] = Rational.ZERO;
        System.arraycopy(v, 0, r, 1, d - 1);
        if (top.signum() != 0) {
            for (int j = 0; j < d; j++) {
                r[j] = r[j].subtract(top.multiply(lower[j]));
            }
        }
        return r;
    }

    private static BigInteger lcm(BigInteger a, BigInteger b) {
        return a.divide(a.gcd(b)).multiply(b);
    }

    private static BigInteger commonDenominator(Rational[] v) {
        BigInteger l = BigInteger.ONE;
        for (Rational r : v) {
            if (!r.isInteger()) {
                l = lcm(l, r.den());
            }
        }
        return l;
    }

    /**
     * @param f monic polynomial of degree at least 1 (irreducibility is not checked)
     * @return the algebra {@code Q[x]/(f)}
     * @throws IllegalArgumentException if {@code f} is not monic or is constant
     */
    public static NumberField of(QPoly f) {
        if (f.degree() < 1 || !f.isMonic()) {
            throw new IllegalArgumentException("defining polynomial must be monic of degree >= 1: " + f);
        }
        return new NumberField(f);
    }

    /** @return the degree {@code d = deg f} */
    public int degree() {
        return d;
    }

    /** @return the defining polynomial {@code f} */
    public QPoly polynomial() {
        return f;
    }

    /** @return the class of {@code g} modulo {@code f} */
    public Element element(QPoly g) {
        if (g.degree() >= d) {
            g = g.mod(f);
        }
        List<Rational> coords = new ArrayList<>(d);
        for (int j = 0; j < d; j++) {
            coords.add(g.coefficient(j));
        }
        return element(coords);
    }

    /**
     * @param powerBasisCoords coordinates on {@code 1, x, ..., x^(d-1)}
     * @throws IllegalArgumentException if the list does not have length {@code d}
     */
    public Element element(List<Rational> powerBasisCoords) {
        if (powerBasisCoords.size() != d) {
            throw new IllegalArgumentException(
                    "expected " + d + " coordinates for " + name() + ", got " + powerBasisCoords.size());
        }
        Rational[] r = powerBasisCoords.toArray(new Rational[0]);
        BigInteger l = commonDenominator(r);
        BigInteger[] n = new BigInteger[d];
        for (int j = 0; j < d; j++) {
            n[j] = r[j].num().multiply(l.divide(r[j].den()));
        }
        return make(n, l);
    }

    /** @return the rational {@code q} as an element */
    public Element fromRational(Rational q) {
        BigInteger[] n = new BigInteger[d];
        Arrays.fill(n, BigInteger.ZERO);
        n[0] = q.num();
        return new Element(this, n, q.den());
    }

    /** @return the class of {@code x} */
    public Element generator() {
        if (d == 1) {
            return fromRational(f.coefficient(0).negate());
        }
        BigInteger[] n = new BigInteger[d];
        Arrays.fill(n, BigInteger.ZERO);
        n[1] = BigInteger.ONE;
        return new Element(this, n, BigInteger.ONE);
    }

    /** Normalises numerators/denominator to lowest terms. */
    private Element make(BigInteger[] n, BigInteger den) {
        if (den.signum() < 0) {
            for (int j = 0; j < d; j++) {
                n[j] = n[j].negate();
            }
            den = den.negate();
        }
        BigInteger g = den;
        for (int j = 0; j < d && !g.equals(BigInteger.ONE); j++) {
            g = g.gcd(n[j]);
        }
        boolean allZero = true;
        for (BigInteger c : n) {
            if (c.signum() != 0) {
                allZero = false;
                break;
            }
        }
        if (allZero) {
            return zero;
        }
        if (!g.equals(BigInteger.ONE)) {
            for (int j = 0; j < d; j++) {
                n[j] = n[j].divide(g);
            }
            den = den.divide(g);
        }
        return new Element(this, n, den);
    }

    @Override
    public Element zero() {
        return zero;
    }

    @Override
    public Element one() {
        return one;
    }

    @Override
    public Element fromInteger(BigInteger n) {
        return fromRational(Rational.of(n));
    }

    /** @return {@code "Q[x]/(f)"} */
    @Override
    public String name() {
        return "Q[x]/(" + f + ")";
    }

    @Override
    public String toString() {
        return name();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NumberField k && f.equals(k.f);
    }

    @Override
    public int hashCode() {
        return f.hashCode();
    }

    /**
     * An element of {@link NumberField}: immutable, equal when in the same field (same defining
     * polynomial) with the same coordinates.
     */
    public static final class Element implements ElementField.Arithmetic<Element> {
        private final NumberField field;
        private final BigInteger[] num;
        private final BigInteger den;
        private volatile QPoly charPoly;

        private Element(NumberField field, BigInteger[] num, BigInteger den) {
            this.field = field;
            this.num = num;
            this.den = den;
        }

        /** @return the field this element belongs to */
        public NumberField field() {
            return field;
        }

        /** @return coordinates on the power basis {@code 1, x, ..., x^(d-1)} (length {@code d}) */
        public List<Rational> coordinates() {
            List<Rational> r = new ArrayList<>(num.length);
            for (BigInteger n : num) {
                r.add(Rational.of(n, den));
            }
            return Collections.unmodifiableList(r);
        }

        /** @return numerators over {@link #commonDenominator()}; a copy */
        BigInteger[] numerators() {
            return num.clone();
        }

        /** @return the least positive integer {@code D} with {@code D * this} in {@code Z[x]/(f)} coordinates */
        public BigInteger commonDenominator() {
            return den;
        }

        /** @return the representative of degree {@code < d} */
        public QPoly asPolynomial() {
            return QPoly.wrap(coordinates().toArray(new Rational[0]));
        }

        /** @return whether this is zero */
        public boolean isZero() {
            return this == field.zero || (den.equals(BigInteger.ONE) && allZero(num));
        }

        private static boolean allZero(BigInteger[] v) {
            for (BigInteger c : v) {
                if (c.signum() != 0) {
                    return false;
                }
            }
            return true;
        }

        private Element other(Element o) {
            return field.own(o);
        }

        /** @return {@code this + o} */
        public Element add(Element o) {
            other(o);
            int d = num.length;
            BigInteger[] r = new BigInteger[d];
            if (den.equals(o.den)) {
                for (int j = 0; j < d; j++) {
                    r[j] = num[j].add(o.num[j]);
                }
                return den.equals(BigInteger.ONE) ? field.makeIntegral(r) : field.make(r, den);
            }
            for (int j = 0; j < d; j++) {
                r[j] = num[j].multiply(o.den).add(o.num[j].multiply(den));
            }
            return field.make(r, den.multiply(o.den));
        }

        /** @return {@code this - o} */
        public Element subtract(Element o) {
            return add(other(o).negate());
        }

        /** @return {@code -this} */
        public Element negate() {
            BigInteger[] r = new BigInteger[num.length];
            for (int j = 0; j < r.length; j++) {
                r[j] = num[j].negate();
            }
            return new Element(field, r, den);
        }

        /** @return {@code this * o} */
        public Element multiply(Element o) {
            other(o);
            int d = num.length;
            BigInteger[] p = ZPoly.multiply(num, o.num);
            Work.charge(Work.BIG * d * d);
            if (p.length == 0) {
                return field.zero;
            }
            if (field.integralTraces != null) { // monic integral f: reduce by f itself, small multipliers
                return field.make(field.reduceByF(p), den.multiply(o.den));
            }
            BigInteger[] r = new BigInteger[d];
            boolean scaled = !field.redDen.equals(BigInteger.ONE);
            for (int j = 0; j < d; j++) {
                BigInteger c = j < p.length ? p[j] : BigInteger.ZERO;
                r[j] = scaled ? c.multiply(field.redDen) : c;
            }
            for (int k = d; k < p.length; k++) {
                BigInteger t = p[k];
                if (t.signum() == 0) {
                    continue;
                }
                BigInteger[] row = field.red[k - d];
                for (int j = 0; j < d; j++) {
                    if (row[j].signum() != 0) {
                        r[j] = r[j].add(t.multiply(row[j]));
                    }
                }
            }
            BigInteger nd = den.multiply(o.den);
            if (scaled) {
                nd = nd.multiply(field.redDen);
            }
            return field.make(r, nd);
        }

        /**
         * @return {@code 1/this}: the solution {@code y} of {@code M y = e_0}, where {@code M} is the
         *     matrix of multiplication by this element on the power basis (cleared of denominators),
         *     by fraction-free Gaussian elimination (Bareiss, Math. Comp. 22 (1968); Cohen, GTM 138, §2.2) and
         *     exact back substitution of {@code det(M) y}
         * @throws ArithmeticException if the norm is zero (this is zero, or {@code f} is reducible)
         */
        public Element inverse() {
            if (isZero()) {
                throw new ArithmeticException("inverse of zero in " + field.name());
            }
            int d = num.length;
            if (d == 1) {
                return field.fromRational(Rational.of(num[0], den).inverse());
            }
            Work.charge(Work.BIG * d * d * d);
            // integer matrix N = L * M, column j = coordinates of (num as element) * x^j scaled
            Rational[] lower = new Rational[d];
            for (int j = 0; j < d; j++) {
                lower[j] = Rational.of(field.fNum[j], field.fDen);
            }
            Rational[][] cols = new Rational[d][];
            Rational[] col = new Rational[d];
            for (int i = 0; i < d; i++) {
                col[i] = Rational.of(num[i]);
            }
            BigInteger l = BigInteger.ONE;
            for (int j = 0; j < d; j++) {
                cols[j] = col;
                for (Rational r : col) {
                    if (!r.isInteger()) {
                        l = l.divide(l.gcd(r.den())).multiply(r.den());
                    }
                }
                if (j + 1 < d) {
                    col = timesX(col, lower);
                }
            }
            // augmented [N | l * den * e_0]: (num/den) y = 1  <=>  (N/l) y = den e_0
            BigInteger[][] m = new BigInteger[d][d + 1];
            for (int i = 0; i < d; i++) {
                for (int j = 0; j < d; j++) {
                    Rational r = cols[j][i];
                    m[i][j] = r.isInteger() ? r.num().multiply(l) : r.num().multiply(l.divide(r.den()));
                }
                m[i][d] = i == 0 ? l.multiply(den) : BigInteger.ZERO;
            }
            BigInteger prev = BigInteger.ONE;
            for (int k = 0; k < d; k++) {
                int piv = k;
                while (piv < d && m[piv][k].signum() == 0) {
                    piv++;
                }
                if (piv == d) {
                    throw new ArithmeticException(
                            "element " + this + " has norm 0 in " + field.name() + ": the defining polynomial is reducible");
                }
                if (piv != k) {
                    BigInteger[] t = m[piv];
                    m[piv] = m[k];
                    m[k] = t;
                }
                for (int i = k + 1; i < d; i++) {
                    for (int j = k + 1; j <= d; j++) {
                        m[i][j] = m[k][k].multiply(m[i][j]).subtract(m[i][k].multiply(m[k][j])).divide(prev);
                    }
                    m[i][k] = BigInteger.ZERO;
                }
                prev = m[k][k];
            }
            // prev = ±det N; y_i = det * solution_i are integers (Cramer); back substitution is exact
            BigInteger det = prev;
            BigInteger[] y = new BigInteger[d];
            for (int i = d - 1; i >= 0; i--) {
                BigInteger acc = det.multiply(m[i][d]);
                for (int j = i + 1; j < d; j++) {
                    acc = acc.subtract(m[i][j].multiply(y[j]));
                }
                y[i] = acc.divide(m[i][i]);
            }
            return field.make(y, det);
        }

        /** @return {@code q * this} */
        public Element scale(Rational q) {
            BigInteger[] r = new BigInteger[num.length];
            for (int j = 0; j < r.length; j++) {
                r[j] = num[j].multiply(q.num());
            }
            return field.make(r, den.multiply(q.den()));
        }

        /**
         * @return {@code this^e}; negative {@code e} means a power of the inverse
         * @throws ArithmeticException for a negative power of a non-invertible element
         */
        public Element pow(int e) {
            if (e < 0) {
                return inverse().pow(-(long) e);
            }
            return pow((long) e);
        }

        private Element pow(long e) {
            return Powers.power(this, e, field.one, Element::multiply);
        }

        /** @return the trace {@code Tr_{K/Q}}: the trace of multiplication by this element */
        public Rational trace() {
            BigInteger acc = BigInteger.ZERO;
            Rational sum = Rational.ZERO;
            for (int j = 0; j < num.length; j++) {
                if (num[j].signum() == 0) {
                    continue;
                }
                Rational t = field.traceOfPower[j];
                if (t.isInteger()) {
                    acc = acc.add(num[j].multiply(t.num()));
                } else {
                    sum = sum.add(Rational.of(num[j]).multiply(t));
                }
            }
            return sum.add(Rational.of(acc)).divide(Rational.of(den));
        }

        /** @return the norm {@code N_{K/Q}}: the determinant of multiplication by this element */
        public Rational norm() {
            Rational c0 = charPoly().coefficient(0);
            return num.length % 2 == 0 ? c0 : c0.negate();
        }

        /**
         * @return the characteristic polynomial of multiplication by this element on {@code K}
         *     (monic, of degree {@code d}). Computed from the power sums {@code p_k = Tr(a^k)}, {@code
         *     1 <= k <= d}, by Newton's identities {@code k e_k = sum_{i=1}^{k} (-1)^(i-1) e_{k-i}
         *     p_i} (Newton's identities, valid in characteristic 0): {@code d - 1}
         *     multiplications in {@code K} and {@code O(d^2)} rational operations.
         */
        public QPoly charPoly() {
            QPoly cp = charPoly;
            if (cp == null) {
                cp = newtonCharPoly();
                charPoly = cp;
            }
            return cp;
        }

        private QPoly newtonCharPoly() {
            if (field.fDen.equals(BigInteger.ONE) && den.equals(BigInteger.ONE) && num.length > 1) {
                return integralNewtonCharPoly();
            }
            int d = num.length;
            Rational[] ps = new Rational[d + 1];
            if (field.integralTraces != null && d > 1) {
                powerSumsKeepingTheDenominator(ps);
            } else {
                Element power = this;
                for (int k = 1; k <= d; k++) {
                    ps[k] = power.trace();
                    if (k < d) {
                        power = power.multiply(this);
                    }
                }
            }
            Rational[] e = new Rational[d + 1];
            e[0] = Rational.ONE;
            for (int k = 1; k <= d; k++) {
                Rational acc = Rational.ZERO;
                for (int i = 1; i <= k; i++) {
                    Rational t = e[k - i].multiply(ps[i]);
                    acc = (i % 2 == 1) ? acc.add(t) : acc.subtract(t);
                }
                e[k] = acc.divide(Rational.of(k));
            }
            // charpoly = sum_k (-1)^k e_k X^(d-k)
            Rational[] c = new Rational[d + 1];
            for (int k = 0; k <= d; k++) {
                c[d - k] = k % 2 == 0 ? e[k] : e[k].negate();
            }
            return QPoly.of(c);
        }

        /**
         * ps[k] = Tr(a^k), 1 ≤ k ≤ d, for f monic integral, with a^k kept as N_k / D and no gcd per product: the
         * product N_k · num is divided exactly by den when den divides every coordinate (then a^(k+1) = N_(k+1) / D
         * with the same D — the usual case, since the denominators of the powers of an algebraic integer are bounded)
         * and normalised by a gcd only when it does not.
         */
        private void powerSumsKeepingTheDenominator(Rational[] ps) {
            int d = num.length;
            BigInteger[] s = field.hankelTraces();
            int h = (d + 1) / 2;
            BigInteger[][] pn = new BigInteger[h + 1][];
            BigInteger[] pd = new BigInteger[h + 1];
            pn[1] = num;
            pd[1] = den;
            for (int k = 1; k < h; k++) {
                BigInteger[] r = field.multiplyIntegral(pn[k], num); // a^(k+1) = r / (pd · den)
                BigInteger[] q = den.equals(BigInteger.ONE) ? r : exactQuotients(r, den);
                if (q != null) {
                    pn[k + 1] = q;
                    pd[k + 1] = pd[k];
                } else {
                    Element reduced = field.make(r, pd[k].multiply(den));
                    pn[k + 1] = reduced.num;
                    pd[k + 1] = reduced.den;
                }
            }
            // Tr(a^i a^j) = u_i^T H u_j / (pd_i pd_j) with the Hankel matrix H = (Tr(x^(r+c)))
            BigInteger[][] w = new BigInteger[h + 1][];
            for (int k = 1; k <= d; k++) {
                int i = k / 2;
                int j = k - i;
                if (w[j] == null) {
                    w[j] = new BigInteger[d];
                    for (int r = 0; r < d; r++) {
                        BigInteger acc = BigInteger.ZERO;
                        for (int c = 0; c < d; c++) {
                            if (pn[j][c].signum() != 0 && s[r + c].signum() != 0) {
                                acc = acc.add(pn[j][c].multiply(s[r + c]));
                            }
                        }
                        w[j][r] = acc;
                    }
                }
                BigInteger acc = BigInteger.ZERO;
                if (i == 0) {
                    acc = w[j][0]; // Tr(a^j) = e_0^T H u_j
                    ps[k] = Rational.of(acc, pd[j]);
                    continue;
                }
                for (int r = 0; r < d; r++) {
                    if (pn[i][r].signum() != 0) {
                        acc = acc.add(pn[i][r].multiply(w[j][r]));
                    }
                }
                ps[k] = Rational.of(acc, pd[i].multiply(pd[j]));
            }
        }

        /** r / m coordinate-wise when m divides every coordinate, else null. */
        private static BigInteger[] exactQuotients(BigInteger[] r, BigInteger m) {
            BigInteger[] q = new BigInteger[r.length];
            for (int j = 0; j < r.length; j++) {
                if (r[j].signum() == 0) {
                    q[j] = BigInteger.ZERO;
                    continue;
                }
                BigInteger[] qr = r[j].divideAndRemainder(m);
                if (qr[1].signum() != 0) {
                    return null;
                }
                q[j] = qr[0];
            }
            return q;
        }

        /**
         * Newton's identities over Z when f is monic integral: A = den·a has integer coordinates, so the power sums
         * P_k = Tr(A^k) and the coefficients E_k of χ_A are integers, computed with no gcd at all (k E_k = Σ_{i=1}^{k}
         * (−1)^(i−1) E_{k−i} P_i divides exactly); χ_a(X) = den^(−d) χ_A(den X) is formed once at the end.
         */
        private QPoly integralNewtonCharPoly() {
            int d = num.length;
            BigInteger[] s = field.integralTraces;
            BigInteger[] p = new BigInteger[d + 1];
            BigInteger[] power = num;
            for (int k = 1; k <= d; k++) {
                BigInteger acc = BigInteger.ZERO;
                for (int j = 0; j < d; j++) {
                    if (power[j].signum() != 0 && s[j].signum() != 0) {
                        acc = acc.add(power[j].multiply(s[j]));
                    }
                }
                p[k] = acc;
                if (k < d) {
                    power = field.multiplyIntegral(power, num);
                }
            }
            BigInteger[] e = new BigInteger[d + 1];
            e[0] = BigInteger.ONE;
            for (int k = 1; k <= d; k++) {
                BigInteger acc = BigInteger.ZERO;
                for (int i = 1; i <= k; i++) {
                    BigInteger t = e[k - i].multiply(p[i]);
                    acc = (i % 2 == 1) ? acc.add(t) : acc.subtract(t);
                }
                e[k] = acc.divide(BigInteger.valueOf(k));
            }
            Rational[] c = new Rational[d + 1];
            BigInteger denPow = BigInteger.ONE;
            for (int k = 0; k <= d; k++) {
                BigInteger ek = k % 2 == 0 ? e[k] : e[k].negate();
                c[d - k] = den.equals(BigInteger.ONE) ? Rational.of(ek) : Rational.of(ek, denPow);
                denPow = denPow.multiply(den);
            }
            return QPoly.of(c);
        }

        /**
         * @return the minimal polynomial over Q: the squarefree part of the characteristic
         *     polynomial, made monic. Correct when {@code f} is irreducible (then the characteristic
         *     polynomial is a power of the minimal polynomial).
         */
        public QPoly minPoly() {
            return charPoly().squarefreePart().monic();
        }

        /** @return whether this element lies in Q (all coordinates beyond the first are zero) */
        public boolean isRational() {
            for (int j = 1; j < num.length; j++) {
                if (num[j].signum() != 0) {
                    return false;
                }
            }
            return true;
        }

        /**
         * @return whether the characteristic polynomial has integer coefficients (equivalently, for
         *     a number field, whether this element is an algebraic integer)
         */
        public boolean isAlgebraicInteger() {
            if (den.equals(BigInteger.ONE) && field.fDen.equals(BigInteger.ONE)) {
                return true;
            }
            return charPoly().hasIntegerCoefficients();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Element e && field.equals(e.field) && den.equals(e.den) && Arrays.equals(num, e.num);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(num) + den.hashCode();
        }

        /** @return the representative as a polynomial in {@code x}, e.g. {@code "1/2*x + 1/2"} */
        @Override
        public String toString() {
            return asPolynomial().toString();
        }
    }

    private Element makeIntegral(BigInteger[] n) {
        return make(n, BigInteger.ONE);
    }
}
