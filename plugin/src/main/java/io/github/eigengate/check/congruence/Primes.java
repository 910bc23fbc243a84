package io.github.eigengate.check.congruence;

import java.util.Arrays;
import java.util.BitSet;

/** The primes up to a bound, by the sieve of Eratosthenes, computed once per pass and extended on demand. */
final class Primes {

    /** The largest ℓ whose a_ℓ is ever reduced (2^25, about 2·10^6 primes). */
    static final int CAP = 1 << 25;

    private int[] primes = new int[0];
    private int sievedTo = 1;

    /** The primes ≤ n (n ≤ {@link #CAP}), ascending; a shared array that callers must not modify. */
    int[] upTo(int n) {
        if (n > sievedTo) {
            sieve(Math.max(n, Math.min(CAP, 2 * sievedTo)));
        }
        int count = Arrays.binarySearch(primes, n);
        count = count >= 0 ? count + 1 : -count - 1;
        return count == primes.length ? primes : Arrays.copyOf(primes, count);
    }

    private void sieve(int n) {
        BitSet composite = new BitSet(n + 1);
        int[] out = new int[n / 10 + 16]; // a first guess at π(n); grown by doubling when short
        int size = 0;
        for (int i = 2; i <= n; i++) {
            if (!composite.get(i)) {
                if (size == out.length) {
                    out = Arrays.copyOf(out, size * 2);
                }
                out[size++] = i;
                for (long m = (long) i * i; m <= n; m += i) {
                    composite.set((int) m);
                }
            }
        }
        primes = Arrays.copyOf(out, size);
        sievedTo = n;
    }
}
