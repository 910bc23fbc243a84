package io.github.eigengate.theory.spaces;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Small elementary-number-theory helpers on {@code long}, shared by the classes of this package.
 *
 * <p>All functions are exact; none uses floating point. Factorisation is by trial division, which is
 * adequate for the sizes this package handles (levels below 2<sup>31</sup>, Hecke indices whose
 * Hurwitz class numbers fit in memory).
 */
final class Arith {

    private Arith() {
    }

    /**
     * Factorises {@code n ≥ 1} by trial division.
     *
     * @return pairs {@code {p, e}} with p prime, e ≥ 1, in increasing order of p; empty for n = 1
     * @throws IllegalArgumentException if n &lt; 1
     */
    static long[][] factor(long n) {
        if (n < 1) {
            throw new IllegalArgumentException("cannot factor " + n + ": need n >= 1");
        }
        List<long[]> out = new ArrayList<>();
        long m = n;
        for (long p = 2; p <= m / p; p = (p == 2) ? 3 : p + 2) {
            if (m % p == 0) {
                int e = 0;
                while (m % p == 0) {
                    m /= p;
                    e++;
                }
                out.add(new long[] {p, e});
            }
        }
        if (m > 1) {
            out.add(new long[] {m, 1});
        }
        return out.toArray(new long[0][]);
    }

    /** All positive divisors of the number with factorisation {@code f} (as from {@link #factor}), sorted. */
    static long[] divisors(long[][] f) {
        int count = 1;
        for (long[] pe : f) {
            count *= (int) pe[1] + 1;
        }
        long[] d = new long[count];
        d[0] = 1;
        int size = 1;
        for (long[] pe : f) {
            int old = size;
            long pk = 1;
            for (int e = 1; e <= pe[1]; e++) {
                pk *= pe[0];
                for (int i = 0; i < old; i++) {
                    d[size++] = d[i] * pk;
                }
            }
        }
        Arrays.sort(d);
        return d;
    }

    static long gcd(long a, long b) {
        a = Math.abs(a);
        b = Math.abs(b);
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        return a;
    }

    /** Euler's φ(n) for n ≥ 1. */
    static long phi(long n) {
        long r = n;
        for (long[] pe : factor(n)) {
            r = r / pe[0] * (pe[0] - 1);
        }
        return r;
    }

    /** Dedekind's ψ(N) = N ∏_{p | N} (1 + 1/p) = [SL_2(Z) : Γ0(N)] (Diamond–Shurman, §1.2 / Exercise 1.2.3). */
    static long psi(long n) {
        long r = n;
        for (long[] pe : factor(n)) {
            r = r / pe[0] * (pe[0] + 1);
        }
        return r;
    }

    /**
     * β(n) where β = μ * μ is the Dirichlet inverse of σ0 = 1 * 1: multiplicative with
     * β(p) = −2, β(p²) = 1, β(p^e) = 0 for e ≥ 3 (G. Martin, J. Number Theory 112 (2005), §1).
     */
    static long beta(long n) {
        long r = 1;
        for (long[] pe : factor(n)) {
            if (pe[1] == 1) {
                r *= -2;
            } else if (pe[1] >= 3) {
                return 0;
            }
        }
        return r;
    }

    /** Number of positive divisors σ0(n), n ≥ 1. */
    static long sigma0(long n) {
        long r = 1;
        for (long[] pe : factor(n)) {
            r *= pe[1] + 1;
        }
        return r;
    }

    /** p-adic valuation of n ≠ 0. */
    static int valuation(long n, long p) {
        int v = 0;
        while (n % p == 0) {
            n /= p;
            v++;
        }
        return v;
    }

    /**
     * Jacobi symbol (a/m) for odd m ≥ 1, by quadratic reciprocity (Cohen, GTM 138, Algorithm 1.4.10).
     * Equals the Legendre symbol when m is prime.
     */
    static int jacobi(long a, long m) {
        if (m <= 0 || (m & 1) == 0) {
            throw new IllegalArgumentException("Jacobi symbol needs odd positive modulus, got " + m);
        }
        a %= m;
        if (a < 0) {
            a += m;
        }
        int s = 1;
        while (a != 0) {
            while ((a & 1) == 0) {
                a >>= 1;
                long r = m & 7;
                if (r == 3 || r == 5) {
                    s = -s;
                }
            }
            long t = a;
            a = m;
            m = t;
            if ((a & 3) == 3 && (m & 3) == 3) {
                s = -s;
            }
            a %= m;
        }
        return m == 1 ? s : 0;
    }

    /** b^e for e ≥ 0, exact; throws ArithmeticException on overflow of long. */
    static long powExact(long b, int e) {
        long r = 1;
        for (int i = 0; i < e; i++) {
            r = Math.multiplyExact(r, b);
        }
        return r;
    }

    /** ⌊√n⌋ for n ≥ 0, exact. */
    static long isqrt(long n) {
        if (n < 0) {
            throw new IllegalArgumentException("negative: " + n);
        }
        if (n < 2) {
            return n;
        }
        // integer Newton iteration from 2^⌈bits/2⌉ ≥ √n, decreasing to ⌊√n⌋ (no floating point)
        long x = 1L << ((64 - Long.numberOfLeadingZeros(n) + 1) / 2);
        while (true) {
            long y = (x + n / x) >>> 1;
            if (y >= x) {
                return x;
            }
            x = y;
        }
    }
}
