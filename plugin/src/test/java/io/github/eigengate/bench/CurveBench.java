package io.github.eigengate.bench;

import io.github.eigengate.arith.WeierstrassModel;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.curves.Traces;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * The curve benchmark of docs/benchmarks.md (not a test), run by {@code bench/curves.sh}: a_p(E) for every prime
 * p ≤ 10^6 of the conductor-5077 curve [0,0,1,-7,6] against PARI/GP's {@code ellan(E, 10^6)} timed by the script in
 * the same run, and the whole gate (all checks) on a dataset of that form with a_n for n ≤ 10^6 (from gp's ellan)
 * and its curve. Best of 5 after warm-up. Times are CPU time of the running thread, as gp's {@code gettime()}
 * measures CPU time: on a shared machine wall-clock time mostly measures the other jobs. Wall time is printed too.
 *
 * <p>Arguments: the gp time in ms, the dataset directory (both optional: without them only a_p is timed).
 */
public final class CurveBench {

    private static final java.lang.management.ThreadMXBean CPU =
            java.lang.management.ManagementFactory.getThreadMXBean();

    private CurveBench() {
    }

    public static void main(String[] args) {
        long gpMs = args.length > 0 ? Long.parseLong(args[0]) : -1;
        WeierstrassModel e = WeierstrassModel.of(0, 0, 1, -7, 6);
        int[] primes = primes(1_000_000);
        long checksum = 0;
        long best = Long.MAX_VALUE;
        long bestWall = Long.MAX_VALUE;
        for (int r = 0; r < 7; r++) {
            long w0 = System.nanoTime();
            long t0 = CPU.getCurrentThreadCpuTime();
            long[] ap = Traces.of(e, primes);
            long t = CPU.getCurrentThreadCpuTime() - t0;
            if (r >= 2) {
                best = Math.min(best, t);
                bestWall = Math.min(bestWall, System.nanoTime() - w0);
            }
            checksum = Arrays.stream(ap).sum();
        }
        long ms = best / 1_000_000;
        System.out.printf("eigengate a_p(E), p <= 10^6 (%d primes): %d ms CPU, %d ms wall (sum of a_p = %d)%n",
                primes.length, ms, bestWall / 1_000_000, checksum);
        if (gpMs > 0) {
            System.out.printf("PARI/GP ellan(E, 10^6):                 %d ms%n", gpMs);
            System.out.printf("ratio eigengate / PARI/GP:              %.2f (issue: at most 2)%n", (double) ms / gpMs);
        }
        if (args.length > 1) {
            Gate gate = new Gate(Settings.defaults());
            List<Gate.Dataset> data = List.of(new Gate.Dataset(Path.of(args[1]), "data"));
            long g = Long.MAX_VALUE;
            long gWall = Long.MAX_VALUE;
            Report last = null;
            for (int r = 0; r < 7; r++) {
                long w0 = System.nanoTime();
                long t0 = CPU.getCurrentThreadCpuTime();
                last = gate.run(data);
                if (r >= 2) {
                    g = Math.min(g, CPU.getCurrentThreadCpuTime() - t0);
                    gWall = Math.min(gWall, System.nanoTime() - w0);
                }
            }
            System.out.printf("whole gate, a_n for n <= 10^6 and the curve: %d ms CPU, %d ms wall, warm (issue: "
                    + "under 3000 ms); %d findings, %d coefficient rows%n", g / 1_000_000, gWall / 1_000_000,
                    last.findings().size(), last.rows());
            last.findings().stream().limit(5).forEach(f -> System.out.println("  " + f.line()));
            if (args.length > 2) { // per check: the gate with only that one (and table-format)
                for (String id : Gate.knownIds()) {
                    java.util.Set<String> skip = new java.util.HashSet<>(Gate.knownIds());
                    skip.remove(id);
                    Gate one = new Gate(new Settings(Settings.DEFAULT_MAX_FINDINGS, skip, false));
                    long b = Long.MAX_VALUE;
                    for (int r = 0; r < 3; r++) {
                        long t0 = CPU.getCurrentThreadCpuTime();
                        one.run(data);
                        b = Math.min(b, CPU.getCurrentThreadCpuTime() - t0);
                    }
                    System.out.printf("  only %-20s %d ms CPU%n", id, b / 1_000_000);
                }
            }
        }
    }

    private static int[] primes(int bound) {
        int[] spf = Arith.smallestPrimeFactors(bound);
        return java.util.stream.IntStream.rangeClosed(2, bound).filter(n -> spf[n] == n).toArray();
    }
}
