package io.github.eigengate.theory.spaces;

import io.github.eigengate.theory.Arith;
import java.math.BigInteger;

/**
 * Traces of the Hecke operators T_n on S_k(Γ0(N)) (trivial character, even k ≥ 2) by the
 * Eichler–Selberg trace formula, and on the new subspace for n coprime to N.
 *
 * <h2>The formula</h2>
 * We use Cohen's form of the trace formula, valid for every n ≥ 1 including (n, N) &gt; 1
 * (H. Cohen, <i>Trace des opérateurs de Hecke sur Γ0(N)</i>, Séminaire de Théorie des Nombres de
 * Bordeaux 1976–1977, exposé no. 4, main theorem; restated in H. Cohen and F. Strömberg, <i>Modern Analytic
 * Theory of Modular Forms</i>, AMS GSM 179, §12.4), specialised to the trivial character χ = χ_0 mod N.
 * For N = 1 it is Zagier's formula (appendix to S. Lang, <i>Introduction to Modular Forms</i>,
 * Grundlehren 222). Tr(T_n | S_k(Γ0(N))) = A1 + A2 + A3 + A4 where
 * <ul>
 *   <li>A1 = n^{k/2 − 1} · (k − 1)/12 · ψ(N) if n = s² is a square with (s, N) = 1, and 0 otherwise;
 *       ψ(N) = N ∏_{p | N}(1 + 1/p).</li>
 *   <li>A2 = −½ Σ_{t ∈ Z, t² &lt; 4n} U_{k−1}(t, n) Σ_f h_w((t² − 4n)/f²) · μ(t, f, n), where
 *       U_{k−1}(t, n) = (ρ^{k−1} − ρ̄^{k−1})/(ρ − ρ̄) for the roots ρ, ρ̄ of X² − tX + n (computed by
 *       U_0 = 0, U_1 = 1, U_{j+1} = t U_j − n U_{j−1}); f runs over the positive integers with
 *       f² | t² − 4n and (t² − 4n)/f² ≡ 0, 1 mod 4; h_w(D) = h(D)/(w(D)/2) is the weighted class number of
 *       primitive forms of discriminant D; and
 *       <pre>μ(t, f, n) = ψ(N)/ψ(N/N_f) · #{ x mod N : (x, N) = 1, x² − t x + n ≡ 0 mod N·N_f },  N_f = (N, f).</pre>
 *       (The congruence mod N·N_f is well defined for x mod N because N_f | 2x − t.)</li>
 *   <li>A3 = −½ Σ_{d | n} min(d, n/d)^{k−1} Σ_τ φ((τ, N/τ)), the inner sum over τ | N with
 *       (τ, N/τ) | n/d − d, (d, τ) = 1 and (n/d, N/τ) = 1 (this last pair of conditions is χ_0(y_τ) for the
 *       y_τ ≡ d mod τ, y_τ ≡ n/d mod N/τ of the general formula).</li>
 *   <li>A4 = Σ_{d | n, (N, n/d) = 1} d if k = 2, and 0 otherwise (the weight-2 correction coming from the
 *       Eisenstein series).</li>
 * </ul>
 * T_n for (n, N) &gt; 1 is the usual Hecke operator of level N (products of U_p at p | N).
 *
 * <h2>Evaluation</h2>
 * Everything is multiplied by 24 and computed in integers: 24·A2 = −Σ_t U_{k−1}(t, n) Σ_f 12h_w · μ uses
 * the integers 12·h_w from {@link HurwitzClassNumbers}. When (F, N) = 1 for the conductor F of 4n − t²,
 * every f has N_f = 1 and the f-sum collapses to 12H(4n − t²)·μ(t, 1, n). The count in μ is a product over
 * the prime powers p^a ‖ N (Chinese remainder theorem) of counts of x mod p^a, p ∤ x, with
 * x² − tx + n ≡ 0 mod p^{a+b}, b = min(a, v_p(f)); these are evaluated in closed form by completing the
 * square and Hensel's lemma (see {@link #localCount}). The result is checked to be an integer.
 *
 * <h2>New subspace</h2>
 * For (n, N) = 1 the oldforms f(dz), d | N/M, coming from a newform f of level M all carry the T_n-eigenvalue
 * of f, so Tr(T_n | S_k(N)) = Σ_{M | N} σ0(N/M) Tr(T_n | S_k^new(M)); inverting with β = μ * μ (the Dirichlet
 * inverse of σ0; G. Martin, J. Number Theory 112 (2005), §1) gives
 * Tr(T_n | S_k^new(N)) = Σ_{M | N} β(N/M) Tr(T_n | S_k(M)). For (n, N) &gt; 1 this fails (U_p does not act
 * on the oldforms by the eigenvalue of f), so {@link #newTrace} rejects such n. The β-weighted sum is not
 * evaluated level by level: in A2 the sum over M of β(N/M)·μ_M factorises over the primes of N (both factors
 * are multiplicative), so one pass over t serves all divisor levels.
 *
 * <p>Instances are immutable and thread-safe.
 */
