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

        long coldStart = System.nanoTime();
        HurwitzClassNumbers.upTo(4L * PRIME_BOUND);
        long coldTable = System.nanoTime() - coldStart;
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
        System.out.printf("Hurwitz class numbers H(n), n <= %d: median %.1f ms, first run %.1f ms%n",
                4 * PRIME_BOUND, median(tableTimes) / 1e6, coldTable / 1e6);

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
            report(level + ", Tr T_p on S_2(N), " + primes.length + " primes p <= " + PRIME_BOUND, full);
            report(level + ", Tr T_p on S_2^new(N), " + coprime + " primes p <= " + PRIME_BOUND + " coprime to N",
                    fresh);
            report(level + ", Tr T_n on S_2(N), all n <= " + PRIME_BOUND, all);
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
        report("1, tau(n) = Tr T_n on S_12(1), n <= 100", delta);
    }

    private static void report(String what, Result r) {
        System.out.printf("N = %s: median %.1f ms, first run %.1f ms (checksum = sum of traces: %s)%n", what,
                r.medianNanos / 1e6, r.coldNanos / 1e6, r.checksum);
    }

    private interface Job {
        BigInteger run();
    }

    private record Result(long medianNanos, long coldNanos, BigInteger checksum) {
    }

    private static Result time(Job job) {
        long coldStart = System.nanoTime();
        BigInteger check = job.run(); // first run, before JIT warm-up
        long cold = System.nanoTime() - coldStart;
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
        return new Result(median(times), cold, check);
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
