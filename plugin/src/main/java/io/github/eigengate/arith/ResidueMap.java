package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The reduction map {@code O_K -> O_K/𝔭 = F_p[x]/(g)} for a prime {@code 𝔭 = (p, g(x))} of {@code K
 * = Q[x]/(f)}, where {@code g} is a monic irreducible factor of {@code f} modulo {@code p}.
 *
 * <p>By the Dedekind–Kummer theorem (Cohen, GTM 138, Thm. 4.8.13) the primes above {@code p}
 * correspond to the distinct irreducible factors {@code g_i} of {@code f mod p}, with ramification
 * index the multiplicity of {@code g_i} and residue degree {@code deg g_i}, provided {@code p} does
 * not divide the index {@code [O_K : Z[x]]}. That proviso is checked with Dedekind's criterion
 * (Cohen, GTM 138, Thm. 6.1.4); when it fails, {@link IndexDivisibleException} is thrown. The
 * defining polynomial {@code f} must be {@code p}-integral (no {@code p} in a denominator).
 */
public final class ResidueMap {
    private final NumberField field;
    private final long p;
    private final FpPoly g;
    private final int e;
    private final FiniteField residueField;

    private ResidueMap(NumberField field, long p, FpPoly g, int e) {
        this.field = field;
        this.p = p;
        this.g = g;
        this.e = e;
        this.residueField = FiniteField.of(g);
    }

    /**
     * @return one reduction map per distinct irreducible factor of {@code f mod p}, in the order of
     *     {@link FpPoly#factor()}
     * @throws IndexDivisibleException if {@code p} divides {@code [O_K : Z[x]]}
     * @throws IllegalArgumentException if {@code p} is not a prime below 2^31, or a coefficient of
     *     {@code f} has a denominator divisible by {@code p}
     */
    public static List<ResidueMap> primesAbove(NumberField field, long p) {
        List<FpPoly.Factor> factors = factorsChecked(field, p);
        List<ResidueMap> out = new ArrayList<>(factors.size());
        for (FpPoly.Factor fac : factors) {
            out.add(new ResidueMap(field, p, fac.factor(), fac.multiplicity()));
        }
        return out;
    }

    /**
     * @return the reduction map for the prime {@code (p, g)}
     * @throws IllegalArgumentException if {@code g} is not a monic irreducible factor of {@code f}
     *     modulo {@code p} (or for the reasons of {@link #primesAbove(NumberField, long)})
     * @throws IndexDivisibleException if {@code p} divides {@code [O_K : Z[x]]}
     */
    public static ResidueMap forFactor(NumberField field, long p, FpPoly g) {
        if (g.modulus() != p) {
            throw new IllegalArgumentException("factor " + g + " is a polynomial modulo " + g.modulus() + ", not modulo " + p);
        }
        for (FpPoly.Factor fac : factorsChecked(field, p)) {
            if (fac.factor().equals(g)) {
                return new ResidueMap(field, p, g, fac.multiplicity());
            }
        }
        throw new IllegalArgumentException(
                g + " is not an irreducible factor of f modulo p (f = " + field.polynomial() + ", p = " + p + ")");
    }

    private static List<FpPoly.Factor> factorsChecked(NumberField field, long p) {
        FpPoly.checkPrime(p);
        QPoly f = field.polynomial();
        FpPoly fbar;
        try {
            fbar = FpPoly.fromQPoly(f, p);
        } catch (ArithmeticException ex) {
            throw new IllegalArgumentException(
                    "defining polynomial " + f + " has a coefficient with denominator divisible by " + p, ex);
        }
        List<FpPoly.Factor> factors = fbar.factor();
        if (!dedekindCriterion(f, fbar, factors, p)) {
            throw new IndexDivisibleException(field.name(), p);
        }
        return factors;
    }