public final class TraceFormula {

    /** Primes up to this bound get a table of quadratic residues. */
    private static final long QR_TABLE_LIMIT = 1 << 16;

    private final Level level;
    private final Level[] divisorLevels;
    private final long[] divisorBetas;
    private final HurwitzClassNumbers table;

    private TraceFormula(Level level, Level[] divisorLevels, long[] divisorBetas, HurwitzClassNumbers table) {
        this.level = level;
        this.divisorLevels = divisorLevels;
        this.divisorBetas = divisorBetas;
        this.table = table;
    }

    /**
     * Precomputes the level-dependent data for N and for every M | N with β(N/M) ≠ 0.
     *
     * @param level N ≥ 1
     * @param table Hurwitz class numbers; {@code trace(k, n)} needs {@code table.bound() ≥ 4n}
     * @throws IllegalArgumentException if level &lt; 1
     * @throws NullPointerException     if table is null
     */
    public static TraceFormula forLevel(int level, HurwitzClassNumbers table) {
        if (level < 1) {
            throw new IllegalArgumentException("level must be >= 1, got " + level);
        }
        if (table == null) {
            throw new NullPointerException("table");
        }
        long[] divs = Arith.divisors(Arith.factor(level));
        int count = 0;
        for (long m : divs) {
            if (Arith.beta(level / m) != 0) {
                count++;
            }
        }
        Level[] levels = new Level[count];
        long[] betas = new long[count];
        Level self = null;
        int i = 0;
        for (long m : divs) {
            long b = Arith.beta(level / m);
            if (b != 0) {
                levels[i] = new Level(m);
                betas[i] = b;
                if (m == level) {
                    self = levels[i];
                }
                i++;
            }
        }
        return new TraceFormula(self, levels, betas, table);
    }

    /** The level N. */
    public int level() {
        return (int) level.n;
    }

    /**
     * Tr(T_n | S_k(Γ0(N))) for the trivial character, by Cohen's trace formula (see class comment).
     *
     * @param weight k ≥ 2 (odd k gives 0: the space is 0)
     * @param n      n ≥ 1, with 4n ≤ the bound of the class-number table
     * @return the trace, an exact integer
     * @throws IllegalArgumentException if k &lt; 2, n &lt; 1, or 4n exceeds the class-number table
     * @throws IllegalStateException    if the formula produced a non-integer (a bug)
     */
    public BigInteger trace(int weight, long n) {
        checkArgs(weight, n);
        if ((weight & 1) == 1) {
            return BigInteger.ZERO;
        }
        long[][] nf = Arith.factor(n);
        return exactDiv24(traceTimes24(level, weight, n, Arith.divisors(nf)), level.n, weight, n);
    }

    /**
     * Tr(T_n | S_k^new(Γ0(N))) for (n, N) = 1, = Σ_{M | N} β(N/M) Tr(T_n | S_k(Γ0(M))) (see class comment).
     *
     * @param weight k ≥ 2 (odd k gives 0)
     * @param n      n ≥ 1 coprime to N, with 4n ≤ the bound of the class-number table
     * @return the trace on the new subspace, an exact integer
     * @throws IllegalArgumentException if (n, N) &gt; 1 (the σ0-multiplicity inversion needs (n, N) = 1),
     *                                  or k &lt; 2, n &lt; 1, or 4n exceeds the table
     * @throws IllegalStateException    if the formula produced a non-integer (a bug)
     */
    public BigInteger newTrace(int weight, long n) {
        checkArgs(weight, n);
        if (Arith.gcd(n, level.n) != 1) {
            throw new IllegalArgumentException("newTrace needs n coprime to the level: gcd(" + n + ", "
                    + level.n + ") > 1, and the oldform multiplicities only describe T_n for (n, N) = 1");
        }
        if ((weight & 1) == 1) {
            return BigInteger.ZERO;
        }
        long[] nDivs = Arith.divisors(Arith.factor(n));
        return exactDiv24(newTraceTimes24(weight, n, nDivs), level.n, weight, n);
    }

