package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

/**
 * An immutable polynomial over the prime field F_p, {@code p} a prime below 2^31, with coefficients
 * stored as {@code long} values in {@code [0, p)}, lowest degree first, without leading zeros.
 *
 * <p>Factorisation follows von zur Gathen–Gerhard, <i>Modern Computer Algebra</i> (3rd ed.),
 * chapter 14: squarefree factorisation, distinct-degree factorisation (Alg. 14.3) and
 * Cantor–Zassenhaus equal-degree splitting (Alg. 14.8; in characteristic 2 the quadratic character
 * is replaced by the trace map {@code a + a^2 + ... + a^(2^(d-1))}, as in the same chapter). The random choices use a fixed seed, so results (which are sorted anyway) do not
 * vary between runs.
 */
public final class FpPoly implements Comparable<FpPoly> {
    private static final long[] NONE = new long[0];

    private final long p;
    private final long[] c;

    private FpPoly(long p, long[] c) {
        this.p = p;
        this.c = c;
    }

    /** Trims leading zeros; coefficients must already be in [0, p). */
    static FpPoly wrap(long p, long[] c) {
        int n = c.length;
        while (n > 0 && c[n - 1] == 0) {
            n--;
        }
        return new FpPoly(p, n == c.length ? c : Arrays.copyOf(c, n));
    }

    /** Moduli already found prime; bounded so that a long-running process cannot grow it without limit. */
    private static final java.util.Set<Long> KNOWN_PRIMES = java.util.concurrent.ConcurrentHashMap.newKeySet();

    static void checkPrime(long p) {
        if (KNOWN_PRIMES.contains(p)) {
            return;
        }
        if (p < 2 || p >= (1L << 31) || !BigInteger.valueOf(p).isProbablePrime(64)) {
            throw new IllegalArgumentException("modulus must be a prime below 2^31: " + p);
        }
        if (KNOWN_PRIMES.size() < 4096) {
            KNOWN_PRIMES.add(p);
        }
    }

    /**
     * @return the polynomial with the given coefficients (any longs, reduced mod p), lowest first
     * @throws IllegalArgumentException if {@code p} is not a prime below 2^31
     */
    public static FpPoly of(long p, long... coeffsLowToHigh) {
        checkPrime(p);
        long[] r = new long[coeffsLowToHigh.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = Math.floorMod(coeffsLowToHigh[k], p);
        }
        return wrap(p, r);
    }

    /**
     * @return the reduction of {@code f} modulo {@code p}
     * @throws ArithmeticException if a denominator of {@code f} is divisible by {@code p}
     */
    public static FpPoly fromQPoly(QPoly f, long p) {
        checkPrime(p);
        Rational[] q = f.coeffArray();
        long[] r = new long[q.length];
        for (int k = 0; k < r.length; k++) {
            r[k] = reduce(q[k], p);
        }
        return wrap(p, r);
    }

    /**
     * @return {@code q mod p} in {@code [0, p)}
     * @throws ArithmeticException if {@code p} divides the denominator of {@code q}
     */
    static long reduce(Rational q, long p) {
        BigInteger bp = BigInteger.valueOf(p);
        long n = q.num().mod(bp).longValue();
        if (q.isInteger()) {
            return n;
        }
        long d = q.den().mod(bp).longValue();
        if (d == 0) {
            throw new ArithmeticException("denominator of " + q + " is divisible by " + p);
        }
        return mulMod(n, invMod(d, p), p);
    }

    /**
     * Parses the notation of {@link QPoly#parse(String)}; coefficients are reduced modulo {@code p}
     * (a fraction {@code a/b} is read as {@code a * b^-1}).
     *
     * @throws ExpressionSyntaxException on malformed text
     * @throws ArithmeticException if a denominator is divisible by {@code p}
     */
    public static FpPoly parse(String text, long p) {
        return fromQPoly(QPoly.parse(text), p);
    }

    /** @return the zero polynomial over F_p */
    public static FpPoly zero(long p) {
        checkPrime(p);
        return new FpPoly(p, NONE);
    }

    /** @return the constant 1 over F_p */
    public static FpPoly one(long p) {
        return of(p, 1);
    }

    /** @return {@code x} over F_p */
    public static FpPoly x(long p) {
        return of(p, 0, 1);
    }

