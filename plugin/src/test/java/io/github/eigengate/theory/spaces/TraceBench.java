package io.github.eigengate.theory.spaces;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Benchmark entry point (not a JUnit test): times the traces of T_p for all primes p ≤ 10^4 on S_2(Γ0(N))
 * and on its new subspace, and of T_n for all n ≤ 10^4 on S_2(Γ0(N)) (what a trace form to 10^4 needs),
 * after warm-up rounds, five timed runs each, and prints the medians and a checksum (the sum of the traces).
 *
 * <p>Run from the worktree root after {@code mvn -q -o -pl plugin test-compile}:
 * <pre>java -cp plugin/target/classes:plugin/target/test-classes io.github.eigengate.theory.spaces.TraceBench [N ...]</pre>
 * Default levels: 1001 and 997.
 */
public final class TraceBench {

    private static final int PRIME_BOUND = 10_000;
    private static final int RUNS = 5;

    private TraceBench() {
    }

    public static void main(String[] args) {
        int[] levels = args.length == 0 ? new int[] {1001, 997}
                : Arrays.stream(args).mapToInt(Integer::parseInt).toArray();
        long[] primes = primesUpTo(PRIME_BOUND);

        for (int i = 0; i < 3; i++) {
            HurwitzClassNumbers.upTo(4L * PRIME_BOUND);
        }
        long[] tableTimes = new long[RUNS];
        HurwitzClassNumbers table = null;
        for (int r = 0; r < RUNS; r++) {
            long start = System.nanoTime();
            table = HurwitzClassNumbers.upTo(4L * PRIME_BOUND);
            tableTimes[r] = System.nanoTime() - start;
        }
        System.out.printf("Hurwitz class numbers H(n), n <= %d: median %.1f ms%n", 4 * PRIME_BOUND,
                median(tableTimes) / 1e6);

        for (int level : levels) {
            HurwitzClassNumbers shared = table;
            long coprime = Arrays.stream(primes).filter(p -> level % p != 0).count();
            Result full = time(() -> {
                TraceFormula tf = TraceFormula.forLevel(level, shared);
                BigInteger sum = BigInteger.ZERO;
                for (long p : primes) {
                    sum = sum.add(tf.trace(2, p));
                }
                return sum;
            });
            Result fresh = time(() -> {
                TraceFormula tf = TraceFormula.forLevel(level, shared);
                BigInteger sum = BigInteger.ZERO;
                for (long p : primes) {
                    if (level % p != 0) {
                        sum = sum.add(tf.newTrace(2, p));
                    }
                }
                return sum;
            });
            Result all = time(() -> {
                TraceFormula tf = TraceFormula.forLevel(level, shared);
                BigInteger sum = BigInteger.ZERO;
                for (long n = 1; n <= PRIME_BOUND; n++) {
                    sum = sum.add(tf.trace(2, n));
                }
                return sum;
            });
            System.out.printf("N = %d, k = 2, Tr T_p on S_2(N), %d primes p <= %d: median %.1f ms (sum %s)%n",
                    level, primes.length, PRIME_BOUND, full.medianNanos / 1e6, full.checksum);
            System.out.printf("N = %d, k = 2, Tr T_p on S_2^new(N), %d primes p <= %d, p coprime to N: "
                    + "median %.1f ms (sum %s)%n", level, coprime, PRIME_BOUND, fresh.medianNanos / 1e6,
                    fresh.checksum);
            System.out.printf("N = %d, k = 2, Tr T_n on S_2(N), all n <= %d: median %.1f ms (sum %s)%n",
                    level, PRIME_BOUND, all.medianNanos / 1e6, all.checksum);
        }

        HurwitzClassNumbers small = HurwitzClassNumbers.upTo(400);
        Result delta = time(() -> {
            TraceFormula tf = TraceFormula.forLevel(1, small);
            BigInteger sum = BigInteger.ZERO;
            for (long n = 1; n <= 100; n++) {
                sum = sum.add(tf.trace(12, n));
            }
            return sum;
        });
        System.out.printf("N = 1, k = 12, tau(n) for n <= 100: median %.2f ms (sum %s)%n",
                delta.medianNanos / 1e6, delta.checksum);
    }

    private interface Job {
        BigInteger run();
    }

    private record Result(long medianNanos, BigInteger checksum) {
    }

    private static Result time(Job job) {
        BigInteger check = job.run(); // warm-up
        for (int i = 0; i < 2; i++) {
            job.run();
        }
        long[] times = new long[RUNS];
        for (int r = 0; r < RUNS; r++) {
            long start = System.nanoTime();
            BigInteger c = job.run();
            times[r] = System.nanoTime() - start;
            if (!c.equals(check)) {
                throw new IllegalStateException("non-deterministic result");
            }
        }
        return new Result(median(times), check);
    }

    private static long median(long[] xs) {
        long[] s = xs.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }

    private static long[] primesUpTo(int bound) {
        boolean[] composite = new boolean[bound + 1];
        List<Long> out = new ArrayList<>();
        for (int i = 2; i <= bound; i++) {
            if (!composite[i]) {
                out.add((long) i);
                for (long j = (long) i * i; j <= bound; j += i) {
                    composite[(int) j] = true;
                }
            }
        }
        return out.stream().mapToLong(Long::longValue).toArray();
    }
}