    /**
     * The same as {@link #newTrace} for (n, N) = 1 and even k, evaluated naively as
     * Σ_{M | N} β(N/M) Tr(T_n | S_k(M)) with one full trace formula per divisor M; kept to cross-check the
     * factorised evaluation in tests.
     */
    BigInteger newTraceBySummingLevels(int weight, long n) {
        long[] nDivs = Arith.divisors(Arith.factor(n));
        BigInteger sum = BigInteger.ZERO;
        for (int i = 0; i < divisorLevels.length; i++) {
            Level m = divisorLevels[i];
            BigInteger tr = exactDiv24(traceTimes24(m, weight, n, nDivs), m.n, weight, n);
            sum = sum.add(tr.multiply(BigInteger.valueOf(divisorBetas[i])));
        }
        return sum;
    }

    private void checkArgs(int weight, long n) {
        if (weight < 2) {
            throw new IllegalArgumentException("weight must be >= 2 (weight 1 is not supported), got " + weight);
        }
        if (n < 1) {
            throw new IllegalArgumentException("n must be >= 1, got " + n);
        }
        if (n > table.bound() / 4) {
            throw new IllegalArgumentException("T_" + n + " needs Hurwitz class numbers up to 4*" + n
                    + " but the table only reaches " + table.bound());
        }
    }

    private static BigInteger exactDiv24(BigInteger times24, long level, int weight, long n) {
        BigInteger[] qr = times24.divideAndRemainder(BigInteger.valueOf(24));
        if (qr[1].signum() != 0) {
            throw new IllegalStateException("trace formula gave the non-integer " + times24 + "/24 for N = "
                    + level + ", k = " + weight + ", n = " + n);
        }
        return qr[0];
    }

    /** 24·Tr(T_n | S_k(Γ0(M))) for even k ≥ 2; {@code nDivs} are the divisors of n. */
    private BigInteger traceTimes24(Level lv, int k, long n, long[] nDivs) {
        int tMax = (int) Arith.isqrt(4 * n - 1);
        long[] classSums = new long[tMax + 1];
        for (int t = 0; t <= tMax; t++) {
            classSums[t] = classSum(lv, t, n);
        }
        long[] a3 = new long[nDivs.length];
        for (int i = 0; i < nDivs.length; i++) {
            a3[i] = lv.a3Inner(nDivs[i], n / nDivs[i]);
        }
        long a1Base = 0;
        long s = Arith.isqrt(n);
        if (s * s == n && Arith.gcd(s, lv.n) == 1) {
            a1Base = 2L * (k - 1) * lv.psi;
        }
        long a4 = 0;
        if (k == 2) {
            for (long d : nDivs) {
                if (Arith.gcd(lv.n, n / d) == 1) {
                    a4 += 24 * d;
                }
            }
        }
        try {
            return BigInteger.valueOf(combineLong(k, n, s, classSums, nDivs, a3, a1Base, a4));
        } catch (ArithmeticException overflow) {
            return combineBig(k, n, s, classSums, nDivs, a3, a1Base, a4);
        }
    }

    /**
     * 24·Σ_{M | N} β(N/M) Tr(T_n | S_k(M)) for (n, N) = 1 and even k. A1, A3 and A4 are cheap and summed
     * level by level (with (n, N) = 1 their coprimality conditions on s, d, n/d hold automatically). In A2 the
     * β-weighted sum of μ_M(t, f, n) over M | N factorises over the primes of N, because β and the local
     * counts are multiplicative: Σ_M β(N/M) μ_M = ∏_{p^a ‖ N} Σ_{j = 0}^{a} β(p^{a−j}) μ_{p^j}, μ_1 = 1. So one
     * pass over t serves all divisor levels.
     */
    private BigInteger newTraceTimes24(int k, long n, long[] nDivs) {
        int tMax = (int) Arith.isqrt(4 * n - 1);
        long[] classSums = new long[tMax + 1];
        for (int t = 0; t <= tMax; t++) {
            classSums[t] = newClassSum(t, n);
        }
        long[] a3 = new long[nDivs.length];
        long a1Base = 0;
        long a4Weight = 0;
        for (int j = 0; j < divisorLevels.length; j++) {
            Level m = divisorLevels[j];
            long b = divisorBetas[j];
            for (int i = 0; i < nDivs.length; i++) {
                a3[i] += b * m.a3Inner(nDivs[i], n / nDivs[i]);
            }
            a1Base += b * 2L * (k - 1) * m.psi;
            a4Weight += b;
        }
        long s = Arith.isqrt(n);
        if (s * s != n) {
            a1Base = 0;
        }
        long a4 = 0;
        if (k == 2 && a4Weight != 0) {
            for (long d : nDivs) {
                a4 += 24 * d * a4Weight;
            }
        }
        try {
            return BigInteger.valueOf(combineLong(k, n, s, classSums, nDivs, a3, a1Base, a4));
        } catch (ArithmeticException overflow) {
            return combineBig(k, n, s, classSums, nDivs, a3, a1Base, a4);
        }
    }