    static long mulMod(long a, long b, long p) {
        return (a * b) % p;
    }

    /** @return {@code a^-1 mod p} for {@code a} not divisible by the prime {@code p} */
    static long invMod(long a, long p) {
        long t = 0;
        long newT = 1;
        long r = p;
        long newR = Math.floorMod(a, p);
        if (newR == 0) {
            throw new ArithmeticException("0 has no inverse modulo " + p);
        }
        while (newR != 0) {
            long qq = r / newR;
            long tmp = t - qq * newT;
            t = newT;
            newT = tmp;
            tmp = r - qq * newR;
            r = newR;
            newR = tmp;
        }
        return Math.floorMod(t, p);
    }

    static long powMod(long a, long e, long p) {
        long result = 1 % p;
        long base = Math.floorMod(a, p);
        while (e > 0) {
            if ((e & 1) != 0) {
                result = mulMod(result, base, p);
            }
            base = mulMod(base, base, p);
            e >>= 1;
        }
        return result;
    }

    /** @return the prime {@code p} */
    public long modulus() {
        return p;
    }

    /** @return the degree, -1 for zero */
    public int degree() {
        return c.length - 1;
    }

    /** @return the coefficient of {@code x^i} in {@code [0, p)} (0 beyond the degree) */
    public long coefficient(int i) {
        if (i < 0) {
            throw new IndexOutOfBoundsException("negative index " + i);
        }
        return i < c.length ? c[i] : 0;
    }

    /** @return the coefficients, lowest degree first (a copy) */
    public long[] coefficients() {
        return c.clone();
    }

    long[] raw() {
        return c;
    }

    /** @return the leading coefficient (0 for zero) */
    public long leadingCoefficient() {
        return c.length == 0 ? 0 : c[c.length - 1];
    }

    /** @return whether this is zero */
    public boolean isZero() {
        return c.length == 0;
    }

    /** @return whether the leading coefficient is 1 */
    public boolean isMonic() {
        return c.length > 0 && c[c.length - 1] == 1;
    }

    private void same(FpPoly o) {
        if (o.p != p) {
            throw new IllegalArgumentException("polynomials over F_" + p + " and F_" + o.p + " mixed");
        }
    }

    /** @return {@code this + o} */
    public FpPoly add(FpPoly o) {
        same(o);
        int n = Math.max(c.length, o.c.length);
        long[] r = new long[n];
        for (int k = 0; k < n; k++) {
            long s = coefficient(k) + o.coefficient(k);
            r[k] = s >= p ? s - p : s;
        }
        return wrap(p, r);
    }

    /** @return {@code this - o} */
    public FpPoly subtract(FpPoly o) {
        same(o);
        int n = Math.max(c.length, o.c.length);
        long[] r = new long[n];
        for (int k = 0; k < n; k++) {
            long s = coefficient(k) - o.coefficient(k);
            r[k] = s < 0 ? s + p : s;
        }
        return wrap(p, r);
    }

    /** @return {@code -this} */
    public FpPoly negate() {
        long[] r = new long[c.length];
        for (int k = 0; k < c.length; k++) {
            r[k] = c[k] == 0 ? 0 : p - c[k];
        }
        return new FpPoly(p, r);
    }

    /** @return {@code this * o} */
    public FpPoly multiply(FpPoly o) {
        same(o);
        if (c.length == 0 || o.c.length == 0) {
            return new FpPoly(p, NONE);
        }
        long[] r = new long[c.length + o.c.length - 1];
        Work.charge((long) c.length * o.c.length);
        for (int i = 0; i < c.length; i++) {
            long a = c[i];
            if (a == 0) {
                continue;
            }
            for (int j = 0; j < o.c.length; j++) {
                r[i + j] = (r[i + j] + a * o.c[j]) % p;
            }
        }
        return wrap(p, r);
    }

    /** @return {@code s * this} */
    public FpPoly scale(long s) {
        long t = Math.floorMod(s, p);
        if (t == 0) {
            return new FpPoly(p, NONE);
        }
        long[] r = new long[c.length];
        for (int k = 0; k < c.length; k++) {
            r[k] = mulMod(c[k], t, p);
        }
        return new FpPoly(p, r);
    }

