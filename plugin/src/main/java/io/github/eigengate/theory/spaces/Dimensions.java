package io.github.eigengate.theory.spaces;

import io.github.eigengate.theory.Arith;

/**
 * Dimensions of spaces of cusp forms of integral weight k ≥ 2 for Γ0(N) with trivial character.
 *
 * <p>Notation (Diamond–Shurman, <i>A First Course in Modular Forms</i>, GTM 228, §3.9, Figure 3.4
 * and Corollary 3.7.2; the dimension formula is Theorem 3.5.1 combined with Riemann–Roch, §3.5–3.6):
 * <ul>
 *   <li>μ = ψ(N) = N ∏_{p | N}(1 + 1/p), the index of ±Γ0(N) in SL_2(Z) modulo ±1;</li>
 *   <li>ε2 = ∏_{p | N}(1 + (−1/p)) if 4 ∤ N, else 0 — the number of elliptic points of period 2;</li>
 *   <li>ε3 = ∏_{p | N}(1 + (−3/p)) if 9 ∤ N, else 0 — the number of elliptic points of period 3;</li>
 *   <li>ε∞ = Σ_{d | N} φ(gcd(d, N/d)) — the number of cusps;</li>
 *   <li>g = 1 + μ/12 − ε2/4 − ε3/3 − ε∞/2 — the genus of X0(N).</li>
 * </ul>
 * Here (−1/2) = 0 and (−3/3) = 0 (Kronecker symbols). Then dim S_2(Γ0(N)) = g, and for even k ≥ 4
 * <pre>
 *   dim S_k(Γ0(N)) = (k − 1)(g − 1) + (k/2 − 1) ε∞ + ⌊k/4⌋ ε2 + ⌊k/3⌋ ε3.
 * </pre>
 * For odd k the space is 0 since −I ∈ Γ0(N) acts by (−1)^k.
 *
 * <p>The new subspace: by Atkin–Lehner theory, S_k(Γ0(N)) = ⊕_{M | N} ⊕_{d | N/M} S_k^new(M)(dz), so
 * dim S_k(N) = Σ_{M | N} σ0(N/M) dim S_k^new(M); Möbius-inverting with the Dirichlet inverse β = μ * μ
 * of σ0 gives dim S_k^new(N) = Σ_{M | N} β(N/M) dim S_k(M), where β is multiplicative with
 * β(p) = −2, β(p²) = 1, β(p^e) = 0 for e ≥ 3 (G. Martin, <i>Dimensions of the spaces of cusp forms and
 * newforms on Γ0(N) and Γ1(N)</i>, J. Number Theory 112 (2005), 298–331, §1).
 *
 * <p>Weight 1 is not supported: its dimension is not given by a Riemann–Roch formula.
 */
public final class Dimensions {

    private Dimensions() {
    }

    /**
     * dim S_k(Γ0(N)) with trivial character.
     *
     * @param level  N ≥ 1
     * @param weight k ≥ 2
     * @return the dimension (0 for odd k)
     * @throws IllegalArgumentException if level &lt; 1 or weight &lt; 2
     */
    public static long cuspForms(int level, int weight) {
        check(level, weight);
        if ((weight & 1) == 1) {
            return 0;
        }
        long[][] f = Arith.factor(level);
        long e2 = epsilon2(level, f);
        long e3 = epsilon3(level, f);
        long einf = cusps(level, f);
        long g = genus(level, f, e2, e3, einf);
        if (weight == 2) {
            return g;
        }
        long k = weight;
        return (k - 1) * (g - 1) + (k / 2 - 1) * einf + (k / 4) * e2 + (k / 3) * e3;
    }

    /**
     * dim S_k^new(Γ0(N)) with trivial character, = Σ_{M | N} β(N/M) dim S_k(Γ0(M)) (see class comment).
     *
     * @param level  N ≥ 1
     * @param weight k ≥ 2
     * @return the dimension of the new subspace (0 for odd k)
     * @throws IllegalArgumentException if level &lt; 1 or weight &lt; 2
     */
    public static long newforms(int level, int weight) {
        check(level, weight);
        long sum = 0;
        for (long m : Arith.divisors(Arith.factor(level))) {
            long b = Arith.beta(level / m);
            if (b != 0) {
                sum += b * cuspForms((int) m, weight);
            }
        }
        return sum;
    }

    /**
     * The genus of the modular curve X0(N), g = 1 + μ/12 − ε2/4 − ε3/3 − ε∞/2 (Diamond–Shurman,
     * Theorem 3.1.1 and Figure 3.4); equals dim S_2(Γ0(N)).
     *
     * @throws IllegalArgumentException if level &lt; 1
     */
    public static long genus(int level) {
        if (level < 1) {
            throw new IllegalArgumentException("level must be >= 1, got " + level);
        }
        long[][] f = Arith.factor(level);
        return genus(level, f, epsilon2(level, f), epsilon3(level, f), cusps(level, f));
    }

    private static long genus(long n, long[][] f, long e2, long e3, long einf) {
        long twelveG = 12 + Arith.psi(n) - 3 * e2 - 4 * e3 - 6 * einf;
        if (twelveG % 12 != 0) {
            throw new IllegalStateException("12g = " + twelveG + " not divisible by 12 for N = " + n);
        }
        return twelveG / 12;
    }

    /** ε2(Γ0(N)): number of elliptic points of period 2. */
    static long epsilon2(long n, long[][] f) {
        if (n % 4 == 0) {
            return 0;
        }
        long r = 1;
        for (long[] pe : f) {
            long p = pe[0];
            // 1 + (−1/p): 1 for p = 2, 2 for p ≡ 1 mod 4, 0 for p ≡ 3 mod 4
            r *= (p == 2) ? 1 : (p % 4 == 1 ? 2 : 0);
        }
        return r;
    }

    /** ε3(Γ0(N)): number of elliptic points of period 3. */
    static long epsilon3(long n, long[][] f) {
        if (n % 9 == 0) {
            return 0;
        }
        long r = 1;
        for (long[] pe : f) {
            long p = pe[0];
            // 1 + (−3/p): 1 for p = 3, 2 for p ≡ 1 mod 3, 0 for p ≡ 2 mod 3
            r *= (p == 3) ? 1 : (p % 3 == 1 ? 2 : 0);
        }
        return r;
    }

    /** ε∞(Γ0(N)) = Σ_{d | N} φ(gcd(d, N/d)): number of cusps. */
    static long cusps(long n, long[][] f) {
        long r = 1;
        for (long[] pe : f) {
            // multiplicative: for p^a, Σ_{i=0..a} φ(p^{min(i, a−i)})
            long p = pe[0];
            int a = (int) pe[1];
            long s = 0;
            for (int i = 0; i <= a; i++) {
                int m = Math.min(i, a - i);
                s += (m == 0) ? 1 : Arith.powExact(p, m - 1) * (p - 1);
            }
            r *= s;
        }
        return r;
    }

    private static void check(int level, int weight) {
        if (level < 1) {
            throw new IllegalArgumentException("level must be >= 1, got " + level);
        }
        if (weight == 1) {
            throw new IllegalArgumentException(
                    "weight 1 is not supported: its dimension is not given by the Riemann-Roch formula");
        }
        if (weight < 2) {
            throw new IllegalArgumentException("weight must be >= 2, got " + weight);
        }
    }
}