    private static long combineLong(int k, long n, long s, long[] classSums, long[] nDivs, long[] a3,
            long a1Base, long a4) {
        long total = a4;
        if (a1Base != 0) {
            total = Math.addExact(total, Math.multiplyExact(a1Base, Arith.powExact(s, k - 2)));
        }
        for (int t = 0; t < classSums.length; t++) {
            if (classSums[t] == 0) {
                continue;
            }
            long u = lucasU(t, n, k - 1);
            long term = Math.multiplyExact(u, classSums[t]);
            total = Math.subtractExact(total, t == 0 ? term : Math.multiplyExact(2, term));
        }
        for (int i = 0; i < nDivs.length; i++) {
            if (a3[i] == 0) {
                continue;
            }
            long d = nDivs[i];
            long mn = Math.min(d, n / d);
            total = Math.subtractExact(total,
                    Math.multiplyExact(12, Math.multiplyExact(Arith.powExact(mn, k - 1), a3[i])));
        }
        return total;
    }

    private static BigInteger combineBig(int k, long n, long s, long[] classSums, long[] nDivs, long[] a3,
            long a1Base, long a4) {
        BigInteger total = BigInteger.valueOf(a4);
        if (a1Base != 0) {
            total = total.add(BigInteger.valueOf(a1Base).multiply(BigInteger.valueOf(s).pow(k - 2)));
        }
        BigInteger bn = BigInteger.valueOf(n);
        for (int t = 0; t < classSums.length; t++) {
            if (classSums[t] == 0) {
                continue;
            }
            BigInteger bt = BigInteger.valueOf(t);
            BigInteger u0 = BigInteger.ZERO;
            BigInteger u1 = BigInteger.ONE;
            for (int j = 1; j < k - 1; j++) {
                BigInteger u2 = bt.multiply(u1).subtract(bn.multiply(u0));
                u0 = u1;
                u1 = u2;
            }
            BigInteger term = u1.multiply(BigInteger.valueOf(classSums[t]));
            total = total.subtract(t == 0 ? term : term.shiftLeft(1));
        }
        for (int i = 0; i < nDivs.length; i++) {
            if (a3[i] == 0) {
                continue;
            }
            long d = nDivs[i];
            BigInteger mn = BigInteger.valueOf(Math.min(d, n / d));
            total = total.subtract(mn.pow(k - 1).multiply(BigInteger.valueOf(12 * a3[i])));
        }
        return total;
    }

    /** U_j(t, n) with U_0 = 0, U_1 = 1, U_{i+1} = t U_i − n U_{i−1}; ArithmeticException on overflow. */
    static long lucasU(long t, long n, int j) {
        if (j == 0) {
            return 0;
        }
        long u0 = 0;
        long u1 = 1;
        for (int i = 1; i < j; i++) {
            long u2 = Math.subtractExact(Math.multiplyExact(t, u1), Math.multiplyExact(n, u0));
            u0 = u1;
            u1 = u2;
        }
        return u1;
    }

    /** The local factor a class-number sum is weighted by: μ(t, f, n), or its β-weighted sum over M | N. */
    private interface Weight {
        long at(long disc, long f);
    }

    /** Σ_f 12h_w((t² − 4n)/f²) · μ(t, f, n) for the level lv. */
    private long classSum(Level lv, long t, long n) {
        return weightedClassSum(lv, t, n, (disc, f) -> lv.mu(t, n, disc, f));
    }