    /**
     * @return {@code this^e}
     * @throws IllegalArgumentException if {@code e < 0}
     */
    public FpPoly pow(int e) {
        return Powers.power(this, e, one(p), FpPoly::multiply);
    }

    /** @return this divided by its leading coefficient (zero stays zero) */
    public FpPoly monic() {
        return c.length == 0 || isMonic() ? this : scale(invMod(leadingCoefficient(), p));
    }

    /**
     * @return {@code {q, r}} with {@code this = q d + r}, {@code deg r < deg d}
     * @throws ArithmeticException if {@code d} is zero
     */
    public FpPoly[] divRem(FpPoly d) {
        same(d);
        if (d.c.length == 0) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        int dd = d.degree();
        if (degree() < dd) {
            return new FpPoly[] {new FpPoly(p, NONE), this};
        }
        long[] r = c.clone();
        long[] q = new long[degree() - dd + 1];
        Work.charge((long) (degree() - dd + 1) * (dd + 1));
        long inv = invMod(d.leadingCoefficient(), p);
        for (int k = degree(); k >= dd; k--) {
            long t = mulMod(r[k], inv, p);
            q[k - dd] = t;
            if (t != 0) {
                long nt = p - t;
                for (int j = 0; j <= dd; j++) {
                    r[k - dd + j] = (r[k - dd + j] + nt * d.c[j]) % p;
                }
            }
        }
        return new FpPoly[] {wrap(p, q), wrap(p, Arrays.copyOf(r, dd))};
    }

    /** @return {@code this mod d} */
    public FpPoly mod(FpPoly d) {
        same(d);
        if (degree() < d.degree() && d.c.length > 0) {
            return this;
        }
        return divRem(d)[1];
    }

    /** @return the monic gcd; {@code gcd(0, 0) = 0} */
    public FpPoly gcd(FpPoly o) {
        same(o);
        FpPoly a = this;
        FpPoly b = o;
        while (!b.isZero()) {
            FpPoly r = a.mod(b);
            a = b;
            b = r;
        }
        return a.monic();
    }

    /**
     * Extended Euclid.
     *
     * @return {@code {g, s, t}} with {@code g = s*this + t*o} the monic gcd (zero if both are zero)
     */
    public FpPoly[] extendedGcd(FpPoly o) {
        same(o);
        FpPoly r0 = this;
        FpPoly r1 = o;
        FpPoly s0 = one(p);
        FpPoly s1 = new FpPoly(p, NONE);
        FpPoly t0 = new FpPoly(p, NONE);
        FpPoly t1 = one(p);
        while (!r1.isZero()) {
            FpPoly[] qr = r0.divRem(r1);
            FpPoly r2 = qr[1];
            FpPoly s2 = s0.subtract(qr[0].multiply(s1));
            FpPoly t2 = t0.subtract(qr[0].multiply(t1));
            r0 = r1;
            r1 = r2;
            s0 = s1;
            s1 = s2;
            t0 = t1;
            t1 = t2;
        }
        if (r0.isZero()) {
            return new FpPoly[] {r0, s0, t0};
        }
        long inv = invMod(r0.leadingCoefficient(), p);
        return new FpPoly[] {r0.scale(inv), s0.scale(inv), t0.scale(inv)};
    }

    /** @return the formal derivative */
    public FpPoly derivative() {
        if (c.length <= 1) {
            return new FpPoly(p, NONE);
        }
        long[] r = new long[c.length - 1];
        for (int k = 1; k < c.length; k++) {
            r[k - 1] = mulMod(c[k], k % p, p);
        }
        return wrap(p, r);
    }

    /** @return the value at {@code t} (reduced mod p), in {@code [0, p)} */
    public long evaluate(long t) {
        long tt = Math.floorMod(t, p);
        long acc = 0;
        for (int k = c.length - 1; k >= 0; k--) {
            acc = (acc * tt + c[k]) % p;
        }
        return acc;
    }

