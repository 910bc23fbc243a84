package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

/**
 * The finite field {@code F_q = F_p[x]/(g)}, {@code q = p^f}, for a monic irreducible {@code g} of
 * degree {@code f} over F_p (so {@code f = 1} gives the prime field F_p itself).
 *
 * <p>Elements are residues modulo {@code g} (polynomials of degree {@code < f}); two fields are equal
 * when they have the same modulus {@code g}.
 */
public final class FiniteField extends ElementField<FiniteField.Element> {
    private final FpPoly g;
    private final long p;
    private final int f;
    private final BigInteger order;
    private final Element zero;
    private final Element one;

    private FiniteField(FpPoly g) {
        this.g = g;
        this.p = g.modulus();
        this.f = g.degree();
        this.order = BigInteger.valueOf(p).pow(f);
        this.zero = new Element(this, FpPoly.zero(p));
        this.one = new Element(this, FpPoly.one(p));
    }

    /**
     * @param g a monic irreducible polynomial over F_p
     * @return {@code F_p[x]/(g)}
     * @throws IllegalArgumentException if {@code g} is not monic or not irreducible
     */
    public static FiniteField of(FpPoly g) {
        if (!g.isMonic() || !g.isIrreducible()) {
            throw new IllegalArgumentException("modulus must be monic irreducible over F_" + g.modulus() + ": " + g);
        }
        return new FiniteField(g);
    }

    /** @return the prime field F_p, as {@code F_p[x]/(x)} */
    public static FiniteField primeField(long p) {
        return new FiniteField(FpPoly.x(p));
    }

    /** @return the characteristic {@code p} */
    public long prime() {
        return p;
    }

    /** @return the degree {@code f} over F_p */
    public int degree() {
        return f;
    }

    /** @return the number of elements {@code q = p^f} */
    public BigInteger order() {
        return order;
    }

    /** @return the modulus {@code g} */
    public FpPoly modulus() {
        return g;
    }

    /** @return the image of the integer {@code n} */
    public Element fromLong(long n) {
        return new Element(this, FpPoly.wrap(p, new long[] {Math.floorMod(n, p)}));
    }

    /**
     * @return the class of {@code h} modulo {@code g}
     * @throws IllegalArgumentException if {@code h} is over a different prime field
     */
    public Element element(FpPoly h) {
        if (h.modulus() != p) {
            throw new IllegalArgumentException("polynomial over F_" + h.modulus() + " used in " + name());
        }
        return new Element(this, h.mod(g));
    }

    /** @return the class of {@code x} */
    public Element generator() {
        return element(FpPoly.x(p));
    }

    /** @return {@code h(at)} for {@code h} with coefficients in F_p (Horner's rule) */
    public Element evaluate(FpPoly h, Element at) {
        own(at);
        if (h.modulus() != p) {
            throw new IllegalArgumentException("polynomial over F_" + h.modulus() + " evaluated in " + name());
        }
        Element acc = zero;
        for (int k = h.degree(); k >= 0; k--) {
            acc = acc.multiply(at).add(fromLong(h.coefficient(k)));
        }
        return acc;
    }

    /**
     * The distinct roots in this field of a nonzero polynomial {@code h} with coefficients in F_p.
     * {@code h} is factored over F_p; each irreducible factor of degree {@code e} dividing {@code f}
     * has {@code e} roots, found by splitting it into linear factors over F_q with the
     * Cantor–Zassenhaus method (von zur Gathen–Gerhard, Alg. 14.8, and a trace map in
     * characteristic 2). Used to list the embeddings {@code F_p[x]/(u) -> F_q} of one residue field
     * into another.
     *
     * @return the roots, sorted by their representatives (degree, then coefficients from the top)
     * @throws IllegalArgumentException if {@code h} is zero or over a different prime
     */
    public List<Element> roots(FpPoly h) {
        if (h.modulus() != p) {
            throw new IllegalArgumentException("polynomial over F_" + h.modulus() + " used in " + name());
        }
        if (h.isZero()) {
            throw new IllegalArgumentException("every element is a root of the zero polynomial");
        }
        List<Element> out = new ArrayList<>();
        Random rnd = new Random(0xf1e1dL ^ p ^ ((long) f << 40));
        for (FpPoly.Factor fac : h.factor()) {
            FpPoly u = fac.factor();
            int e = u.degree();
            if (f % e != 0) {
                continue;
            }
            Element[] poly = new Element[e + 1];
            for (int k = 0; k <= e; k++) {
                poly[k] = fromLong(u.coefficient(k));
            }
            for (Element[] lin : splitLinear(poly, rnd)) {
                // monic linear y + c: root -c
                out.add(lin[0].negate());
            }
        }
        out.sort(Comparator.comparing(a -> a.value));
        return out;
    }

