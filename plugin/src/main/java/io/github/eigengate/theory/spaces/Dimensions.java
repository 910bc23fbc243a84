package io.github.eigengate.theory.spaces;

import io.github.eigengate.arith.DirichletCharacter;
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
 * <p>With a character χ mod N of conductor 𝔣 = ∏ p^{s_p}, N = ∏ p^{r_p}, and χ(−1) = (−1)^k (otherwise
 * S_k(N, χ) = 0), the Cohen–Oesterlé formula (H. Cohen, J. Oesterlé, <i>Dimensions des espaces de formes
 * modulaires</i>, Modular Functions of One Variable VI, LNM 627 (1977), 69–78, Théorème 1; restated in
 * Cohen–Strömberg, <i>Modern Analytic Theory of Modular Forms</i>, GSM 179, §7.4 — section number from memory)
 * gives, for k ≥ 2,
 * <pre>
 *   dim S_k(N, χ) − dim M_{2−k}(N, χ̄) = (k − 1)/12 · ψ(N) − ½ ∏_{p | N} λ(r_p, s_p, p)
 *                                     + ε_k Σ_{x mod N, x² + 1 ≡ 0} χ(x) + μ_k Σ_{x mod N, x² + x + 1 ≡ 0} χ(x),
 * </pre>
 * with λ(r, s, p) = p^{r/2} + p^{r/2 − 1} if 2s ≤ r, r even; 2p^{(r−1)/2} if 2s ≤ r, r odd; 2p^{r−s} if 2s &gt; r;
 * ε_k = 0, −¼, ¼ for k odd, k ≡ 2, k ≡ 0 mod 4; μ_k = 0, −⅓, ⅓ for k ≡ 1, 2, 0 mod 3. For k ≥ 2,
 * dim M_{2−k}(N, χ̄) is 1 when k = 2 and χ is trivial and 0 otherwise. The new part: with χ_M the character mod M
 * inducing the same primitive character (𝔣 | M | N), S_k(N, χ) = ⊕_M ⊕_{d | N/M} S_k^new(M, χ_M)(dz), so the same
 * β-inversion over the levels M with 𝔣 | M | N gives dim S_k^new(N, χ).
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
     * dim S_k(N, χ) by the Cohen–Oesterlé formula (see class comment); 0 when χ(−1) ≠ (−1)^k.
     *
     * @param character χ, a character mod N (its modulus is the level)
     * @param weight    k ≥ 2
     * @throws IllegalArgumentException if weight &lt; 2
     * @throws IllegalStateException    if the formula gave a non-integer (a bug)
     */
    public static long cuspForms(DirichletCharacter character, int weight) {
        int level = character.modulus();
        check(level, weight);
        if (character.isTrivial()) {
            return cuspForms(level, weight);
        }
        if (character.isOdd() != ((weight & 1) == 1)) {
            return 0;
        }
        long k = weight;
        long[][] f = Arith.factor(level);
        // 24·dim = 2(k − 1)ψ(N) − 12∏λ + 24ε_k·S_2 + 24μ_k·S_3
        long cusps = 1;
        for (long[] pe : f) {
            int p = (int) pe[0];
            int r = (int) pe[1];
            int s = Arith.valuation(character.conductorPart(p), p);
            if (2 * s <= r) {
                cusps *= (r % 2 == 0) ? Arith.powExact(p, r / 2) + Arith.powExact(p, r / 2 - 1)
                        : 2 * Arith.powExact(p, r / 2);
            } else {
                cusps *= 2 * Arith.powExact(p, r - s);
            }
        }
        long times24 = 2 * (k - 1) * Arith.psi(level) - 12 * cusps;
        int m = character.order();
        if ((weight & 1) == 0) {
            // Σ χ(x) over x² ≡ −1: χ(x)² = χ(−1) = 1, so each value is ±1
            long s2 = 0;
            for (long x = 0; x < level; x++) {
                if ((x * x + 1) % level == 0) {
                    int e = character.exponent(x);
                    if (e != 0 && 2 * e != m) {
                        throw new IllegalStateException("χ(x) for x² ≡ −1 mod " + level + " is not ±1");
                    }
                    s2 += e == 0 ? 1 : -1;
                }
            }
            times24 += (weight % 4 == 0 ? 6 : -6) * s2;
        }
        if (weight % 3 != 1) {
            times24 += (weight % 3 == 0 ? 4 : -4) * cubeRootSumTwice(character);
        }
        if (times24 % 24 != 0) {
            throw new IllegalStateException("24·dim = " + times24 + " not divisible by 24 for " + character
                    + ", k = " + weight);
        }
        return times24 / 24;
    }

    /**
     * 2·Σ χ(x) over x mod N with x² + x + 1 ≡ 0: χ(x)³ = 1 and the roots come in pairs x, x^{−1} = x², so the sum is
     * #{χ(x) = 1} − ½ #{χ(x) ≠ 1}, an element of ½Z.
     */
    private static long cubeRootSumTwice(DirichletCharacter character) {
        long level = character.modulus();
        int m = character.order();
        long ones = 0;
        long others = 0;
        for (long x = 0; x < level; x++) {
            if ((x * x + x + 1) % level == 0) {
                int e = character.exponent(x);
                if (e == 0) {
                    ones++;
                } else if (3L * e % m == 0) {
                    others++;
                } else {
                    throw new IllegalStateException("χ(x) for x² + x + 1 ≡ 0 mod " + level + " is not a cube root of 1");
                }
            }
        }
        return 2 * ones - others;
    }

    /**
     * dim S_k^new(N, χ) = Σ_{𝔣 | M | N} β(N/M) dim S_k(M, χ_M), χ_M the restriction of χ to M (see class comment).
     *
     * @param character χ, a character mod N
     * @param weight    k ≥ 2
     * @throws IllegalArgumentException if weight &lt; 2
     */
    public static long newforms(DirichletCharacter character, int weight) {
        int level = character.modulus();
        check(level, weight);
        if (character.isTrivial()) {
            return newforms(level, weight);
        }
        int cond = character.conductor();
        long sum = 0;
        for (long m : Arith.divisors(Arith.factor(level / cond))) {
            long b = Arith.beta(level / cond / m);
            if (b != 0) {
                sum += b * cuspForms(character.restrictTo((int) (m * cond)), weight);
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