    /** Σ_f 12h_w((t² − 4n)/f²) · Σ_{M | N} β(N/M) μ_M(t, f, n), for the level N of this instance. */
    private long newClassSum(long t, long n) {
        return weightedClassSum(level, t, n, (disc, f) -> level.betaWeightedMu(t, n, disc, f));
    }

    /** Σ_{f² | t² − 4n} 12h_w((t² − 4n)/f²) · weight(t² − 4n, f); only f sharing a prime with N need splitting. */
    private long weightedClassSum(Level lv, long t, long n, Weight weight) {
        long m = 4 * n - t * t;
        if (lv.n == 1) {
            return table.times12(m);
        }
        long disc = -m;
        long cond = table.conductor(m);
        if (cond == 0) {
            return 0;
        }
        if (Arith.gcd(cond, lv.n) == 1) {
            long mu = weight.at(disc, 1);
            return mu == 0 ? 0 : mu * table.times12(m);
        }
        long sum = 0;
        for (long f : Arith.divisors(Arith.factor(cond))) {
            long mu = weight.at(disc, f);
            if (mu != 0) {
                sum += mu * table.primitiveTimes12(m / (f * f));
            }
        }
        return sum;
    }

    /**
     * #{x mod p^a : p ∤ x, x² − t x + n ≡ 0 mod p^{a+b}} for a prime p, a ≥ 1, 0 ≤ b ≤ a, where
     * D = t² − 4n &lt; 0 and p^b divides some f with f² | D and D/f² ≡ 0, 1 mod 4 (the situation of μ(t, f, n)).
     *
     * <p>Method: for odd p, if p | n the only unit root class is x ≡ t (a simple root when p ∤ t); if
     * p ∤ D the roots are simple and Hensel-lift uniquely, giving 1 + (D/p); otherwise, with u = 2x − t,
     * count u mod p^a with u² ≡ D mod p^{a+b}. For p = 2 and t odd the roots 0, 1 mod 2 (present iff n is
     * even) are simple; for t even substitute u = x − t/2 and count u² ≡ D/4. Square roots modulo p^e of
     * an integer of valuation v: p^{⌊e/2⌋} if v ≥ e; none if v &lt; e is odd or the unit part is a
     * non-residue; else 2·p^{v/2} (odd p), and 2^{v/2}·(1, 2 or 4) for p = 2 (Ireland–Rosen, <i>A Classical
     * Introduction to Modern Number Theory</i>, §4.2–4.3). Solutions mod p^{a+b} are unions of classes mod
     * p^a, so dividing by p^b gives the count mod p^a.
     *
     * @param qr quadratic-residue table mod p (qr[r] true iff r is a nonzero square mod p), or null
     */
    static long localCount(long p, int a, int b, long t, long n, long disc, boolean[] qr) {
        int e = a + b;
        if (p == 2) {
            if ((t & 1) == 1) {
                return (n & 1) == 0 ? 1 : 0;
            }
            if ((n & 1) == 0) {
                return 0;
            }
            long m = disc / 4;
            int v = Arith.valuation(m, 2);
            long cnt;
            if (v >= e) {
                cnt = 1L << (e / 2);
            } else if ((v & 1) == 1) {
                return 0;
            } else {
                long unit = m >> v;
                int r = e - v;
                long sols;
                if (r == 1) {
                    sols = 1;
                } else if (r == 2) {
                    sols = Math.floorMod(unit, 4) == 1 ? 2 : 0;
                } else {
                    sols = Math.floorMod(unit, 8) == 1 ? 4 : 0;
                }
                cnt = sols << (v / 2);
            }
            return divideExactly(cnt, 1L << b);
        }
        if (n % p == 0) {
            return t % p != 0 ? 1 : 0;
        }
        long dm = Math.floorMod(disc, p);
        if (dm != 0) {
            return 1 + legendre(dm, p, qr);
        }
        int v = Arith.valuation(disc, p);
        long cnt;
        if (v >= e) {
            cnt = Arith.powExact(p, e / 2);
        } else if ((v & 1) == 1) {
            return 0;
        } else {
            long unit = disc / Arith.powExact(p, v);
            if (legendre(Math.floorMod(unit, p), p, qr) != 1) {
                return 0;
            }
            cnt = 2 * Arith.powExact(p, v / 2);
        }
        return divideExactly(cnt, Arith.powExact(p, b));
    }