    /** Splits a monic polynomial over F_q with distinct roots in F_q into monic linear factors. */
    private List<Element[]> splitLinear(Element[] u, Random rnd) {
        List<Element[]> out = new ArrayList<>();
        List<Element[]> todo = new ArrayList<>();
        todo.add(u);
        BigInteger half = order.subtract(BigInteger.ONE).shiftRight(1);
        while (!todo.isEmpty()) {
            Element[] w = todo.remove(todo.size() - 1);
            int n = w.length - 1;
            if (n == 1) {
                out.add(w);
                continue;
            }
            Element[] split;
            while (true) {
                Element delta = randomElement(rnd);
                Element[] t;
                if (p == 2) {
                    // absolute trace of delta*y: sum_{i<f} (delta y)^(2^i) mod w
                    Element[] a = new Element[] {zero, delta};
                    t = a;
                    Element[] pw = a;
                    for (int i = 1; i < f; i++) {
                        pw = polyMod(polyMul(pw, pw), w);
                        t = polyAdd(t, pw);
                    }
                } else {
                    Element[] a = new Element[] {delta, one};
                    t = polyAdd(polyPowMod(a, half, w), new Element[] {one.negate()});
                }
                Element[] d = polyGcd(t, w);
                if (d.length - 1 > 0 && d.length - 1 < n) {
                    split = d;
                    break;
                }
            }
            todo.add(split);
            todo.add(polyDiv(w, split));
        }
        return out;
    }

    private Element randomElement(Random rnd) {
        long[] a = new long[f];
        for (int k = 0; k < f; k++) {
            a[k] = Math.floorMod(rnd.nextLong(), p);
        }
        return new Element(this, FpPoly.wrap(p, a));
    }

    // --- dense polynomials over this field, Element[] low to high, no trailing zeros ---

    private Element[] trim(Element[] a) {
        int n = a.length;
        while (n > 0 && a[n - 1].isZero()) {
            n--;
        }
        return n == a.length ? a : Arrays.copyOf(a, n);
    }

    private Element[] polyAdd(Element[] a, Element[] b) {
        int n = Math.max(a.length, b.length);
        Element[] r = new Element[n];
        for (int k = 0; k < n; k++) {
            Element x = k < a.length ? a[k] : zero;
            Element y = k < b.length ? b[k] : zero;
            r[k] = x.add(y);
        }
        return trim(r);
    }