    /**
     * @return {@code this^e mod m}
     * @throws IllegalArgumentException if {@code e < 0}
     * @throws ArithmeticException if {@code m} is zero
     */
    public FpPoly powMod(BigInteger e, FpPoly m) {
        same(m);
        if (e.signum() < 0) {
            throw new IllegalArgumentException("negative exponent " + e);
        }
        if (m.isZero()) {
            throw new ArithmeticException("reduction modulo the zero polynomial");
        }
        FpPoly result = one(p).mod(m);
        FpPoly base = mod(m);
        for (int bit = e.bitLength() - 1; bit >= 0; bit--) {
            result = result.multiply(result).mod(m);
            if (e.testBit(bit)) {
                result = result.multiply(base).mod(m);
            }
        }
        return result;
    }

    /**
     * @return whether this polynomial is irreducible over F_p (of degree at least 1, and not a
     *     product of two polynomials of lower degree). Test: {@code gcd(x^(p^i) - x, f) = 1} for
     *     {@code 1 <= i <= deg f / 2} (Ben-Or's test; von zur Gathen–Gerhard, ch. 14).
     */
    public boolean isIrreducible() {
        int n = degree();
        if (n < 1) {
            return false;
        }
        if (n == 1) {
            return true;
        }
        FpPoly f = monic();
        FpPoly x = x(p);
        FpPoly h = x;
        BigInteger bp = BigInteger.valueOf(p);
        for (int i = 1; i <= n / 2; i++) {
            h = h.powMod(bp, f);
            if (h.subtract(x).gcd(f).degree() > 0) {
                return false;
            }
        }
        return true;
    }

    /** An irreducible monic factor with its multiplicity. */
    public record Factor(FpPoly factor, int multiplicity) {
        /** @return e.g. {@code "(x + 1)^2"} */
        @Override
        public String toString() {
            return "(" + factor + ")" + (multiplicity == 1 ? "" : "^" + multiplicity);
        }
    }

    /**
     * Factors {@code this / lc} into monic irreducibles over F_p.
     *
     * @return the distinct monic irreducible factors with multiplicities, sorted by {@link
     *     #compareTo(FpPoly)} (degree, then coefficients from the top down); empty for a nonzero
     *     constant
     * @throws ArithmeticException for the zero polynomial
     */
    public List<Factor> factor() {
        if (isZero()) {
            throw new ArithmeticException("cannot factor the zero polynomial");
        }
        List<Factor> out = new ArrayList<>();
        Random rnd = new Random(0x5eedL ^ p);
        for (Factor sq : squarefreeFactorization(monic())) {
            for (FpPoly[] dd : distinctDegree(sq.factor)) {
                int d = dd[1].degree();
                for (FpPoly g : equalDegree(dd[0], d, rnd)) {
                    out.add(new Factor(g, sq.multiplicity));
                }
            }
        }
        out.sort(Comparator.comparing(Factor::factor));
        return out;
    }

    /**
     * Squarefree decomposition of a monic polynomial in characteristic p (Cohen, GTM 138, §3.4.2:
     * Yun's method, with p-th roots taken when the derivative vanishes): returns pairs (squarefree, i) whose product of i-th
     * powers is {@code f}; the squarefree parts are pairwise coprime.
     */
    static List<Factor> squarefreeFactorization(FpPoly f) {
        List<Factor> out = new ArrayList<>();
        squarefree(f, 1, out);
        return out;
    }

    private static void squarefree(FpPoly f, int mult, List<Factor> out) {
        if (f.degree() < 1) {
            return;
        }
        long p = f.p;
        FpPoly g = f.derivative();
        if (g.isZero()) {
            squarefree(pthRoot(f), mult * (int) Math.min(p, Integer.MAX_VALUE), out);
            return;
        }
        FpPoly c = f.gcd(g);
        FpPoly w = f.divRem(c)[0];
        int i = 1;
        while (w.degree() > 0) {
            FpPoly y = w.gcd(c);
            FpPoly z = w.divRem(y)[0];
            if (z.degree() > 0) {
                out.add(new Factor(z.monic(), i * mult));
            }
            i++;
            w = y;
            c = c.divRem(y)[0];
        }
        if (c.degree() > 0) {
            squarefree(pthRoot(c), mult * (int) Math.min(p, Integer.MAX_VALUE), out);
        }
    }

    /** For {@code f = sum a_i x^(ip)} returns {@code sum a_i x^i} (Frobenius is the identity on F_p). */
    private static FpPoly pthRoot(FpPoly f) {
        long p = f.p;
        int n = (int) (f.degree() / p);
        long[] r = new long[n + 1];
        for (int k = 0; k <= n; k++) {
            r[k] = f.c[(int) (k * p)];
        }
        return wrap(p, r).monic();
    }

