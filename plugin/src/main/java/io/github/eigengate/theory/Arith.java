package io.github.eigengate.theory;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Elementary number theory on {@code long}, shared by the formulas and the checks. Exact throughout; factorisation is
 * by trial division, adequate for levels below 2^31 and the indices of real tables.
 */
public final class Arith {

    private Arith() {
    }

    /** spf[n] = the smallest prime factor of n for 2 ≤ n ≤ max (spf[0] = spf[1] = 0); sieve of Eratosthenes. */
    public static int[] smallestPrimeFactors(int max) {
        int[] spf = new int[max + 1];
        for (int i = 2; i <= max; i++) {
            if (spf[i] == 0) {
                for (long j = i; j <= max; j += i) {
                    if (spf[(int) j] == 0) {
                        spf[(int) j] = i;
                    }
                }
            }
        }
        return spf;
    }

    private static final int SHARED_LIMIT = 1 << 24;
    private static volatile int[] shared = smallestPrimeFactors(1 << 12);

    /**
     * A table of smallest prime factors covering 0..min(max, 2^24 − 1), shared between callers (every form of a
     * table asks for the same one). The array must not be modified; look larger n up with
     * {@link #smallestPrimeFactor(int, int[])}.
     */
    public static int[] sharedSmallestPrimeFactors(int max) {
        int[] s = shared;
        int want = Math.min(max, SHARED_LIMIT - 1);
        if (s.length > want) {
            return s;
        }
        s = smallestPrimeFactors(Math.min(SHARED_LIMIT - 1, Math.max(want, 2 * s.length)));
        shared = s;
        return s;
    }

    /** The smallest prime factor of n ≥ 2, from the table when it covers n, else by trial division. */
    public static int smallestPrimeFactor(int n, int[] table) {
        if (n < table.length) {
            return table[n];
        }
        if (n % 2 == 0) {
            return 2;
        }
        for (int d = 3; (long) d * d <= n; d += 2) {
            if (n % d == 0) {
                return d;
            }
        }
        return n;
    }

    /** Deterministic primality test for every long n. */
    public static boolean isPrime(long n) {
        if (n < 2) {
            return false;
        }
        for (long p : new long[] {2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37}) {
            if (n % p == 0) {
                return n == p;
            }
        }
        if (n < 1369) {
            return true;
        }
        // Miller–Rabin with the first 12 prime bases is deterministic below 3.3·10^24 (Sorenson–Webster 2017).
        BigInteger bn = BigInteger.valueOf(n);
        BigInteger d = bn.subtract(BigInteger.ONE);
        int s = d.getLowestSetBit();
        d = d.shiftRight(s);
        for (long base : new long[] {2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37}) {
            BigInteger x = BigInteger.valueOf(base).modPow(d, bn);
            if (x.equals(BigInteger.ONE) || x.equals(bn.subtract(BigInteger.ONE))) {
                continue;
            }
            boolean composite = true;
            for (int r = 1; r < s; r++) {
                x = x.multiply(x).mod(bn);
                if (x.equals(bn.subtract(BigInteger.ONE))) {
                    composite = false;
                    break;
                }
            }
            if (composite) {
                return false;
            }
        }
        return true;
    }

    /** The exponent of the prime p in n ≥ 1. */
    public static int valuation(long n, long p) {
        int e = 0;
        while (n % p == 0) {
            n /= p;
            e++;
        }
        return e;
    }

    /** The distinct prime factors of n ≥ 1, ascending (trial division). */
    public static long[] primeFactors(long n) {
        long[][] f = factor(n);
        long[] out = new long[f.length];
        for (int i = 0; i < f.length; i++) {
            out[i] = f[i][0];
        }
        return out;
    }

    /**
     * Factorises {@code n ≥ 1} by trial division.
     *
     * @return pairs {@code {p, e}} with p prime, e ≥ 1, in increasing order of p; empty for n = 1
     * @throws IllegalArgumentException if n &lt; 1
     */
    public static long[][] factor(long n) {
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
    public static long[] divisors(long[][] f) {
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

    public static long gcd(long a, long b) {
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
    public static long phi(long n) {
        long r = n;
        for (long[] pe : factor(n)) {
            r = r / pe[0] * (pe[0] - 1);
        }
        return r;
    }

    /** Dedekind's ψ(N) = N ∏_{p | N} (1 + 1/p) = [SL_2(Z) : Γ0(N)] (Diamond–Shurman, §1.2 / Exercise 1.2.3). */
    public static long psi(long n) {
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
    public static long beta(long n) {
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
    public static long sigma0(long n) {
        long r = 1;
        for (long[] pe : factor(n)) {
            r *= pe[1] + 1;
        }
        return r;
    }

    /**
     * Jacobi symbol (a/m) for odd m ≥ 1, by quadratic reciprocity (Cohen, GTM 138, Algorithm 1.4.10).
     * Equals the Legendre symbol when m is prime.
     */
    public static int jacobi(long a, long m) {
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
    public static long powExact(long b, int e) {
        long r = 1;
        for (int i = 0; i < e; i++) {
            r = Math.multiplyExact(r, b);
        }
        return r;
    }

    /** ⌊√n⌋ for n ≥ 0, exact. */
    public static long isqrt(long n) {
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