    /**
     * Dedekind's criterion (Cohen, GTM 138, Thm. 6.1.4): with {@code f ≡ prod t_i^e_i (mod p)}, lift
     * {@code g = prod t_i} and {@code h = prod t_i^(e_i - 1)} to Z[x], let {@code F = (g h - f)/p};
     * then {@code p} does not divide the index iff {@code gcd(F mod p, g mod p, h mod p) = 1}.
     */
    static boolean dedekindCriterion(QPoly f, FpPoly fbar, List<FpPoly.Factor> factors, long p) {
        FpPoly gbar = FpPoly.one(p);
        FpPoly hbar = FpPoly.one(p);
        boolean ramified = false;
        for (FpPoly.Factor fac : factors) {
            gbar = gbar.multiply(fac.factor());
            if (fac.multiplicity() > 1) {
                ramified = true;
                hbar = hbar.multiply(fac.factor().pow(fac.multiplicity() - 1));
            }
        }
        if (!ramified) {
            return true; // gcd with h = 1 is 1
        }
        BigInteger bp = BigInteger.valueOf(p);
        BigInteger p2 = bp.multiply(bp);
        BigInteger[] fl = new BigInteger[f.degree() + 1];
        for (int k = 0; k <= f.degree(); k++) {
            Rational c = f.coefficient(k);
            fl[k] = c.num().multiply(c.den().modInverse(p2)).mod(p2);
        }
        BigInteger[] d = ZPoly.subtract(ZPoly.multiply(ZFactorization.lift(gbar), ZFactorization.lift(hbar)), ZPoly.trim(fl));
        BigInteger[] big = new BigInteger[d.length];
        for (int k = 0; k < d.length; k++) {
            BigInteger[] qr = d[k].divideAndRemainder(bp);
            if (qr[1].signum() != 0) {
                throw new IllegalStateException("g h - f is not divisible by p");
            }
            big[k] = qr[0];
        }
        FpPoly fBig = ZFactorization.fp(ZPoly.trim(big), p);
        return fBig.gcd(gbar).gcd(hbar).degree() == 0;
    }

    /** @return the number field {@code K} */
    public NumberField field() {
        return field;
    }

    /** @return the rational prime {@code p} below this prime */
    public long prime() {
        return p;
    }

    /** @return the residue field {@code F_p[x]/(g)} */
    public FiniteField residueField() {
        return residueField;
    }

    /** @return the monic irreducible factor {@code g} of {@code f mod p} naming this prime */
    public FpPoly factor() {
        return g;
    }

    /** @return the ramification index: the multiplicity of {@code g} in {@code f mod p} */
    public int ramificationIndex() {
        return e;
    }

    /** @return the residue degree {@code deg g} */
    public int residueDegree() {
        return g.degree();
    }

    /**
     * @return the image of {@code a} in {@code F_p[x]/(g)}
     * @throws IllegalArgumentException if {@code a} is not an element of {@link #field()}
     * @throws ArithmeticException if a coordinate of {@code a} on {@code 1, x, ..., x^(d-1)} has a
     *     denominator divisible by {@code p} ({@code a} is not {@code p}-integral there)
     */
    public FiniteField.Element reduce(NumberField.Element a) {
        if (!a.field().equals(field)) {
            throw new IllegalArgumentException("element of " + a.field().name() + " reduced at a prime of " + field.name());
        }
        BigInteger bp = BigInteger.valueOf(p);
        BigInteger den = a.commonDenominator();
        long dinv;
        if (den.equals(BigInteger.ONE)) {
            dinv = 1;
        } else {
            long dm = den.mod(bp).longValue();
            if (dm == 0) {
                throw new ArithmeticException(a + " is not " + p + "-integral");
            }
            dinv = FpPoly.invMod(dm, p);
        }
        BigInteger[] num = a.numerators();
        long[] c = new long[num.length];
        for (int k = 0; k < c.length; k++) {
            c[k] = FpPoly.mulMod(num[k].mod(bp).longValue(), dinv, p);
        }
        return residueField.element(FpPoly.wrap(p, c));
    }

    /**
     * @return {@code q mod p} in {@code [0, p)}
     * @throws ArithmeticException if {@code p} divides the denominator of {@code q}
     * @throws IllegalArgumentException if {@code p} is not a prime below 2^31
     */
    public static long reduceRational(Rational q, long p) {
        FpPoly.checkPrime(p);
        return FpPoly.reduce(q, p);
    }

    /** @return e.g. {@code "(7, x^2 + 6*x + 6)"} */
    @Override
    public String toString() {
        return "(" + p + ", " + g + ")";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ResidueMap r && r.p == p && r.g.equals(g) && r.field.equals(field);
    }

    @Override
    public int hashCode() {
        return field.hashCode() * 31 + g.hashCode();
    }
}
