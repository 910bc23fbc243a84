package io.github.eigengate.check.congruence;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.FiniteField;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.arith.IndexDivisibleException;
import io.github.eigengate.arith.ResidueMap;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Residue fields of coefficient fields at primes above p, and the reductions of a form's a_ℓ kept for the claims.
 * The primes of K = Q[x]/(f) above p are those of {@link ResidueMap#primesAbove}: named by the monic irreducible
 * factors g of f mod p, with residue field F_p[x]/(g), when p ∤ [O_K : Z[x]] (Dedekind's criterion).
 */
final class Residues {

    private Residues() {
    }

    /** A prime 𝔭 = (p, g) above p and its residue field F_p[x]/(g). For Q, g = x and the field is F_p. */
    record PrimeAbove(FpPoly factor, int ramification, FiniteField field) {

        @Override
        public String toString() {
            return "(" + factor.modulus() + ", " + factor + ")";
        }
    }

    /** Raised when p divides the index of Z[x] in O_K, so factors of f mod p do not name the primes above p. */
    static final class IndexDivisible extends Exception {
        private static final long serialVersionUID = 1L;

        IndexDivisible(String message) {
            super(message);
        }
    }

    /**
     * The primes of the form's coefficient field above p, in the order of {@link FpPoly#factor()}.
     *
     * @throws IndexDivisible when Dedekind's criterion shows p | [O_K : Z[x]]
     */
    static List<PrimeAbove> primesAbove(Form form, long p) throws IndexDivisible {
        if (form.rational()) {
            return List.of(new PrimeAbove(FpPoly.x(p), 1, FiniteField.primeField(p)));
        }
        List<ResidueMap> maps;
        try {
            maps = ResidueMap.primesAbove(form.field(), p);
        } catch (IndexDivisibleException e) {
            throw new IndexDivisible(e.getMessage());
        }
        List<PrimeAbove> out = new ArrayList<>();
        for (ResidueMap m : maps) {
            out.add(new PrimeAbove(m.factor(), m.ramificationIndex(), m.residueField()));
        }
        return out;
    }

    /**
     * The image of a coefficient (a {@link Rational} or a {@link NumberField.Element}) in the residue field.
     *
     * @throws ArithmeticException when p divides a denominator of its coordinates (not p-integral)
     */
    static FiniteField.Element reduce(Object value, FiniteField field) {
        long p = field.prime();
        QPoly poly = value instanceof Rational r ? QPoly.constant(r) : ((NumberField.Element) value).asPolynomial();
        return field.element(FpPoly.fromQPoly(poly, p));
    }

    /**
     * The image of a coefficient under Z[x] → F_p, x ↦ c (the reduction at a degree-1 prime (p, x − c)), by Horner's
     * rule on longs; p < 2^31 so products fit.
     *
     * @throws ArithmeticException when p divides a denominator
     */
    static long reduceAt(Object value, long c, long p) {
        if (value instanceof Rational r) {
            return mod(r, p);
        }
        List<Rational> coords = ((NumberField.Element) value).coordinates();
        long acc = 0;
        for (int i = coords.size() - 1; i >= 0; i--) {
            acc = (acc * c + mod(coords.get(i), p)) % p;
        }
        return acc;
    }

    private static long mod(Rational r, long p) {
        BigInteger bp = BigInteger.valueOf(p);
        long n = r.num().mod(bp).longValue();
        if (r.isInteger()) {
            return n;
        }
        long d = r.den().mod(bp).longValue();
        if (d == 0) {
            throw new ArithmeticException(r + " has " + p + " in its denominator");
        }
        return n * BigInteger.valueOf(d).modInverse(bp).longValue() % p;
    }

    /**
     * χ(n) mod 𝔭 for a character χ whose values lie in the form's field: ζ_{ord χ} = zeta^{m / ord χ}, m the order
     * of the form's character and {@code zeta} its reduction (unused, may be null, when ord χ ≤ 2); 0 when
     * gcd(n, cond-modulus) > 1.
     */
    static FiniteField.Element characterValue(DirichletCharacter chi, long n, int formOrder, FiniteField.Element zeta,
                                              FiniteField field) {
        int e = chi.exponent(n);
        if (e < 0) {
            return field.zero();
        }
        if (e == 0 || chi.order() == 1) {
            return field.one();
        }
        if (chi.order() == 2) {
            return field.one().negate();
        }
        return zeta.pow(BigInteger.valueOf((long) e * (formOrder / chi.order())));
    }

    /** The form's zeta reduced mod the prime, null without a zeta (ord χ ≤ 2). */
    static FiniteField.Element zeta(Form form, FiniteField field) {
        return form.zeta() == null ? null : reduce(form.zeta(), field);
    }

    /**
     * Generators of (Z/LZ)^×, L = lcm(N, p), for the determinant condition of a congruence between forms of levels
     * dividing N: those of (Z/NZ)^×, lifted to be ≡ 1 mod p when p ∤ N (there the p-part only compares weights, which
     * the checks do apart). N ≤ {@link DirichletCharacter#MAX_MODULUS}.
     */
    static long[] determinantGenerators(int n, long p) {
        long[] gens = DirichletCharacter.generators(n);
        if (n % p == 0) {
            return gens;
        }
        long inv = BigInteger.valueOf(n).modInverse(BigInteger.valueOf(p)).longValue();
        long[] out = new long[gens.length];
        for (int i = 0; i < gens.length; i++) {
            // u ≡ g mod N, u ≡ 1 mod p
            long g = gens[i];
            long t = Math.floorMod((1 - g % p) % p * inv % p, p);
            out[i] = g + (long) n * t;
        }
        return out;
    }

    /** b^e mod p for 0 ≤ b < p < 2^31, e ≥ 0. */
    static long powMod(long b, long e, long p) {
        long result = 1 % p;
        long base = b % p;
        while (e > 0) {
            if ((e & 1) == 1) {
                result = result * base % p;
            }
            base = base * base % p;
            e >>= 1;
        }
        return result;
    }

    /** The first monic irreducible polynomial of the given degree over F_p in the order x^d + (c_0 + c_1 p + …). */
    static FpPoly irreducible(long p, int degree) {
        if (degree == 1) {
            return FpPoly.x(p);
        }
        for (long code = 0; ; code++) {
            long[] c = new long[degree + 1];
            long rest = code;
            for (int i = 0; i < degree && rest > 0; i++) {
                c[i] = rest % p;
                rest /= p;
            }
            c[degree] = 1;
            FpPoly u = FpPoly.of(p, c);
            if (u.isIrreducible()) {
                return u;
            }
        }
    }

    /**
     * What one form contributes to the claims about one p: for each prime above p, the residues of a_ℓ at the primes
     * ℓ ≤ {@code limit} (in order), whether each ℓ was in the tables, and the residue of a_p.
     */
    static final class Store {
        final Form form;
        final long p;
        final long limit;
        final List<PrimeAbove> primes;
        int[] ells = new int[0];
        boolean[] present = new boolean[0];
        /** Residues in fields of degree > 1 ([prime above p][index of ℓ]); rows of degree-1 primes are null. */
        FiniteField.Element[][] residues = new FiniteField.Element[0][];
        /** Residues in [0, p) at degree-1 primes (the common case, kept as longs); rows of the others are null. */
        long[][] flat = new long[0][];
        /** For a degree-1 prime (p, x − c): c, the image of x; unused for the others. */
        private final long[] root;
        FiniteField.Element[] atP;
        int maxIndex;
        /** The primes were reduced up to here. */
        int top;
        /** The first ℓ whose a_ℓ is not p-integral (0 if none), and that value. */
        int notIntegralAt;
        String notIntegralValue = "";

        Store(Form form, long p, long limit, List<PrimeAbove> primes) {
            this.form = form;
            this.p = p;
            this.limit = limit;
            this.primes = primes;
            this.atP = new FiniteField.Element[primes.size()];
            this.root = new long[primes.size()];
            for (int k = 0; k < primes.size(); k++) {
                FpPoly g = primes.get(k).factor();
                root[k] = g.degree() == 1 ? Math.floorMod(-g.coefficient(0), p) : 0;
            }
        }

        boolean linear(int k) {
            return primes.get(k).field().degree() == 1;
        }

        /** The residue of a_ℓ, ℓ = ells[idx], at the k-th prime, as a field element (for messages and degree > 1). */
        FiniteField.Element residue(int k, int idx) {
            return linear(k) ? primes.get(k).field().fromLong(flat[k][idx]) : residues[k][idx];
        }

        /** Reduces a_ℓ for every prime ℓ ≤ min(limit, the largest n present) and a_p, stopping at a bad value. */
        <E> void fill(FormData<E> data, Primes sieve) {
            Coefficients<E> a = data.coefficients();
            maxIndex = a.maxIndex();
            top = (int) Math.min(Math.min(limit, maxIndex), Primes.CAP);
            int[] all = sieve.upTo(top);
            ells = all;
            present = new boolean[all.length];
            residues = new FiniteField.Element[primes.size()][];
            flat = new long[primes.size()][];
            for (int k = 0; k < primes.size(); k++) {
                if (linear(k)) {
                    flat[k] = new long[all.length];
                } else {
                    residues[k] = new FiniteField.Element[all.length];
                }
            }
            for (int idx = 0; idx < all.length; idx++) {
                E v = a.get(all[idx]);
                if (v == null) {
                    continue;
                }
                if (!reduceInto(v, idx, all[idx])) {
                    return;
                }
                present[idx] = true;
            }
            E ap = p <= Integer.MAX_VALUE ? a.get(p) : null;
            if (ap != null) {
                for (int k = 0; k < primes.size(); k++) {
                    try {
                        atP[k] = reduce(ap, primes.get(k).field());
                    } catch (ArithmeticException e) {
                        atP[k] = null;
                    }
                }
            }
        }

        private boolean reduceInto(Object v, int idx, int ell) {
            for (int k = 0; k < primes.size(); k++) {
                try {
                    if (linear(k)) {
                        flat[k][idx] = reduceAt(v, root[k], p);
                    } else {
                        residues[k][idx] = reduce(v, primes.get(k).field());
                    }
                } catch (ArithmeticException e) {
                    notIntegralAt = ell;
                    notIntegralValue = v.toString();
                    present = java.util.Arrays.copyOf(present, idx);
                    ells = java.util.Arrays.copyOf(ells, idx);
                    return false;
                }
            }
            return true;
        }

        /**
         * The largest X such that a_ℓ is present for every prime ℓ ≤ X not in {@code excluded}, as far as this store
         * can tell (it is exact whenever X is below the limit).
         */
        long complete(Set<Long> excluded) {
            for (int idx = 0; idx < ells.length; idx++) {
                if (!present[idx] && !excluded.contains((long) ells[idx])) {
                    return ells[idx] - 1L;
                }
            }
            if (notIntegralAt > 0) {
                return notIntegralAt - 1L;
            }
            return top < maxIndex ? top : maxIndex;
        }
    }
}