    private static long divideExactly(long a, long b) {
        if (a % b != 0) {
            throw new IllegalStateException("root count " + a + " not divisible by " + b);
        }
        return a / b;
    }

    /** Legendre symbol (r/p) for odd prime p and 0 &lt; r &lt; p. */
    private static int legendre(long r, long p, boolean[] qr) {
        if (qr != null) {
            return qr[(int) r] ? 1 : -1;
        }
        return Arith.jacobi(r, p);
    }

    /** Per-level data: factorisation of M, ψ(M), quadratic-residue tables, and the τ-data for A3. */
    private static final class Level {
        final long n;
        final long psi;
        final long[] primes;
        final int[] exps;
        final boolean[][] qr;
        final long[] taus;
        final long[] tauGcds;
        final long[] tauPhis;

        Level(long n) {
            this.n = n;
            this.psi = Arith.psi(n);
            long[][] f = Arith.factor(n);
            primes = new long[f.length];
            exps = new int[f.length];
            qr = new boolean[f.length][];
            for (int i = 0; i < f.length; i++) {
                long p = f[i][0];
                primes[i] = p;
                exps[i] = (int) f[i][1];
                if (p != 2 && p <= QR_TABLE_LIMIT) {
                    boolean[] squares = new boolean[(int) p];
                    for (long x = 1; x < p; x++) {
                        squares[(int) (x * x % p)] = true;
                    }
                    qr[i] = squares;
                }
            }
            taus = Arith.divisors(f);
            tauGcds = new long[taus.length];
            tauPhis = new long[taus.length];
            for (int i = 0; i < taus.length; i++) {
                tauGcds[i] = Arith.gcd(taus[i], n / taus[i]);
                tauPhis[i] = Arith.phi(tauGcds[i]);
            }
        }

        /** Σ_{τ | M, (τ, M/τ) | d' − d, (d, τ) = 1, (d', M/τ) = 1} φ((τ, M/τ)) for d·d' = n. */
        long a3Inner(long d, long dPrime) {
            long s = 0;
            for (int i = 0; i < taus.length; i++) {
                long tau = taus[i];
                if ((dPrime - d) % tauGcds[i] == 0 && Arith.gcd(d, tau) == 1 && Arith.gcd(dPrime, n / tau) == 1) {
                    s += tauPhis[i];
                }
            }
            return s;
        }

        /** μ(t, f, n) = ψ(M)/ψ(M/M_f) · #{x mod M : (x, M) = 1, x² − tx + n ≡ 0 mod M·M_f}. */
        long mu(long t, long nn, long disc, long f) {
            long r = 1;
            for (int i = 0; i < primes.length; i++) {
                long c = localMu(i, exps[i], t, nn, disc, f);
                if (c == 0) {
                    return 0;
                }
                r *= c;
            }
            return r;
        }

        /**
         * Σ_{M | N} β(N/M) μ_M(t, f, n) = ∏_{p^a ‖ N} (μ_{p^a} − 2 μ_{p^{a−1}} + μ_{p^{a−2}}), terms with
         * negative exponent omitted and μ_{p^0} = 1 (β(1) = 1, β(p) = −2, β(p²) = 1).
         */
        long betaWeightedMu(long t, long nn, long disc, long f) {
            long r = 1;
            for (int i = 0; i < primes.length; i++) {
                int a = exps[i];
                long c = localMu(i, a, t, nn, disc, f);
                if (a >= 1) {
                    c -= 2 * (a == 1 ? 1 : localMu(i, a - 1, t, nn, disc, f));
                }
                if (a >= 2) {
                    c += (a == 2) ? 1 : localMu(i, a - 2, t, nn, disc, f);
                }
                if (c == 0) {
                    return 0;
                }
                r *= c;
            }
            return r;
        }

        /** The p-part of μ at level p^a (a ≥ 1) for the i-th prime p of this level. */
        private long localMu(int i, int a, long t, long nn, long disc, long f) {
            long p = primes[i];
            int b = (f == 1) ? 0 : Math.min(a, Arith.valuation(f, p));
            long c = localCount(p, a, b, t, nn, disc, qr[i]);
            if (c != 0 && b > 0) {
                // ψ(p^a)/ψ(p^{a−b})
                c *= (b == a) ? Arith.powExact(p, a - 1) * (p + 1) : Arith.powExact(p, b);
            }
            return c;
        }
    }
}
