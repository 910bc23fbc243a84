package io.github.eigengate.theory.spaces;

import io.github.eigengate.theory.Arith;

/**
 * A precomputed table of Hurwitz class numbers H(n), 0 ≤ n ≤ bound, stored as the integers 12·H(n).
 *
 * <p>Definition (D. Zagier, <i>Nombres de classes et formes modulaires de poids 3/2</i>, C. R. Acad. Sci.
 * Paris 281 (1975); H. Cohen, <i>A Course in Computational Algebraic Number Theory</i>, GTM 138, §5.3,
 * Definition 5.3.6): for n &gt; 0, H(n) is the number of SL_2(Z)-classes of positive definite binary
 * quadratic forms a x² + b xy + c y² of discriminant b² − 4ac = −n, primitive or not, where the class of
 * a·(x² + y²) is counted with weight 1/2 and the class of a·(x² + xy + y²) with weight 1/3;
 * H(n) = 0 for n ≡ 1, 2 mod 4, and H(0) = −1/12. Thus H(3) = 1/3, H(4) = 1/2, H(7) = 1, H(8) = 1,
 * H(12) = 4/3. Equivalently H(n) = Σ_{f² | n, −n/f² ≡ 0, 1 mod 4} h_w(−n/f²) where h_w(D) = h(D)/(w(D)/2)
 * is the weighted class number of primitive forms.
 *
 * <p>Algorithm: enumerate all reduced forms |b| ≤ a ≤ c (b ≥ 0 if |b| = a or a = c) with 4ac − b² ≤ bound;
 * every class has exactly one reduced representative (Cohen, GTM 138, §5.3.1, Algorithm 5.3.5 does the
 * same enumeration for a single discriminant). The work is about (bound/4)·√(bound/3) steps.
 * The primitive weighted class numbers 12·h_w(−n) are then recovered by Möbius inversion over the
 * conductor: 12 h_w(−n) = Σ_{g | F(n)} μ(g) · 12 H(n/g²), where F(n) is the largest f with f² | n
 * and n/f² ≡ 0, 3 mod 4.
 *
 * <p>Instances are immutable.
 */
public final class HurwitzClassNumbers {

    /** Largest supported bound; three int arrays of this length are allocated. */
    public static final long MAX_BOUND = 50_000_000L;

    private final int bound;
    /** hurwitz12[n] = 12 H(n). */
    private final int[] hurwitz12;
    /** primitive12[n] = 12 h_w(−n) for n ≡ 0, 3 mod 4, n ≥ 3; 0 otherwise. */
    private final int[] primitive12;
    /** conductor[n] = largest f with f² | n and n/f² ≡ 0, 3 mod 4 (n ≡ 0, 3 mod 4); 0 otherwise. */
    private final int[] conductor;

    private HurwitzClassNumbers(int bound) {
        this.bound = bound;
        this.hurwitz12 = new int[bound + 1];
        this.primitive12 = new int[bound + 1];
        this.conductor = new int[bound + 1];
        fillHurwitz();
        fillConductors();
        fillPrimitive();
    }

    /**
     * Precomputes 12·H(n) for all 0 ≤ n ≤ bound.
     *
     * @param bound 0 ≤ bound ≤ {@link #MAX_BOUND}
     * @throws IllegalArgumentException if bound is out of range
     */
    public static HurwitzClassNumbers upTo(long bound) {
        if (bound < 0 || bound > MAX_BOUND) {
            throw new IllegalArgumentException("bound must be in [0, " + MAX_BOUND + "], got " + bound);
        }
        return new HurwitzClassNumbers((int) bound);
    }

    /** The largest n covered by this table. */
    public long bound() {
        return bound;
    }

    /**
     * 12·H(n), an integer (H has denominator dividing 12: only weights 1/2, 1/3 and H(0) = −1/12 occur).
     *
     * @param n 0 ≤ n ≤ {@link #bound()}
     * @throws IllegalArgumentException if n is outside the table
     */
    public long times12(long n) {
        checkRange(n);
        return hurwitz12[(int) n];
    }

    /**
     * 12·h_w(−n) = 12·h(−n)/(w(−n)/2), the weighted class number of primitive forms of discriminant −n
     * (4 for n = 3, 6 for n = 4, 12·h(−n) for other n ≡ 0, 3 mod 4, n &gt; 4; 0 if −n is not a
     * negative discriminant).
     */
    long primitiveTimes12(long n) {
        checkRange(n);
        return primitive12[(int) n];
    }