    private Element[] polyMul(Element[] a, Element[] b) {
        if (a.length == 0 || b.length == 0) {
            return new Element[0];
        }
        Element[] r = new Element[a.length + b.length - 1];
        Arrays.fill(r, zero);
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                r[i + j] = r[i + j].add(a[i].multiply(b[j]));
            }
        }
        return trim(r);
    }

    /** @return {@code {quotient, remainder}} */
    private Element[][] polyDivRem(Element[] a, Element[] b) {
        int db = b.length - 1;
        if (a.length - 1 < db) {
            return new Element[][] {new Element[0], a};
        }
        Element[] r = a.clone();
        Element[] q = new Element[a.length - db];
        Element inv = b[db].inverse();
        for (int k = a.length - 1; k >= db; k--) {
            Element t = r[k].multiply(inv);
            q[k - db] = t;
            if (!t.isZero()) {
                for (int j = 0; j <= db; j++) {
                    r[k - db + j] = r[k - db + j].subtract(t.multiply(b[j]));
                }
            }
        }
        return new Element[][] {trim(q), trim(Arrays.copyOf(r, db))};
    }

    private Element[] polyMod(Element[] a, Element[] b) {
        return polyDivRem(a, b)[1];
    }

    private Element[] polyDiv(Element[] a, Element[] b) {
        return polyDivRem(a, b)[0];
    }

    private Element[] polyGcd(Element[] a, Element[] b) {
        while (b.length > 0) {
            Element[] r = polyMod(a, b);
            a = b;
            b = r;
        }
        if (a.length == 0) {
            return a;
        }
        Element inv = a[a.length - 1].inverse();
        Element[] m = new Element[a.length];
        for (int k = 0; k < a.length; k++) {
            m[k] = a[k].multiply(inv);
        }
        return m;
    }

    private Element[] polyPowMod(Element[] a, BigInteger e, Element[] m) {
        Element[] result = polyMod(new Element[] {one}, m);
        Element[] base = polyMod(a, m);
        for (int bit = e.bitLength() - 1; bit >= 0; bit--) {
            result = polyMod(polyMul(result, result), m);
            if (e.testBit(bit)) {
                result = polyMod(polyMul(result, base), m);
            }
        }
        return result;
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
        return fromLong(n.mod(BigInteger.valueOf(p)).longValue());
    }

    /** @return {@code "F_7"} for a prime field given by a linear modulus, else {@code "F_5[x]/(x^2 + 2)"} */
    @Override
    public String name() {
        return f == 1 ? "F_" + p : "F_" + p + "[x]/(" + g + ")";
    }

    @Override
    public String toString() {
        return name();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FiniteField k && k.g.equals(g);
    }

    @Override
    public int hashCode() {
        return g.hashCode();
    }

    /** An element of {@link FiniteField}: a residue class modulo {@code g}. Immutable. */
    public static final class Element implements ElementField.Arithmetic<Element> {
        private final FiniteField field;
        private final FpPoly value;

        private Element(FiniteField field, FpPoly value) {
            this.field = field;
            this.value = value;
        }

        /** @return the field */
        public FiniteField field() {
            return field;
        }

        /** @return the representative of degree {@code < f} */
        public FpPoly value() {
            return value;
        }

        /** @return whether this is zero */
        public boolean isZero() {
            return value.isZero();
        }

        private Element other(Element o) {
            return field.own(o);
        }

        /** @return {@code this + o} */
        public Element add(Element o) {
            return new Element(field, value.add(other(o).value));
        }

        /** @return {@code this - o} */
        public Element subtract(Element o) {
            return new Element(field, value.subtract(other(o).value));
        }

        /** @return {@code -this} */
        public Element negate() {
            return new Element(field, value.negate());
        }

        /** @return {@code this * o} */
        public Element multiply(Element o) {
            return new Element(field, value.multiply(other(o).value).mod(field.g));
        }

        /**
         * @return {@code 1/this} (extended Euclid modulo {@code g})
         * @throws ArithmeticException if this is zero
         */
        public Element inverse() {
            if (isZero()) {
                throw new ArithmeticException("inverse of zero in " + field.name());
            }
            FpPoly[] egs = value.extendedGcd(field.g);
            return new Element(field, egs[1].mod(field.g));
        }

        /**
         * @return {@code this^e}; a negative {@code e} means a power of the inverse, and {@code 0^0 = 1}
         * @throws ArithmeticException for a negative power of zero
         */
        public Element pow(BigInteger e) {
            if (e.signum() < 0) {
                return inverse().pow(e.negate());
            }
            if (isZero()) {
                return e.signum() == 0 ? field.one : this;
            }
            // x^(q-1) = 1 for x != 0
            BigInteger r = e.mod(field.order.subtract(BigInteger.ONE));
            return new Element(field, value.powMod(r, field.g));
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Element e && e.field.equals(field) && e.value.equals(value);
        }

        @Override
        public int hashCode() {
            return value.hashCode();
        }

        /** @return the representative in {@code x} notation, e.g. {@code "3*x + 1"}, or {@code "4"} */
        @Override
        public String toString() {
            return value.toString();
        }
    }
}
