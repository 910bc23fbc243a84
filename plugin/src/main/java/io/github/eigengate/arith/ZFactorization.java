package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Factorisation of polynomials over Q (equivalently, of primitive polynomials over Z) by
 * Zassenhaus' method: factor modulo a suitable prime p, lift the factorisation to p^a by Hensel's
 * lemma beyond the Landau–Mignotte bound, and recombine the lifted factors by trial division. See
 * von zur Gathen–Gerhard, <i>Modern Computer Algebra</i> (3rd ed.), ch. 15 (Alg. 15.10 for the
 * Hensel step; factor combination by trial division) and Cohen, GTM 138, §3.5.
 *
 * <p>Before lifting, several primes are tried: if the polynomial is irreducible modulo one of them
 * (a prime not dividing the leading coefficient nor the discriminant) it is irreducible over Q, and
 * the degree sets of the modular factorisations are intersected to rule out recombinations early
 * (Musser's degree analysis).
 */
public final class ZFactorization {
    /** How many good primes are tried before lifting. */
    private static final int PRIMES_TRIED = 6;

    private ZFactorization() {}

    /** An irreducible factor with its multiplicity. */
    public record Factor(QPoly factor, int multiplicity) {
    }

    /**
     * Factors {@code f} into irreducibles over Q.
     *
     * @param f a nonzero polynomial (rational coefficients are allowed; only {@code f} up to a
     *     nonzero rational constant matters)
     * @return the irreducible factors, each with primitive integer coefficients and positive leading
     *     coefficient, repeated according to multiplicity, sorted by degree and then by coefficients
     *     from the top down; {@code f} equals their product times a rational constant. Empty for a
     *     constant.
     * @throws IllegalArgumentException if {@code f} is zero
     */
    public static List<QPoly> factor(QPoly f) {
        List<QPoly> out = new ArrayList<>();
        for (Factor fac : factorWithMultiplicity(f)) {
            for (int k = 0; k < fac.multiplicity; k++) {
                out.add(fac.factor);
            }
        }
        return out;
    }

    /**
     * Like {@link #factor(QPoly)}, but lists each distinct irreducible factor once with its
     * multiplicity.
     *
     * @throws IllegalArgumentException if {@code f} is zero
     */
    public static List<Factor> factorWithMultiplicity(QPoly f) {
        if (f.isZero()) {
            throw new IllegalArgumentException("cannot factor the zero polynomial");
        }
        List<Factor> out = new ArrayList<>();
        if (f.degree() == 0) {
            return out;
        }
        // Yun's squarefree decomposition over Q (von zur Gathen–Gerhard, Alg. 14.21)
        QPoly a = f.monic();
        QPoly d0 = a.derivative();
        QPoly g = a.gcd(d0);
        QPoly b = a.divRem(g)[0];
        QPoly c = d0.divRem(g)[0];
        QPoly dd = c.subtract(b.derivative());
        int i = 1;
        while (b.degree() > 0) {
            QPoly ai = b.gcd(dd);
            b = b.divRem(ai)[0];
            c = dd.divRem(ai)[0];
            dd = c.subtract(b.derivative());
            if (ai.degree() > 0) {
                for (BigInteger[] h : squarefreeFactor(ZPoly.primitiveOf(ai.coeffArray()))) {
                    out.add(new Factor(QPoly.ofIntegers(h), i));
                }
            }
            i++;
        }
        out.sort(Comparator.comparing(Factor::factor, ZFactorization::compare));
        return out;
    }

    /**
     * @return whether {@code f} is irreducible over Q: of degree at least 1 and not a product of two
     *     polynomials of lower degree (so {@code 2x + 2} is irreducible; constants and zero are not)
     */
    public static boolean isIrreducible(QPoly f) {
        if (f.degree() < 1) {
            return false;
        }
        if (f.degree() == 1) {
            return true;
        }
        BigInteger[] s = ZPoly.primitiveOf(f.coeffArray());
        if (s[0].signum() == 0) {
            return false;
        }
        if (ZPoly.degree(ZPoly.gcd(s, ZPoly.derivative(s))) > 0) {
            return false;
        }
        return squarefreeFactor(s).size() == 1;
    }

    static int compare(QPoly a, QPoly b) {
        if (a.degree() != b.degree()) {
            return Integer.compare(a.degree(), b.degree());
        }
        for (int k = a.degree(); k >= 0; k--) {
            int c = a.coefficient(k).compareTo(b.coefficient(k));
            if (c != 0) {
                return c;
            }
        }
        return 0;
    }

    /** Factors a squarefree primitive integer polynomial with positive leading coefficient. */
    static List<BigInteger[]> squarefreeFactor(BigInteger[] s) {
        List<BigInteger[]> out = new ArrayList<>();
        // strip the factor x first
        if (s[0].signum() == 0) {
            out.add(ZPoly.of(0, 1));
            s = Arrays.copyOfRange(s, 1, s.length);
        }
        if (ZPoly.degree(s) >= 1) {
            out.addAll(zassenhaus(s));
        }
        return out;
    }

    /** Squarefree, primitive, positive lc, nonzero constant term, degree >= 1. */
    private static List<BigInteger[]> zassenhaus(BigInteger[] s) {
        int n = ZPoly.degree(s);
        if (n == 1) {
            return java.util.Collections.singletonList(s);
        }
        // --- choose a prime: p ∤ lc(s), s mod p squarefree; keep the one with fewest factors
        boolean[] possible = null;
        long bestP = 0;
        List<FpPoly> bestFactors = null;
        int good = 0;
        for (long p = 2; good < PRIMES_TRIED; p = nextPrime(p)) {
            BigInteger bp = BigInteger.valueOf(p);
            if (ZPoly.lc(s).mod(bp).signum() == 0) {
                continue;
            }
            FpPoly sp = fp(s, p);
            if (sp.gcd(sp.derivative()).degree() > 0) {
                continue;
            }
            good++;
            List<FpPoly.Factor> fac = sp.factor();
            if (fac.size() == 1) {
                return java.util.Collections.singletonList(s);
            }
            boolean[] sums = new boolean[n + 1];
            sums[0] = true;
            for (FpPoly.Factor fa : fac) {
                int d = fa.factor().degree();
                for (int k = n; k >= d; k--) {
                    sums[k] |= sums[k - d];
                }
            }
            if (possible == null) {
                possible = sums;
            } else {
                for (int k = 0; k <= n; k++) {
                    possible[k] &= sums[k];
                }
            }
            boolean only = true;
            for (int k = 1; k < n; k++) {
                if (possible[k]) {
                    only = false;
                    break;
                }
            }
            if (only) {
                return java.util.Collections.singletonList(s);
            }
            if (bestFactors == null || fac.size() < bestFactors.size()) {
                bestP = p;
                bestFactors = new ArrayList<>();
                for (FpPoly.Factor fa : fac) {
                    bestFactors.add(fa.factor());
                }
            }
        }
        long p = bestP;
        // --- bound: every candidate b*h/lc(h) has coefficients of absolute value <= 2^n ||s||_2
        BigInteger norm2sq = BigInteger.ZERO;
        for (BigInteger c : s) {
            norm2sq = norm2sq.add(c.multiply(c));
        }
        BigInteger coeffBound = norm2sq.sqrt().add(BigInteger.ONE).shiftLeft(n);
        BigInteger bound = coeffBound.shiftLeft(1);
        BigInteger bp = BigInteger.valueOf(p);
        BigInteger m = bp;
        while (m.compareTo(bound) <= 0) {
            m = m.multiply(m);
        }
        // --- Hensel lifting of the factor tree to modulus m = p^(2^k)
        List<BigInteger[]> lifted = new ArrayList<>();
        liftTree(ZPoly.mod(s, m), bestFactors, p, m, lifted);
        // --- recombination
        return recombine(s, lifted, m, possible, coeffBound);
    }

    private static long nextPrime(long p) {
        return BigInteger.valueOf(p).nextProbablePrime().longValue();
    }

    static FpPoly fp(BigInteger[] a, long p) {
        BigInteger bp = BigInteger.valueOf(p);
        long[] c = new long[a.length];
        for (int k = 0; k < a.length; k++) {
            c[k] = a[k].mod(bp).longValue();
        }
        return FpPoly.wrap(p, c);
    }

    static BigInteger[] lift(FpPoly a) {
        long[] c = a.raw();
        BigInteger[] r = new BigInteger[c.length];
        for (int k = 0; k < c.length; k++) {
            r[k] = BigInteger.valueOf(c[k]);
        }
        return r;
    }

    /**
     * Lifts {@code poly ≡ lc(poly) * prod(factors) (mod p)} to monic factors modulo {@code m},
     * splitting the factor list in halves and lifting each split with the quadratic Hensel step.
     */
    private static void liftTree(BigInteger[] poly, List<FpPoly> factors, long p, BigInteger m, List<BigInteger[]> out) {
        if (factors.size() == 1) {
            BigInteger inv = ZPoly.lc(poly).modInverse(m);
            out.add(ZPoly.mod(ZPoly.scale(poly, inv), m));
            return;
        }
        int half = factors.size() / 2;
        List<FpPoly> left = factors.subList(0, half);
        List<FpPoly> right = factors.subList(half, factors.size());
        FpPoly g0 = FpPoly.of(p, ZPoly.lc(poly).mod(BigInteger.valueOf(p)).longValue());
        for (FpPoly u : left) {
            g0 = g0.multiply(u);
        }
        FpPoly h0 = FpPoly.one(p);
        for (FpPoly u : right) {
            h0 = h0.multiply(u);
        }
        FpPoly[] egs = g0.extendedGcd(h0);
        BigInteger[][] gh = henselLift(poly, lift(g0), lift(h0), lift(egs[1]), lift(egs[2]), BigInteger.valueOf(p), m);
        liftTree(gh[0], left, p, m, out);
        liftTree(gh[1], right, p, m, out);
    }

    /**
     * Repeated quadratic Hensel steps (von zur Gathen–Gerhard, Alg. 15.10) from modulus {@code p}
     * to {@code m}: given {@code f ≡ g h}, {@code s g + t h ≡ 1 (mod p)}, {@code h} monic, returns
     * {@code {g*, h*}} with {@code f ≡ g* h* (mod m)}, {@code h*} monic of the same degree.
     */
    private static BigInteger[][] henselLift(
            BigInteger[] f, BigInteger[] g, BigInteger[] h, BigInteger[] s, BigInteger[] t, BigInteger p, BigInteger m) {
        BigInteger mod = p;
        while (mod.compareTo(m) < 0) {
            BigInteger m2 = mod.multiply(mod);
            BigInteger[] e = ZPoly.mod(ZPoly.subtract(f, ZPoly.multiply(g, h)), m2);
            BigInteger[][] qr = divRemMonic(ZPoly.mod(ZPoly.multiply(s, e), m2), h, m2);
            BigInteger[] gNew = ZPoly.mod(ZPoly.add(g, ZPoly.add(ZPoly.multiply(t, e), ZPoly.multiply(qr[0], g))), m2);
            BigInteger[] hNew = ZPoly.mod(ZPoly.add(h, qr[1]), m2);
            BigInteger[] b = ZPoly.mod(
                    ZPoly.subtract(ZPoly.add(ZPoly.multiply(s, gNew), ZPoly.multiply(t, hNew)), ZPoly.of(1)), m2);
            BigInteger[][] cd = divRemMonic(ZPoly.mod(ZPoly.multiply(s, b), m2), hNew, m2);
            BigInteger[] sNew = ZPoly.mod(ZPoly.subtract(s, cd[1]), m2);
            BigInteger[] tNew = ZPoly.mod(
                    ZPoly.subtract(ZPoly.subtract(t, ZPoly.multiply(t, b)), ZPoly.multiply(cd[0], gNew)), m2);
            g = gNew;
            h = hNew;
            s = sNew;
            t = tNew;
            mod = m2;
        }
        return new BigInteger[][] {ZPoly.mod(g, m), ZPoly.mod(h, m)};
    }

    /** Division by a monic polynomial over Z/m. */
    private static BigInteger[][] divRemMonic(BigInteger[] a, BigInteger[] h, BigInteger m) {
        int dh = ZPoly.degree(h);
        if (ZPoly.degree(a) < dh) {
            return new BigInteger[][] {ZPoly.ZERO, a};
        }
        BigInteger[] r = a.clone();
        BigInteger[] q = new BigInteger[a.length - dh];
        Work.charge(Work.BIG * (a.length - dh) * (dh + 1) * (1 + m.bitLength() / 64));
        for (int k = a.length - 1; k >= dh; k--) {
            BigInteger t = r[k].mod(m);
            q[k - dh] = t;
            if (t.signum() != 0) {
                for (int j = 0; j <= dh; j++) {
                    r[k - dh + j] = r[k - dh + j].subtract(t.multiply(h[j])).mod(m);
                }
            }
        }
        return new BigInteger[][] {ZPoly.trim(q), ZPoly.mod(Arrays.copyOf(r, dh), m)};
    }

    /**
     * Recombination of the lifted monic factors (von zur Gathen–Gerhard, ch. 15, with trial
     * division): subsets of increasing size {@code k}, candidate {@code b * prod u_i} in symmetric
     * representation modulo {@code m}, accepted when it divides {@code b f} over Z. A true factor
     * {@code h} gives the candidate {@code (b / lc h) h}, whose coefficients are at most {@code
     * 2^n ||s||_2} in absolute value (Mignotte's factor bound, von zur Gathen–Gerhard §6.6, with
     * {@code |b| <= |lc s|}); candidates beyond it are rejected without division.
     */
    private static List<BigInteger[]> recombine(
            BigInteger[] f, List<BigInteger[]> u, BigInteger m, boolean[] possible, BigInteger coeffBound) {
        List<BigInteger[]> out = new ArrayList<>();
        List<BigInteger[]> rest = new ArrayList<>(u);
        int k = 1;
        while (2 * k <= rest.size()) {
            boolean found = false;
            int r = rest.size();
            int[] idx = new int[k];
            for (int j = 0; j < k; j++) {
                idx[j] = j;
            }
            BigInteger b = ZPoly.lc(f);
            while (true) {
                Work.charge(Work.BIG * (k + 1) * (1 + m.bitLength() / 64) * (1 + m.bitLength() / 64));
                int deg = 0;
                for (int j : idx) {
                    deg += ZPoly.degree(rest.get(j));
                }
                if (possible == null || possible[deg]) {
                    // cheap test on constant terms first
                    BigInteger c0 = b;
                    for (int j : idx) {
                        c0 = c0.multiply(rest.get(j)[0]).mod(m);
                    }
                    c0 = symmetric(c0, m);
                    if (c0.signum() != 0 && f[0].multiply(b).remainder(c0).signum() == 0) {
                        BigInteger[] cand = {b};
                        for (int j : idx) {
                            cand = ZPoly.mod(ZPoly.multiply(cand, rest.get(j)), m);
                        }
                        cand = ZPoly.symmetricMod(cand, m);
                        // a true factor's candidate obeys the Landau–Mignotte bound; most false ones do not
                        BigInteger[] quotient = withinBound(cand, coeffBound) ? ZPoly.exactDivide(ZPoly.scale(f, b), cand) : null;
                        if (quotient != null) {
                            BigInteger[] h = ZPoly.primitivePart(cand);
                            out.add(h);
                            f = ZPoly.exactDivide(f, h);
                            List<BigInteger[]> remaining = new ArrayList<>();
                            int pos = 0;
                            for (int j = 0; j < r; j++) {
                                if (pos < k && idx[pos] == j) {
                                    pos++;
                                } else {
                                    remaining.add(rest.get(j));
                                }
                            }
                            rest = remaining;
                            found = true;
                            break;
                        }
                    }
                }
                if (!nextSubset(idx, r)) {
                    break;
                }
            }
            if (!found) {
                k++;
            }
        }
        if (ZPoly.degree(f) > 0) {
            out.add(ZPoly.primitivePart(f));
        }
        return out;
    }

    private static boolean withinBound(BigInteger[] a, BigInteger bound) {
        for (BigInteger c : a) {
            if (c.abs().compareTo(bound) > 0) {
                return false;
            }
        }
        return true;
    }

    private static BigInteger symmetric(BigInteger c, BigInteger m) {
        return c.compareTo(m.shiftRight(1)) > 0 ? c.subtract(m) : c;
    }

    /** Advances {@code idx} to the next k-subset of {0..n-1} in lexicographic order. */
    private static boolean nextSubset(int[] idx, int n) {
        int k = idx.length;
        int i = k - 1;
        while (i >= 0 && idx[i] == n - k + i) {
            i--;
        }
        if (i < 0) {
            return false;
        }
        idx[i]++;
        for (int j = i + 1; j < k; j++) {
            idx[j] = idx[j - 1] + 1;
        }
        return true;
    }
}