    /** The conductor F(n) (largest f with f² | n, n/f² ≡ 0, 3 mod 4), or 0 if n ≢ 0, 3 mod 4 or n = 0. */
    long conductor(long n) {
        checkRange(n);
        return conductor[(int) n];
    }

    private void checkRange(long n) {
        if (n < 0 || n > bound) {
            throw new IllegalArgumentException(
                    "n = " + n + " outside the precomputed range [0, " + bound + "] of Hurwitz class numbers");
        }
    }

    /**
     * The class number h(D): the number of SL_2(Z)-classes of primitive positive definite binary quadratic
     * forms of discriminant D, counted by enumerating reduced forms (Cohen, GTM 138, Algorithm 5.3.5,
     * without the weights). For fundamental D this is the class number of Q(√D).
     *
     * @param discriminant D &lt; 0 with D ≡ 0, 1 mod 4
     * @throws IllegalArgumentException if D is not a negative discriminant
     */
    public static long classNumber(long discriminant) {
        long d = discriminant;
        if (d >= 0 || Math.floorMod(d, 4) > 1) {
            throw new IllegalArgumentException("not a negative discriminant: " + d);
        }
        long m = -d;
        long h = 0;
        for (long b = m & 1; 3 * b * b <= m; b += 2) {
            // forms with |b| = b; a ranges over divisors of (b² + m)/4 with b ≤ a ≤ c
            long q = (b * b + m) / 4;
            for (long a = Math.max(b, 1); a * a <= q; a++) {
                if (q % a != 0) {
                    continue;
                }
                long c = q / a;
                if (Arith.gcd(Arith.gcd(a, b), c) != 1) {
                    continue;
                }
                // (a, −b, c) is reduced and distinct from (a, b, c) unless b = 0, b = a or a = c
                h += (b == 0 || b == a || a == c) ? 1 : 2;
            }
        }
        return h;
    }

    private void fillHurwitz() {
        int[] h = hurwitz12;
        h[0] = -1;
        long lim = bound;
        for (long a = 1; 3 * a * a <= lim; a++) {
            for (long b = 0; b <= a; b++) {
                long b2 = b * b;
                for (long c = a; 4 * a * c - b2 <= lim; c++) {
                    int n = (int) (4 * a * c - b2);
                    if (b == 0) {
                        h[n] += (c == a) ? 6 : 12;
                    } else if (b == a) {
                        h[n] += (c == a) ? 4 : 12;
                    } else {
                        h[n] += (c == a) ? 12 : 24;
                    }
                }
            }
        }
    }

    private void fillConductors() {
        for (int n = 3; n <= bound; n++) {
            int r = n & 3;
            if (r == 0 || r == 3) {
                conductor[n] = 1;
            }
        }
        // increasing f: the last f written is the largest valid one
        for (long f = 2; f * f <= bound; f++) {
            long f2 = f * f;
            for (long k = 3; k * f2 <= bound; k++) {
                long r = k & 3;
                if (r == 0 || r == 3) {
                    conductor[(int) (k * f2)] = (int) f;
                }
            }
        }
    }

    private void fillPrimitive() {
        int[] moebius = moebiusUpTo((int) Arith.isqrt(bound));
        for (long g = 1; g * g <= bound; g++) {
            int mu = moebius[(int) g];
            if (mu == 0) {
                continue;
            }
            long g2 = g * g;
            for (long k = 3; k * g2 <= bound; k++) {
                primitive12[(int) (k * g2)] += mu * hurwitz12[(int) k];
            }
        }
        for (int n = 0; n <= bound; n++) {
            if (conductor[n] == 0) {
                primitive12[n] = 0;
            }
        }
    }

    private static int[] moebiusUpTo(int m) {
        int[] mu = new int[m + 1];
        if (m >= 1) {
            mu[1] = 1;
        }
        int[] spf = new int[m + 1];
        for (int i = 2; i <= m; i++) {
            if (spf[i] == 0) {
                for (int j = i; j <= m; j += i) {
                    if (spf[j] == 0) {
                        spf[j] = i;
                    }
                }
            }
            int p = spf[i];
            int q = i / p;
            mu[i] = (q % p == 0) ? 0 : -mu[q];
        }
        return mu;
    }
}