    /**
     * Distinct-degree factorisation of a monic squarefree polynomial (von zur Gathen–Gerhard, Alg.
     * 14.3). Each result is {@code {product of all irreducible factors of degree d, a polynomial of
     * degree d (x^d) as a tag}}.
     */
    private static List<FpPoly[]> distinctDegree(FpPoly f) {
        long p = f.p;
        List<FpPoly[]> out = new ArrayList<>();
        FpPoly x = x(p);
        FpPoly h = x;
        BigInteger bp = BigInteger.valueOf(p);
        int i = 0;
        while (f.degree() >= 2 * (i + 1)) {
            i++;
            h = h.powMod(bp, f);
            FpPoly g = h.subtract(x).gcd(f);
            if (g.degree() > 0) {
                out.add(new FpPoly[] {g, monomial(p, i)});
                f = f.divRem(g)[0];
                h = h.mod(f);
            }
        }
        if (f.degree() > 0) {
            out.add(new FpPoly[] {f, monomial(p, f.degree())});
        }
        return out;
    }

    private static FpPoly monomial(long p, int d) {
        long[] r = new long[d + 1];
        r[d] = 1;
        return new FpPoly(p, r);
    }

    /**
     * Cantor–Zassenhaus equal-degree splitting (von zur Gathen–Gerhard, Alg. 14.8; for p = 2 the
     * trace map {@code a + a^2 + ... + a^(2^(d-1))} replaces {@code a^((p^d - 1)/2)}).
     */
    private static List<FpPoly> equalDegree(FpPoly f, int d, Random rnd) {
        List<FpPoly> out = new ArrayList<>();
        List<FpPoly> todo = new ArrayList<>();
        todo.add(f);
        long p = f.p;
        BigInteger q = BigInteger.valueOf(p).pow(d);
        BigInteger half = q.subtract(BigInteger.ONE).shiftRight(1);
        while (!todo.isEmpty()) {
            FpPoly g = todo.remove(todo.size() - 1);
            if (g.degree() == d) {
                out.add(g);
                continue;
            }
            FpPoly split;
            while (true) {
                long[] a = new long[g.degree()];
                for (int k = 0; k < a.length; k++) {
                    a[k] = Math.floorMod(rnd.nextLong(), p);
                }
                FpPoly ap = wrap(p, a);
                if (ap.degree() < 1) {
                    continue;
                }
                FpPoly g1 = ap.gcd(g);
                if (g1.degree() > 0) {
                    split = g1;
                    break;
                }
                FpPoly b;
                if (p == 2) {
                    b = ap;
                    FpPoly t = ap;
                    for (int k = 1; k < d; k++) {
                        t = t.multiply(t).mod(g);
                        b = b.add(t);
                    }
                } else {
                    b = ap.powMod(half, g).subtract(one(p));
                }
                g1 = b.gcd(g);
                if (g1.degree() > 0 && g1.degree() < g.degree()) {
                    split = g1;
                    break;
                }
            }
            todo.add(split);
            todo.add(g.divRem(split)[0]);
        }
        return out;
    }

    /** Orders by modulus, then degree, then coefficients from the highest degree down. */
    @Override
    public int compareTo(FpPoly o) {
        if (p != o.p) {
            return Long.compare(p, o.p);
        }
        if (c.length != o.c.length) {
            return Integer.compare(c.length, o.c.length);
        }
        for (int k = c.length - 1; k >= 0; k--) {
            if (c[k] != o.c[k]) {
                return Long.compare(c[k], o.c[k]);
            }
        }
        return 0;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FpPoly f && f.p == p && Arrays.equals(c, f.c);
    }

    @Override
    public int hashCode() {
        return Long.hashCode(p) * 31 + Arrays.hashCode(c);
    }

    /** @return e.g. {@code "x^2 + 4*x + 1"}, coefficients in {@code [0, p)}; {@code "0"} for zero */
    @Override
    public String toString() {
        return QPoly.format(c.length, k -> c[k] == 0 ? 0 : 1, k -> Long.toString(c[k]), k -> c[k] == 1);
    }
}
