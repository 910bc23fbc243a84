package io.github.eigengate.theory;

import java.math.BigInteger;

/** Small elementary number theory used by the formulas. */
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
        long[] out = new long[64];
        int size = 0;
        for (long p = 2; p * p <= n; p++) {
            if (n % p == 0) {
                out[size++] = p;
                while (n % p == 0) {
                    n /= p;
                }
            }
        }
        if (n > 1) {
            out[size++] = n;
        }
        return java.util.Arrays.copyOf(out, size);
    }
}
