package io.github.eigengate.bench;

import io.github.eigengate.arith.WeierstrassModel;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.curves.Traces;
import java.util.Arrays;

/**
 * The curve benchmark of docs/benchmarks.md (not a test): a_p(E) for every prime p ≤ 10^6 of the conductor-5077
 * curve [0,0,1,-7,6], best of several rounds after warm-up. Run by {@code bench/curves.sh}, which times PARI/GP's
 * {@code ellan(E, 10^6)} in the same run.
 */
public final class CurveBench {

    private CurveBench() {
    }

    public static void main(String[] args) {
        int bound = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 5;
        WeierstrassModel e = WeierstrassModel.of(0, 0, 1, -7, 6);
        int[] primes = primes(bound);
        long checksum = Arrays.stream(Traces.of(e, primes)).sum(); // warm-up
        long best = Long.MAX_VALUE;
        for (int r = 0; r < rounds; r++) {
            long t0 = System.nanoTime();
            long[] ap = Traces.of(e, primes);
            best = Math.min(best, System.nanoTime() - t0);
            checksum = Arrays.stream(ap).sum();
        }
        System.out.printf("eigengate a_p, p <= %d (%d primes): %d ms (sum of a_p = %d)%n", bound, primes.length,
                best / 1_000_000, checksum);
    }

    private static int[] primes(int bound) {
        int[] spf = Arith.smallestPrimeFactors(bound);
        return java.util.stream.IntStream.rangeClosed(2, bound).filter(n -> spf[n] == n).toArray();
    }
}
