package io.github.eigengate.theory.spaces;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.Arrays;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Traces of the Hecke operators T_n on S_k(Γ0(N), χ) by the Eichler–Selberg trace formula, summed over the Galois
 * orbit of χ, and on the new subspace for n coprime to N.
 *
 * <h2>The formula</h2>
 * We use Cohen's form of the trace formula with character, valid for every n ≥ 1 including (n, N) &gt; 1 and for
 * k ≥ 2 with χ(−1) = (−1)^k (H. Cohen, <i>Trace des opérateurs de Hecke sur Γ0(N)</i>, Séminaire de Théorie des
 * Nombres de Bordeaux 1976–1977, exposé no. 4, main theorem; restated in H. Cohen and F. Strömberg, <i>Modern
 * Analytic Theory of Modular Forms</i>, AMS GSM 179, §12.4 — section number from memory; J. Oesterlé, thèse de
 * troisième cycle, Paris 1977). For N = 1 it is Zagier's formula (appendix to S. Lang, <i>Introduction to Modular
 * Forms</i>, Grundlehren 222). With 𝔣 the conductor of χ, Tr(T_n | S_k(Γ0(N), χ)) = A1 + A2 + A3 + A4 where
 * <ul>
 *   <li>A1 = n^{k/2 − 1} χ(s) · (k − 1)/12 · ψ(N) if n = s² is a square, and 0 otherwise (χ(s) = 0 when
 *       (s, N) &gt; 1); ψ(N) = N ∏_{p | N}(1 + 1/p).</li>
 *   <li>A2 = −½ Σ_{t ∈ Z, t² &lt; 4n} U_{k−1}(t, n) Σ_f h_w((t² − 4n)/f²) · μ(t, f, n), where
 *       U_{k−1}(t, n) = (ρ^{k−1} − ρ̄^{k−1})/(ρ − ρ̄) for the roots ρ, ρ̄ of X² − tX + n,
 *       = Σ_j (−1)^j C(k−2−j, j) t^{k−2−2j} n^j; f runs over the positive integers with f² | t² − 4n and
 *       (t² − 4n)/f² ≡ 0, 1 mod 4; h_w(D) = h(D)/(w(D)/2) is the weighted class number of primitive forms of
 *       discriminant D; and
 *       <pre>μ(t, f, n) = ψ(N)/ψ(N/N_f) · Σ_{x mod N, x² − t x + n ≡ 0 mod N·N_f} χ(x),  N_f = (N, f).</pre>
 *       (The congruence mod N·N_f is well defined for x mod N because N_f | 2x − t.)</li>
 *   <li>A3 = −½ Σ_{d | n} min(d, n/d)^{k−1} Σ_τ φ((τ, N/τ)) χ(y_τ), the inner sum over τ | N with
 *       (τ, N/τ) | (N/𝔣, n/d − d), and y_τ defined mod lcm(τ, N/τ) by y_τ ≡ d mod τ, y_τ ≡ n/d mod N/τ
 *       (χ(y_τ) = 0 unless (d, τ) = 1 and (n/d, N/τ) = 1).</li>
 *   <li>A4 = Σ_{d | n, (N, n/d) = 1} d if k = 2 and χ is trivial, and 0 otherwise.</li>
 * </ul>
 * T_n for (n, N) &gt; 1 is the usual Hecke operator of level N (products of U_p at p | N).
 *
 * <h2>Exactness over Q(χ)</h2>
 * The values χ(x) are powers of ζ_m, m the order of χ, and everything else in the formula is rational, so the
 * trace lies in Z[ζ_m]. Galois conjugation of q-expansions maps S_k(N, χ) onto S_k(N, χ^σ) and commutes with T_n,
 * so Σ_{χ' ~ χ} Tr(T_n | S_k(N, χ')) = Tr_{Q(ζ_m)/Q} Tr(T_n | S_k(N, χ)); by linearity this is the formula with every
 * product of character values ζ_m^e replaced by the integer Tr_{Q(ζ_m)/Q}(ζ_m^e) = μ(m/g)·φ(m)/φ(m/g),
 * g = (e, m) (Ramanujan's sum). Products of values at different primes are formed on the exponents first, then
 * traced. For the trivial character nothing changes.
 *
 * <h2>Evaluation</h2>
 * Everything is multiplied by 24 and computed in integers: 24·A2 = −Σ_t U_{k−1}(t, n) Σ_f 12h_w · μ uses
 * the integers 12·h_w from {@link HurwitzClassNumbers}. When (F, N) = 1 for the conductor F of 4n − t²,
 * every f has N_f = 1 and the f-sum collapses to 12H(4n − t²)·μ(t, 1, n). The sum over x in μ is a product over
 * the prime powers p^a ‖ N (Chinese remainder theorem): at p ∤ 𝔣 a count of x mod p^a, p ∤ x, with
 * x² − tx + n ≡ 0 mod p^{a+b}, b = min(a, v_p(f)), in closed form ({@link #localCount}); at p | 𝔣 the roots
 * themselves (square roots mod p, Newton–Hensel lifting of simple roots, digit-by-digit search for multiple ones)
 * and the exponents of the p-component of χ at them. The terms at t and −t are equal (χ(−1) = (−1)^k), so t ≥ 0.
 * At high weight the values C(k−2−j, j)·t^{k−2−2j} are tabulated once per weight and reused for every n; the sums
 * Σ_t c_t·C·t^{k−2−2j} are accumulated in place in 32-bit words and combined by Horner's rule in n. The result
 * is checked to be an integer.
 *
 * <h2>New subspace</h2>
 * With χ_M the character mod M inducing the primitive character of χ (𝔣 | M | N), S_k(N, χ) = ⊕_M ⊕_{d | N/M}
 * S_k^new(M, χ_M)(dz), and for (n, N) = 1 the oldforms f(dz) carry the T_n-eigenvalue of f, so
 * Tr(T_n | S_k(N, χ)) = Σ_{𝔣 | M | N} σ0(N/M) Tr(T_n | S_k^new(M, χ_M)); inverting with β = μ * μ (the Dirichlet
 * inverse of σ0; G. Martin, J. Number Theory 112 (2005), §1) gives Tr(T_n | S_k^new(N, χ)) =
 * Σ_{𝔣 | M | N} β(N/M) Tr(T_n | S_k(M, χ_M)). For (n, N) &gt; 1 this fails (U_p does not act on the oldforms by the
 * eigenvalue of f), so {@link #newTrace} rejects such n. The β-weighted sum is not evaluated level by level: in A2
 * the sum over M of β(N/M)·μ_M factorises over the primes of N (both factors are multiplicative, and χ_M has the
 * p-components of χ), so one pass over t serves all divisor levels.
 *
 * <p>Instances are immutable and thread-safe (the per-weight tables are built once and shared).
 */
public final class TraceFormula {

    /** Primes up to this bound get a table of quadratic residues. */
    private static final long QR_TABLE_LIMIT = 1 << 16;
    /** Largest table of C·t^i values kept per weight, in 32-bit words; beyond it the recurrence is used per t. */
    private static final long GEGENBAUER_WORDS = 1L << 23;
    private static final long MASK = 0xFFFF_FFFFL;
    /** Coefficients c_t below this go through the word accumulators (c·word then stays below 2^62). */
    private static final long SMALL_COEFFICIENT = 1L << 30;

    private final DirichletCharacter character;
    private final Level level;
    private final Level[] divisorLevels;
    private final long[] divisorBetas;
    private final HurwitzClassNumbers table;
    private final ConcurrentHashMap<Integer, Gegenbauer> gegenbauer = new ConcurrentHashMap<>();

    private TraceFormula(DirichletCharacter character, Level level, Level[] divisorLevels, long[] divisorBetas,
                         HurwitzClassNumbers table) {
        this.character = character;
        this.level = level;
        this.divisorLevels = divisorLevels;
        this.divisorBetas = divisorBetas;
        this.table = table;
    }

    /**
     * The trivial character mod N: precomputes the level-dependent data for N and for every M | N with β(N/M) ≠ 0.
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
        return forCharacter(DirichletCharacter.trivial(level), table);
    }

    /**
     * The character χ mod N (N its modulus): precomputes the data for N and for every M with 𝔣 | M | N and
     * β(N/M) ≠ 0, with the character χ_M there.
     *
     * @throws NullPointerException if an argument is null
     */
    public static TraceFormula forCharacter(DirichletCharacter character, HurwitzClassNumbers table) {
        if (character == null) {
            throw new NullPointerException("character");
        }
        if (table == null) {
            throw new NullPointerException("table");
        }
        int n = character.modulus();
        DirichletCharacter chi = character.isTrivial() ? DirichletCharacter.trivial(n) : character;
        int cond = chi.conductor();
        long[] ramanujan = ramanujanSums(chi.order());
        long[] divs = Arith.divisors(Arith.factor(n / cond));
        int count = 0;
        for (long d : divs) {
            if (Arith.beta(n / cond / d) != 0) {
                count++;
            }
        }
        Level[] levels = new Level[count];
        long[] betas = new long[count];
        Level self = null;
        int i = 0;
        for (long d : divs) {
            long b = Arith.beta(n / cond / d);
            if (b != 0) {
                int m = (int) (d * cond);
                levels[i] = m == n ? new Level(m, chi, ramanujan) : new Level(m, chi.restrictTo(m), ramanujan);
                betas[i] = b;
                if (m == n) {
                    self = levels[i];
                }
                i++;
            }
        }
        return new TraceFormula(chi, self, levels, betas, table);
    }

    /** The level N. */
    public int level() {
        return (int) level.n;
    }

    /** The character χ mod N. */
    public DirichletCharacter character() {
        return character;
    }

    /**
     * Σ over the Galois orbit of χ of Tr(T_n | S_k(Γ0(N), χ')) (= Tr_{Q(χ)/Q}; for the trivial character the trace
     * itself), by Cohen's trace formula (see class comment).
     *
     * @param weight k ≥ 2 (the space is 0, and so the result, when χ(−1) ≠ (−1)^k)
     * @param n      n ≥ 1, with 4n ≤ the bound of the class-number table
     * @return the trace, an exact integer
     * @throws IllegalArgumentException if k &lt; 2, n &lt; 1, or 4n exceeds the class-number table
     * @throws IllegalStateException    if the formula produced a non-integer (a bug)
     */
    public BigInteger trace(int weight, long n) {
        checkArgs(weight, n);
        if (character.isOdd() != ((weight & 1) == 1)) {
            return BigInteger.ZERO;
        }
        long[] nDivs = divisorsOf(n);
        return exactDiv24(traceTimes24(level, weight, n, nDivs, false), level.n, weight, n);
    }

    /**
     * Σ over the Galois orbit of χ of Tr(T_n | S_k^new(Γ0(N), χ')) for (n, N) = 1,
     * = Σ_{𝔣 | M | N} β(N/M) Tr(T_n | S_k(Γ0(M), χ_M)) (see class comment).
     *
     * @param weight k ≥ 2 (the result is 0 when χ(−1) ≠ (−1)^k)
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
        if (character.isOdd() != ((weight & 1) == 1)) {
            return BigInteger.ZERO;
        }
        long[] nDivs = divisorsOf(n);
        return exactDiv24(newTraceTimes24(weight, n, nDivs), level.n, weight, n);
    }

    /**
     * The same as {@link #newTrace} for (n, N) = 1, evaluated naively as Σ_M β(N/M) Tr(T_n | S_k(M, χ_M)) with one
     * full trace formula per divisor level M; kept to cross-check the factorised evaluation in tests.
     */
    BigInteger newTraceBySummingLevels(int weight, long n) {
        if (character.isOdd() != ((weight & 1) == 1)) {
            return BigInteger.ZERO;
        }
        long[] nDivs = divisorsOf(n);
        BigInteger sum = BigInteger.ZERO;
        for (int i = 0; i < divisorLevels.length; i++) {
            Level m = divisorLevels[i];
            BigInteger tr = exactDiv24(traceTimes24(m, weight, n, nDivs, false), m.n, weight, n);
            sum = sum.add(tr.multiply(BigInteger.valueOf(divisorBetas[i])));
        }
        return sum;
    }

    /** {@link #trace} with A2 by the plain BigInteger recurrence for every t; kept to cross-check the tables. */
    BigInteger traceByRecurrence(int weight, long n) {
        checkArgs(weight, n);
        if (character.isOdd() != ((weight & 1) == 1)) {
            return BigInteger.ZERO;
        }
        long[] nDivs = divisorsOf(n);
        return exactDiv24(traceTimes24(level, weight, n, nDivs, true), level.n, weight, n);
    }

    /** The divisors of n, factoring by a shared smallest-prime-factor table (one per run, not per n). */
    private long[] divisorsOf(long n) {
        int[] spf = Arith.sharedSmallestPrimeFactors((int) Math.min(Integer.MAX_VALUE - 1, table.bound() / 4 + 1));
        if (n >= spf.length) {
            return Arith.divisors(Arith.factor(n));
        }
        long[][] f = new long[16][];
        int k = 0;
        int m = (int) n;
        while (m > 1) {
            int p = spf[m];
            int e = 0;
            while (m % p == 0) {
                m /= p;
                e++;
            }
            f[k++] = new long[] {p, e};
        }
        return Arith.divisors(Arrays.copyOf(f, k));
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

    /** Tr_{Q(ζ_m)/Q}(ζ_m^e) for 0 ≤ e &lt; m: Ramanujan's sum μ(m/g)·φ(m)/φ(m/g), g = (e, m). */
    static long[] ramanujanSums(int m) {
        long[] out = new long[m];
        long phi = Arith.phi(m);
        for (int e = 0; e < m; e++) {
            long q = m / Arith.gcd(e, m);
            out[e] = moebius(q) * (phi / Arith.phi(q));
        }
        return out;
    }

    private static long moebius(long q) {
        long r = 1;
        for (long[] pe : Arith.factor(q)) {
            if (pe[1] > 1) {
                return 0;
            }
            r = -r;
        }
        return r;
    }

    /** 24·Tr(T_n | S_k(M, χ_M)) summed over the orbit; {@code nDivs} are the divisors of n. */
    private BigInteger traceTimes24(Level lv, int k, long n, long[] nDivs, boolean plain) {
        int tMax = (int) Arith.isqrt(4 * n - 1);
        long[] classSums = new long[tMax + 1];
        Scratch scratch = lv.scratch();
        for (int t = 0; t <= tMax; t++) {
            classSums[t] = weightedClassSum(lv, t, n, false, scratch);
        }
        long[] a3 = new long[nDivs.length];
        for (int i = 0; i < nDivs.length; i++) {
            a3[i] = lv.a3Inner(nDivs[i], n / nDivs[i]);
        }
        long a1Base = 0;
        long s = Arith.isqrt(n);
        if (s * s == n) {
            a1Base = 2L * (k - 1) * lv.psi * lv.chiTrace(s);
        }
        long a4 = 0;
        if (k == 2 && lv.trivial) {
            for (long d : nDivs) {
                if (Arith.gcd(lv.n, n / d) == 1) {
                    a4 += 24 * d;
                }
            }
        }
        return combine(k, n, s, classSums, nDivs, a3, a1Base, a4, plain);
    }

    /**
     * 24·Σ_{𝔣 | M | N} β(N/M) Tr(T_n | S_k(M, χ_M)) for (n, N) = 1. A1, A3 and A4 are cheap and summed level by
     * level (with (n, N) = 1 their coprimality conditions on s, d, n/d hold automatically, and χ_M(s) = χ(s)). In A2
     * the β-weighted sum of μ_M(t, f, n) over M factorises over the primes of N, because β and the local sums are
     * multiplicative: Σ_M β(N/M) μ_M = ∏_{p^a ‖ N} Σ_{j} β(p^{a−j}) μ_{p^j}, j ≥ v_p(𝔣), μ_1 = 1. So one pass over t
     * serves all divisor levels.
     */
    private BigInteger newTraceTimes24(int k, long n, long[] nDivs) {
        int tMax = (int) Arith.isqrt(4 * n - 1);
        long[] classSums = new long[tMax + 1];
        Scratch scratch = level.scratch();
        for (int t = 0; t <= tMax; t++) {
            classSums[t] = weightedClassSum(level, t, n, true, scratch);
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
        a1Base = s * s != n ? 0 : a1Base * level.chiTrace(s);
        long a4 = 0;
        if (k == 2 && level.trivial && a4Weight != 0) {
            for (long d : nDivs) {
                a4 += 24 * d * a4Weight;
            }
        }
        return combine(k, n, s, classSums, nDivs, a3, a1Base, a4, false);
    }

    /** 24·Tr from its parts: A4 + A1 − Σ_t c_t U_{k−1}(t, n) − 12 Σ_d min(d, n/d)^{k−1} a3(d). */
    private BigInteger combine(int k, long n, long s, long[] classSums, long[] nDivs, long[] a3, long a1Base,
                               long a4, boolean plain) {
        BigInteger a2 = plain ? sumUByRecurrence(k, n, classSums) : sumU(k, n, classSums);
        long a3Abs = 0;
        for (long x : a3) {
            a3Abs = Math.addExact(a3Abs, Math.abs(x));
        }
        long small = Math.addExact(Math.addExact(Math.multiplyExact(12, a3Abs), Math.abs(a1Base)), Math.abs(a4));
        int bits = ((k - 1) * bitLength(n) + 1) / 2 + 1 + bitLength(small) + 2;
        if (bits <= 62) {
            // no overflow possible: min(d, n/d)^{k−1} ≤ n^{(k−1)/2} and s^{k−2} ≤ n^{(k−2)/2}
            long total = a4;
            if (a1Base != 0) {
                total += a1Base * Arith.powExact(s, k - 2);
            }
            for (int i = 0; i < nDivs.length; i++) {
                if (a3[i] != 0) {
                    long d = nDivs[i];
                    total -= 12 * Arith.powExact(Math.min(d, n / d), k - 1) * a3[i];
                }
            }
            return BigInteger.valueOf(total).subtract(a2);
        }
        BigInteger total = BigInteger.valueOf(a4);
        if (a1Base != 0) {
            total = total.add(BigInteger.valueOf(a1Base).multiply(BigInteger.valueOf(s).pow(k - 2)));
        }
        for (int i = 0; i < nDivs.length; i++) {
            if (a3[i] != 0) {
                long d = nDivs[i];
                BigInteger mn = BigInteger.valueOf(Math.min(d, n / d));
                total = total.subtract(mn.pow(k - 1).multiply(BigInteger.valueOf(12 * a3[i])));
            }
        }
        return total.subtract(a2);
    }

    private static int bitLength(long x) {
        return 64 - Long.numberOfLeadingZeros(x);
    }

    /**
     * Σ_{t ∈ Z, t² &lt; 4n} c_|t| U_{k−1}(t, n) = Σ_{t ≥ 0} c'_t U_{k−1}(t, n), c'_0 = c_0 and c'_t = 2c_t. In long
     * arithmetic when the bound |U_{k−1}(t, n)| ≤ (k − 1) n^{(k−2)/2} (|ρ| = √n) shows it cannot overflow; else
     * with the per-weight table of C(k−2−j, j) t^{k−2−2j}.
     */
    private BigInteger sumU(int k, long n, long[] c) {
        if (k == 2) {
            long sum = c[0];
            for (int t = 1; t < c.length; t++) {
                sum = Math.addExact(sum, Math.multiplyExact(2, c[t]));
            }
            return BigInteger.valueOf(sum);
        }
        long abs = Math.abs(c[0]);
        for (int t = 1; t < c.length; t++) {
            abs = Math.addExact(abs, Math.multiplyExact(2, Math.abs(c[t])));
        }
        if (abs == 0) {
            return BigInteger.ZERO;
        }
        int bitsU = bitLength(k - 1) + ((k - 2) * bitLength(n) + 1) / 2 + 1;
        if (bitsU + bitLength(abs) <= 62) {
            long sum = 0;
            for (int t = 0; t < c.length; t++) {
                if (c[t] != 0) {
                    long u0 = 0;
                    long u1 = 1;
                    for (int i = 1; i < k - 1; i++) {
                        long u2 = t * u1 - n * u0;
                        u0 = u1;
                        u1 = u2;
                    }
                    sum += (t == 0 ? 1 : 2) * c[t] * u1;
                }
            }
            return BigInteger.valueOf(sum);
        }
        Gegenbauer g = gegenbauer(k, c.length - 1);
        return g == null ? sumUByRecurrence(k, n, c) : g.sum(n, c, bitLength(abs));
    }

    private static BigInteger sumUByRecurrence(int k, long n, long[] c) {
        BigInteger sum = BigInteger.ZERO;
        for (int t = 0; t < c.length; t++) {
            if (c[t] != 0) {
                sum = sum.add(lucasUBig(t, n, k - 1).multiply(BigInteger.valueOf((t == 0 ? 1 : 2) * c[t])));
            }
        }
        return sum;
    }

    /** U_j(t, n) with U_0 = 0, U_1 = 1, U_{i+1} = t U_i − n U_{i−1}, in BigInteger. */
    static BigInteger lucasUBig(long t, long n, int j) {
        if (j == 0) {
            return BigInteger.ZERO;
        }
        BigInteger bt = BigInteger.valueOf(t);
        BigInteger bn = BigInteger.valueOf(n);
        BigInteger u0 = BigInteger.ZERO;
        BigInteger u1 = BigInteger.ONE;
        for (int i = 1; i < j; i++) {
            BigInteger u2 = bt.multiply(u1).subtract(bn.multiply(u0));
            u0 = u1;
            u1 = u2;
        }
        return u1;
    }

    /** The table for weight k covering 0 ≤ t ≤ tNeeded, built once (grown by doubling), or null if too large. */
    private Gegenbauer gegenbauer(int k, int tNeeded) {
        Gegenbauer g = gegenbauer.get(k);
        if (g != null && g.tMax >= tNeeded) {
            return g;
        }
        synchronized (gegenbauer) {
            g = gegenbauer.get(k);
            if (g != null && g.tMax >= tNeeded) {
                return g;
            }
            int tableMax = (int) Arith.isqrt(Math.max(0, table.bound() - 1));
            int tMax = Math.max(tNeeded, Math.min(tableMax, g == null ? 2 * tNeeded : 2 * g.tMax));
            if (!Gegenbauer.affordable(k, tMax)) {
                tMax = tNeeded;
                if (!Gegenbauer.affordable(k, tMax)) {
                    return null;
                }
            }
            g = new Gegenbauer(k, tMax);
            gegenbauer.put(k, g);
            return g;
        }
    }

    /**
     * |C(k−2−j, j)·t^{k−2−2j}| for 0 ≤ t ≤ tMax, 0 ≤ j ≤ ⌊(k−2)/2⌋, in little-endian 32-bit words, so that
     * U_{k−1}(t, n) = Σ_j (−1)^j C(k−2−j, j) t^{k−2−2j} n^j (expand (ρ^{k−1} − ρ̄^{k−1})/(ρ − ρ̄) in ρ + ρ̄ = t,
     * ρρ̄ = n; the Chebyshev polynomial of the second kind, homogenised). Immutable.
     */
    private static final class Gegenbauer {
        final int weight;
        final int tMax;
        final int terms;
        final int[][][] words;
        final int maxLen;

        static boolean affordable(int k, int tMax) {
            long perEntry = ((long) (k - 2) * (1 + bitLength(tMax))) / 32 + 1;
            return (tMax + 1L) * ((k - 2) / 2 + 1) * perEntry <= GEGENBAUER_WORDS;
        }

        Gegenbauer(int k, int tMax) {
            this.weight = k;
            this.tMax = tMax;
            this.terms = (k - 2) / 2 + 1;
            BigInteger[] binom = new BigInteger[terms];
            for (int j = 0; j < terms; j++) {
                binom[j] = binomial(k - 2 - j, j);
            }
            words = new int[tMax + 1][terms][];
            int longest = 0;
            for (int t = 0; t <= tMax; t++) {
                BigInteger bt = BigInteger.valueOf(t);
                for (int j = 0; j < terms; j++) {
                    int e = k - 2 - 2 * j;
                    BigInteger v = binom[j].multiply(bt.pow(e));
                    words[t][j] = toWords(v);
                    longest = Math.max(longest, words[t][j].length);
                }
            }
            maxLen = longest;
        }

        private static BigInteger binomial(int a, int b) {
            BigInteger r = BigInteger.ONE;
            for (int i = 0; i < b; i++) {
                r = r.multiply(BigInteger.valueOf(a - i)).divide(BigInteger.valueOf(i + 1));
            }
            return r;
        }

        /** Σ_t c'_t U_{k−1}(t, n), c'_0 = c_0, c'_t = 2c_t; {@code bitsC} bounds log2 Σ|c'_t|. */
        BigInteger sum(long n, long[] c, int bitsC) {
            int len = maxLen + bitsC / 32 + 2;
            long[][] pos = new long[terms][len];
            long[][] neg = new long[terms][len];
            BigInteger slow = BigInteger.ZERO;
            for (int t = 0; t < c.length; t++) {
                if (c[t] == 0) {
                    continue;
                }
                long ct = (t == 0 ? 1 : 2) * c[t];
                long abs = Math.abs(ct);
                if (abs >= SMALL_COEFFICIENT) {
                    slow = slow.add(lucasUBig(t, n, weight - 1).multiply(BigInteger.valueOf(ct)));
                    continue;
                }
                int[][] row = words[t];
                for (int j = 0; j < terms; j++) {
                    int[] w = row[j];
                    if (w.length != 0) {
                        addMul(((j & 1) == 1) != (ct < 0) ? neg[j] : pos[j], w, abs);
                    }
                }
            }
            int hornerLen = len + ((terms - 1) * bitLength(n)) / 32 + 2;
            long[] hp = new long[hornerLen];
            long[] hn = new long[hornerLen];
            int topP = 0;
            int topN = 0;
            for (int j = terms - 1; j >= 0; j--) {
                topP = addInto(hp, pos[j], mulSmall(hp, n, topP));
                topN = addInto(hn, neg[j], mulSmall(hn, n, topN));
            }
            return toBig(hp).subtract(toBig(hn)).add(slow);
        }
    }

    // --- non-negative integers in little-endian 32-bit words held in longs (each word < 2^32) ---

    /** The magnitude of v in little-endian 32-bit words (empty for 0). */
    static int[] toWords(BigInteger v) {
        BigInteger a = v.abs();
        int len = (a.bitLength() + 31) / 32;
        int[] w = new int[len];
        for (int i = 0; i < len; i++) {
            w[i] = a.shiftRight(32 * i).intValue();
        }
        return w;
    }

    /** acc += c·w for 0 ≤ c &lt; 2^30 (so every c·word + word + carry stays below 2^63). */
    static void addMul(long[] acc, int[] w, long c) {
        long carry = 0;
        int i = 0;
        for (; i < w.length; i++) {
            long v = acc[i] + c * (w[i] & MASK) + carry;
            acc[i] = v & MASK;
            carry = v >>> 32;
        }
        while (carry != 0) {
            long v = acc[i] + carry;
            acc[i] = v & MASK;
            carry = v >>> 32;
            i++;
        }
    }

    /** acc *= n for 0 ≤ n &lt; 2^31, acc[top..] = 0; returns the new bound on the used words. */
    static int mulSmall(long[] acc, long n, int top) {
        long carry = 0;
        for (int i = 0; i < top; i++) {
            long v = acc[i] * n + carry;
            acc[i] = v & MASK;
            carry = v >>> 32;
        }
        while (carry != 0) {
            acc[top++] = carry & MASK;
            carry >>>= 32;
        }
        return top;
    }

    /** acc *= n for 0 ≤ n &lt; 2^31. */
    static void mulSmall(long[] acc, long n) {
        mulSmall(acc, n, acc.length);
    }

    /** acc += b for acc with words used below {@code top}; returns the new bound on the used words. */
    static int addInto(long[] acc, long[] b, int top) {
        int used = b.length;
        while (used > 0 && b[used - 1] == 0) {
            used--;
        }
        long carry = 0;
        int i = 0;
        for (; i < used; i++) {
            long v = acc[i] + b[i] + carry;
            acc[i] = v & MASK;
            carry = v >>> 32;
        }
        while (carry != 0) {
            long v = acc[i] + carry;
            acc[i] = v & MASK;
            carry = v >>> 32;
            i++;
        }
        return Math.max(top, i);
    }

    static BigInteger toBig(long[] acc) {
        int top = acc.length;
        while (top > 0 && acc[top - 1] == 0) {
            top--;
        }
        byte[] bytes = new byte[4 * top + 1];
        for (int i = 0; i < top; i++) {
            long w = acc[i];
            int at = bytes.length - 1 - 4 * i;
            bytes[at] = (byte) w;
            bytes[at - 1] = (byte) (w >>> 8);
            bytes[at - 2] = (byte) (w >>> 16);
            bytes[at - 3] = (byte) (w >>> 24);
        }
        return new BigInteger(bytes);
    }

    /**
     * Σ_{f² | t² − 4n} 12h_w((t² − 4n)/f²) · w(f), w = the orbit trace of μ(t, f, n) or of its β-weighted sum over
     * the divisor levels; only f sharing a prime with N need splitting.
     */
    private long weightedClassSum(Level lv, long t, long n, boolean beta, Scratch scratch) {
        long m = 4 * n - t * t;
        if (lv.n == 1) {
            return table.times12(m);
        }
        long disc = -m;
        long cond = table.conductor(m);
        if (cond == 0) {
            return 0;
        }
        if (lv.coprimeToLevel(cond)) {
            long mu = beta ? lv.betaWeightedMu(t, n, disc, 1, scratch) : lv.mu(t, n, disc, 1, scratch);
            return mu == 0 ? 0 : mu * table.times12(m);
        }
        long sum = 0;
        for (long f : Divisors.of((int) cond)) {
            long mu = beta ? lv.betaWeightedMu(t, n, disc, f, scratch) : lv.mu(t, n, disc, f, scratch);
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

    /** Divisor lists of small integers (conductors f ≤ √(4n) of discriminants), computed once and shared. */
    private static final class Divisors {
        private static volatile long[][] lists = new long[0][];

        static long[] of(int f) {
            long[][] l = lists;
            if (f >= l.length) {
                synchronized (Divisors.class) {
                    l = lists;
                    if (f >= l.length) {
                        int size = Math.max(f + 1, Math.max(256, 2 * l.length));
                        long[][] grown = Arrays.copyOf(l, size);
                        for (int i = Math.max(1, l.length); i < size; i++) {
                            grown[i] = Arith.divisors(Arith.factor(i));
                        }
                        lists = grown;
                        l = grown;
                    }
                }
            }
            return l[f];
        }
    }

    /**
     * Sparse elements Σ c_i ζ_m^{e_i} of Z[ζ_m], one slot per prime of the conductor; reused within one evaluation
     * (not shared between threads).
     */
    private static final class Scratch {
        static final Scratch NONE = new Scratch(0);
        final int[][] e;
        final long[][] c;
        final int[] size;

        Scratch(int slots) {
            e = new int[slots][8];
            c = new long[slots][8];
            size = new int[slots];
        }

        void add(int slot, int exponent, long coefficient) {
            int s = size[slot];
            if (s == e[slot].length) {
                e[slot] = Arrays.copyOf(e[slot], 2 * s);
                c[slot] = Arrays.copyOf(c[slot], 2 * s);
            }
            e[slot][s] = exponent;
            c[slot][s] = coefficient;
            size[slot] = s + 1;
        }
    }

    /**
     * Per-level data: factorisation of M, ψ(M), quadratic-residue tables, the τ-data for A3, and for the primes of
     * the conductor of χ_M the exponents of χ's p-component and square roots mod p.
     */
    private static final class Level {
        final long n;
        final long psi;
        final boolean trivial;
        final DirichletCharacter chi;
        final int order;
        final long[] ramanujan;
        final long[] primes;
        final int[] exps;
        final boolean[][] qr;
        /** v_p(𝔣); for these primes (condExp &gt; 0) the roots are enumerated. */
        final int[] condExp;
        /** slot[i] = index of prime i among the conductor primes, or −1. */
        final int[] slot;
        final int slots;
        /** chiP[i][x] = exponent of χ at the unit ≡ x mod p^a, ≡ 1 mod M/p^a; −1 for p | x. */
        final int[][] chiP;
        /** sqrtP[i][r] = some s with s² ≡ r mod p, −1 if none (odd p of the conductor). */
        final int[][] sqrtP;
        final long[][] pw;
        final long[] taus;
        final long[] tauGcds;
        final long[] tauPhis;
        final boolean[] tauAllowed;
        final long[] tauInverse;
        /** Bit i set when the i-th prime of M divides τ (resp. M/τ). */
        final long[] tauMask;
        final long[] coTauMask;
        /** coprime[f] = ((f, M) = 1); grown on demand (a benign race: every version is correct). */
        private volatile boolean[] coprime = new boolean[0];

        Level(long n, DirichletCharacter chi, long[] ramanujan) {
            this.n = n;
            this.psi = Arith.psi(n);
            this.chi = chi;
            this.trivial = chi.isTrivial();
            this.order = chi.order();
            this.ramanujan = ramanujan;
            long[][] f = Arith.factor(n);
            int cond = chi.conductor();
            primes = new long[f.length];
            exps = new int[f.length];
            qr = new boolean[f.length][];
            condExp = new int[f.length];
            slot = new int[f.length];
            chiP = new int[f.length][];
            sqrtP = new int[f.length][];
            pw = new long[f.length][];
            int s = 0;
            for (int i = 0; i < f.length; i++) {
                long p = f[i][0];
                primes[i] = p;
                exps[i] = (int) f[i][1];
                pw[i] = new long[2 * exps[i] + 1];
                pw[i][0] = 1;
                for (int j = 1; j < pw[i].length; j++) {
                    pw[i][j] = pw[i][j - 1] * p;
                }
                if (p != 2 && p <= QR_TABLE_LIMIT) {
                    boolean[] squares = new boolean[(int) p];
                    for (long x = 1; x < p; x++) {
                        squares[(int) (x * x % p)] = true;
                    }
                    qr[i] = squares;
                }
                condExp[i] = Arith.valuation(cond, p);
                slot[i] = -1;
                if (condExp[i] > 0) {
                    slot[i] = s++;
                    chiP[i] = componentExponents(chi, p, pw[i][exps[i]]);
                    if (p != 2) {
                        int[] roots = new int[(int) p];
                        Arrays.fill(roots, -1);
                        for (long x = 0; x <= p / 2; x++) {
                            roots[(int) (x * x % p)] = (int) x;
                        }
                        sqrtP[i] = roots;
                    }
                }
            }
            slots = s;
            taus = Arith.divisors(f);
            tauGcds = new long[taus.length];
            tauPhis = new long[taus.length];
            tauAllowed = new boolean[taus.length];
            tauInverse = new long[taus.length];
            tauMask = new long[taus.length];
            coTauMask = new long[taus.length];
            for (int i = 0; i < taus.length; i++) {
                long tau = taus[i];
                tauMask[i] = mask(tau);
                coTauMask[i] = mask(n / tau);
                long sigma = n / tau;
                long g = Arith.gcd(tau, sigma);
                tauGcds[i] = g;
                tauPhis[i] = Arith.phi(g);
                tauAllowed[i] = (n / cond) % g == 0;
                long mod = sigma / g;
                tauInverse[i] = mod == 1 ? 0 : BigInteger.valueOf(tau / g % mod).modInverse(BigInteger.valueOf(mod))
                        .longValue();
            }
        }

        private static int[] componentExponents(DirichletCharacter chi, long p, long q) {
            long rest = chi.modulus() / q;
            long inv = rest == 1 ? 0 : BigInteger.valueOf(q).modInverse(BigInteger.valueOf(rest)).longValue();
            int[] out = new int[(int) q];
            for (long x = 0; x < q; x++) {
                if (x % p == 0) {
                    out[(int) x] = -1;
                    continue;
                }
                // y ≡ x mod q, y ≡ 1 mod rest
                long y = rest == 1 ? x : x + q * Math.floorMod((1 - x) % rest * inv % rest, rest);
                out[(int) x] = chi.exponent(y);
            }
            return out;
        }

        Scratch scratch() {
            return slots == 0 ? Scratch.NONE : new Scratch(slots);
        }

        /** Whether (f, M) = 1, from a table for the conductors f ≤ √(4n) of the discriminants met. */
        boolean coprimeToLevel(long f) {
            boolean[] c = coprime;
            if (f >= c.length) {
                boolean[] grown = new boolean[(int) Math.max(f + 1, 2L * c.length)];
                for (int i = 1; i < grown.length; i++) {
                    grown[i] = mask(i) == 0;
                }
                coprime = grown;
                c = grown;
            }
            return c[(int) f];
        }

        /** The primes of M (by position) dividing x, as bits (M has at most 15 primes). */
        long mask(long x) {
            long m = 0;
            for (int i = 0; i < primes.length; i++) {
                if (x % primes[i] == 0) {
                    m |= 1L << i;
                }
            }
            return m;
        }

        /** The exponent of χ at a unit y mod M: the sum of its p-components over the primes of the conductor. */
        int exponentOfUnit(long y) {
            long e = 0;
            for (int i = 0; i < primes.length; i++) {
                if (slot[i] >= 0) {
                    e += chiP[i][(int) Math.floorMod(y, pw[i][exps[i]])];
                }
            }
            return (int) (e % order);
        }

        /** Tr_{Q(ζ_m)/Q} χ(s) (0 when (s, M) &gt; 1). */
        long chiTrace(long s) {
            if (mask(s) != 0) {
                return 0;
            }
            return trivial ? 1 : ramanujan[exponentOfUnit(s)];
        }

        /**
         * Tr of Σ_{τ | M, (τ, M/τ) | (M/𝔣, d' − d)} φ((τ, M/τ)) χ(y_τ), y_τ ≡ d mod τ, y_τ ≡ d' mod M/τ, for d·d' = n.
         */
        long a3Inner(long d, long dPrime) {
            long s = 0;
            long dMask = mask(d);
            long dPrimeMask = mask(dPrime);
            for (int i = 0; i < taus.length; i++) {
                long tau = taus[i];
                long g = tauGcds[i];
                if (!tauAllowed[i] || (dMask & tauMask[i]) != 0 || (dPrimeMask & coTauMask[i]) != 0
                        || (dPrime - d) % g != 0) {
                    continue;
                }
                if (trivial) {
                    s += tauPhis[i];
                    continue;
                }
                long mod = n / tau / g;
                long k = mod == 1 ? 0 : Math.floorMod((dPrime - d) / g % mod * tauInverse[i] % mod, mod);
                long y = Math.floorMod(d, n) + tau * k;
                s += tauPhis[i] * ramanujan[exponentOfUnit(y)];
            }
            return s;
        }

        /** Tr of μ(t, f, n) = ψ(M)/ψ(M/M_f) · Σ_{x mod M, x² − tx + n ≡ 0 mod M·M_f} χ(x). */
        long mu(long t, long nn, long disc, long f, Scratch sc) {
            long r = 1;
            for (int i = 0; i < slots; i++) {
                sc.size[i] = 0;
            }
            for (int i = 0; i < primes.length; i++) {
                int a = exps[i];
                if (slot[i] < 0) {
                    long c = localMu(i, a, t, nn, disc, f);
                    if (c == 0) {
                        return 0;
                    }
                    r *= c;
                } else {
                    int b = bOf(i, a, f);
                    chiRoots(i, a, b, t, nn, disc, sc, ratio(i, a, b));
                    if (sc.size[slot[i]] == 0) {
                        return 0;
                    }
                }
            }
            return slots == 0 ? r : r * traceOfProduct(sc);
        }

        /**
         * Tr of Σ_{𝔣 | M' | M} β(M/M') μ_{M'}(t, f, n) = ∏_{p^a ‖ M} Σ_j β(p^{a−j}) μ_{p^j}, j from max(v_p(𝔣), a − 2)
         * to a, μ_{p^0} = 1 (β(1) = 1, β(p) = −2, β(p²) = 1).
         */
        long betaWeightedMu(long t, long nn, long disc, long f, Scratch sc) {
            long r = 1;
            for (int i = 0; i < slots; i++) {
                sc.size[i] = 0;
            }
            for (int i = 0; i < primes.length; i++) {
                int a = exps[i];
                if (slot[i] < 0) {
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
                } else {
                    for (int j = Math.max(condExp[i], a - 2); j <= a; j++) {
                        long beta = (a - j == 1) ? -2 : 1;
                        int b = bOf(i, j, f);
                        chiRoots(i, j, b, t, nn, disc, sc, beta * ratio(i, j, b));
                    }
                    if (sc.size[slot[i]] == 0) {
                        return 0;
                    }
                }
            }
            return slots == 0 ? r : r * traceOfProduct(sc);
        }

        private int bOf(int i, int a, long f) {
            return f == 1 ? 0 : Math.min(a, Arith.valuation(f, primes[i]));
        }

        /** ψ(p^a)/ψ(p^{a−b}). */
        private long ratio(int i, int a, int b) {
            if (b == 0) {
                return 1;
            }
            return b == a ? pw[i][a - 1] * (primes[i] + 1) : pw[i][b];
        }

        /** Tr_{Q(ζ_m)/Q} of the product of the slots' elements (expanded term by term, traced at the end). */
        private long traceOfProduct(Scratch sc) {
            if (slots == 1) {
                int[] e = sc.e[0];
                long[] c = sc.c[0];
                long tr = 0;
                for (int x = 0; x < sc.size[0]; x++) {
                    tr += c[x] * ramanujan[e[x]];
                }
                return tr;
            }
            if (slots == 2) {
                long tr = 0;
                for (int x = 0; x < sc.size[0]; x++) {
                    int ex = sc.e[0][x];
                    long cx = sc.c[0][x];
                    for (int y = 0; y < sc.size[1]; y++) {
                        int sum = ex + sc.e[1][y];
                        tr += cx * sc.c[1][y] * ramanujan[sum >= order ? sum - order : sum];
                    }
                }
                return tr;
            }
            if (slots == 3) {
                long tr = 0;
                for (int x = 0; x < sc.size[0]; x++) {
                    for (int y = 0; y < sc.size[1]; y++) {
                        int exy = sc.e[0][x] + sc.e[1][y];
                        exy = exy >= order ? exy - order : exy;
                        long cxy = sc.c[0][x] * sc.c[1][y];
                        for (int z = 0; z < sc.size[2]; z++) {
                            int sum = exy + sc.e[2][z];
                            tr += cxy * sc.c[2][z] * ramanujan[sum >= order ? sum - order : sum];
                        }
                    }
                }
                return tr;
            }
            return traceFrom(sc, 0, 0, 1);
        }

        private long traceFrom(Scratch sc, int s, int exponent, long coefficient) {
            if (s == slots) {
                return coefficient * ramanujan[exponent];
            }
            long tr = 0;
            int[] e = sc.e[s];
            long[] c = sc.c[s];
            for (int x = 0; x < sc.size[s]; x++) {
                int sum = exponent + e[x]; // both in [0, order)
                tr += traceFrom(sc, s + 1, sum >= order ? sum - order : sum, coefficient * c[x]);
            }
            return tr;
        }

        /**
         * Appends coefficient·ζ^{e(x)} for every unit root x mod p^j of x² − tx + n ≡ 0 mod p^{j+b} (j ≥ v_p(𝔣) ≥ 1),
         * e(x) the exponent of χ's p-component at x. Simple roots: square root mod p, then Newton–Hensel lifting;
         * multiple roots (p | 2x − t): digit-by-digit search, pruned by x² − tx + n ≡ 0 mod p^i at the i-th digit.
         */
        private void chiRoots(int i, int j, int b, long t, long nn, long disc, Scratch sc, long coefficient) {
            long p = primes[i];
            long q = pw[i][j];
            long qe = pw[i][j + b];
            int[] table = chiP[i];
            int at = slot[i];
            if (p != 2) {
                long inv2 = (p + 1) / 2;
                long dm = Math.floorMod(disc, p);
                if (dm != 0) {
                    int sq = sqrtP[i][(int) dm];
                    if (sq < 0) {
                        return;
                    }
                    long tm = t % p; // t ≥ 0
                    for (int sign = -1; sign <= 1; sign += 2) {
                        long u = tm + sign * sq;
                        u = u < 0 ? u + p : (u >= p ? u - p : u);
                        long x0 = (u & 1) == 0 ? u >> 1 : (u + p) >> 1; // u/2 mod p
                        if (x0 != 0) {
                            sc.add(at, table[(int) (j == 1 ? x0 : hensel(x0, p, q, t, nn))], coefficient);
                        }
                    }
                    return;
                }
                long x0 = Math.floorMod(t, p) * inv2 % p;
                if (x0 != 0) {
                    search(x0, p, j, qe, t, nn, table, sc, at, coefficient);
                }
                return;
            }
            if (Math.floorMod(1 - t + nn, 2) != 0) {
                return;
            }
            if ((t & 1) == 1) {
                sc.add(at, table[(int) (j == 1 ? 1 : hensel(1, 2, q, t, nn))], coefficient);
                return;
            }
            search(1, 2, j, qe, t, nn, table, sc, at, coefficient);
        }

        /** The root mod q = p^j lifting the simple root x0 mod p of x² − tx + n (Newton: precision doubles). */
        private static long hensel(long x0, long p, long q, long t, long nn) {
            long x = x0;
            long mod = p;
            while (mod < q) {
                mod = mod > q / mod ? q : mod * mod;
                long gx = Math.floorMod(x * x - t * x + nn, mod);
                long d = Math.floorMod(2 * x - t, mod);
                long inv = BigInteger.valueOf(d).modInverse(BigInteger.valueOf(mod)).longValue();
                x = Math.floorMod(x - gx * inv % mod, mod);
            }
            return x;
        }

        private static void search(long x0, long p, int j, long qe, long t, long nn, int[] table, Scratch sc, int at,
                                   long coefficient) {
            if (j == 1) {
                // x0 ≡ t/2 is a root mod p (its value is −D/4 ≡ 0); mod p^{1+b} it must be tested
                if (qe == p || Math.floorMod(x0 * x0 - t * x0 + nn, qe) == 0) {
                    sc.add(at, table[(int) x0], coefficient);
                }
                return;
            }
            long[] cur = {x0};
            int size = 1;
            long mod = p;
            for (int level = 2; level <= j; level++) {
                long next = mod * p;
                long[] grown = new long[(int) Math.min((long) size * p, Integer.MAX_VALUE - 8)];
                int k = 0;
                for (int c = 0; c < size; c++) {
                    for (long y = 0; y < p; y++) {
                        long z = cur[c] + y * mod;
                        if (Math.floorMod(z * z - t * z + nn, next) == 0) {
                            grown[k++] = z;
                        }
                    }
                }
                cur = grown;
                size = k;
                mod = next;
                if (size == 0) {
                    return;
                }
            }
            for (int c = 0; c < size; c++) {
                long x = cur[c];
                if (Math.floorMod(x * x - t * x + nn, qe) == 0) {
                    sc.add(at, table[(int) x], coefficient);
                }
            }
        }

        /** The p-part of μ at level p^a (a ≥ 1) for the i-th prime p of this level (p ∤ 𝔣). */
        private long localMu(int i, int a, long t, long nn, long disc, long f) {
            long p = primes[i];
            int b = (f == 1) ? 0 : Math.min(a, Arith.valuation(f, p));
            long c = localCount(p, a, b, t, nn, disc, qr[i]);
            return c == 0 || b == 0 ? c : c * ratio(i, a, b);
        }
    }
}
