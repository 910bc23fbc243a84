package io.github.eigengate.theory.spaces;

import io.github.eigengate.theory.Arith;
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

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].equals("vs-gp")) {
            versusGp();
            return;
        }
        if (args.length > 0 && args[0].equals("once")) {
            once(Integer.parseInt(args[1]), Integer.parseInt(args[2]));
            return;
        }
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

    /** Trace-formula rows of issues 9 and 13, n ≤ 10^4; the PARI/GP commands are in bench/traces.gp. */
    private static final int B = 10_000;

    private record Row(String name, BigIntSupplier job) {
    }

    private interface BigIntSupplier {
        BigInteger get();
    }

    private static List<Row> rows() {
        return List.of(
                new Row("full S_2(1000)", () -> {
                    TraceFormula tf = TraceFormula.forLevel(1000, HurwitzClassNumbers.upTo(4L * B + 4));
                    BigInteger sum = BigInteger.ZERO;
                    for (long n = 1; n <= B; n++) {
                        sum = sum.add(tf.trace(2, n));
                    }
                    return sum;
                }),
                new Row("new S_12(389)", () -> newSum(TraceFormula.forLevel(389, HurwitzClassNumbers.upTo(4L * B + 4)), 12)),
                new Row("S_100(1)", () -> {
                    TraceFormula tf = TraceFormula.forLevel(1, HurwitzClassNumbers.upTo(4L * B + 4));
                    BigInteger sum = BigInteger.ZERO;
                    for (long n = 1; n <= B; n++) {
                        sum = sum.add(tf.trace(100, n));
                    }
                    return sum;
                }),
                new Row("new S_2(997, chi order 3)", () -> newSum(TraceFormula.forCharacter(
                        character(997, new long[] {7}, new long[] {1}, new long[] {3}),
                        HurwitzClassNumbers.upTo(4L * B + 4)), 2)),
                new Row("new S_2(1001, chi order 6)", () -> newSum(TraceFormula.forCharacter(
                        character(1001, new long[] {93, 628, 846}, new long[] {1, 1, 0}, new long[] {6, 2, 1}),
                        HurwitzClassNumbers.upTo(4L * B + 4)), 2)));
    }

    private static io.github.eigengate.arith.DirichletCharacter character(int n, long[] g, long[] a, long[] b) {
        return io.github.eigengate.arith.DirichletCharacter.fromValues(n, g, a, b);
    }

    private static BigInteger newSum(TraceFormula tf, int k) {
        BigInteger sum = BigInteger.ZERO;
        for (long n = 1; n <= B; n++) {
            if (Arith.gcd(n, tf.level()) == 1) {
                sum = sum.add(tf.newTrace(k, n));
            }
        }
        return sum;
    }

    /**
     * Side by side with PARI/GP: every row 2 warm-up rounds then 5 timed ones (CPU time of this thread), min and median,
     * the checksum (sum of the traces); then, when {@code gp} is on the PATH, bench/traces.gp (the same rows, CPU time
     * by gettime) and the ratios. Run: {@code java -cp CP io.github.eigengate.theory.spaces.TraceBench vs-gp}.
     */
    private static void versusGp() throws Exception {
        java.lang.management.ThreadMXBean cpu = java.lang.management.ManagementFactory.getThreadMXBean();
        List<String[]> ours = new ArrayList<>();
        for (Row row : rows()) {
            BigInteger check = row.job().get();
            row.job().get();
            long[] ms = new long[RUNS];
            for (int r = 0; r < RUNS; r++) {
                long start = cpu.getCurrentThreadCpuTime();
                BigInteger c = row.job().get();
                ms[r] = (cpu.getCurrentThreadCpuTime() - start) / 1_000_000;
                if (!c.equals(check)) {
                    throw new IllegalStateException("non-deterministic result in " + row.name());
                }
            }
            long[] sorted = ms.clone();
            Arrays.sort(sorted);
            ours.add(new String[] {row.name(), Long.toString(sorted[0]), Long.toString(sorted[RUNS / 2]),
                    check.toString()});
            System.out.printf("eigengate  %-28s min %6d ms  median %6d ms  checksum %s%n", row.name(), sorted[0],
                    sorted[RUNS / 2], check);
        }
        List<String[]> theirs = gp();
        if (theirs == null) {
            System.out.println("gp not found: Eigengate alone");
            return;
        }
        System.out.println("| work (n <= 10^4) | Eigengate min / median (ms) | PARI/GP min / median (ms) | ratio min / median "
                + "| checksums |");
        System.out.println("|---|---|---|---|---|");
        for (String[] o : ours) {
            for (String[] t : theirs) {
                if (t[0].equals(o[0])) {
                    double rMin = Double.parseDouble(o[1]) / Math.max(1, Double.parseDouble(t[1]));
                    double rMed = Double.parseDouble(o[2]) / Math.max(1, Double.parseDouble(t[2]));
                    System.out.printf("| %s | %s / %s | %s / %s | %.2f× / %.2f× | %s |%n", o[0], o[1], o[2], t[1], t[2],
                            rMin, rMed, o[3].equals(t[3]) ? "equal" : "DIFFER: " + o[3] + " vs " + t[3]);
                }
            }
        }
    }

    /** Runs bench/traces.gp with gp, or null when gp cannot be started. */
    private static List<String[]> gp() throws Exception {
        java.nio.file.Path script = java.nio.file.Files.createTempFile("traces", ".gp");
        try (java.io.InputStream in = TraceBench.class.getResourceAsStream("/bench/traces.gp")) {
            java.nio.file.Files.copy(in, script, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        Process p;
        try {
            p = new ProcessBuilder("gp", "-q", script.toString()).redirectErrorStream(true).start();
        } catch (java.io.IOException e) {
            return null;
        }
        p.getOutputStream().close();
        List<String[]> out = new ArrayList<>();
        try (java.io.BufferedReader r = new java.io.BufferedReader(new java.io.InputStreamReader(p.getInputStream()))) {
            String line;
            while ((line = r.readLine()) != null) {
                String[] cells = line.split("\t");
                if (cells.length == 4) {
                    out.add(cells);
                } else {
                    System.out.println("gp: " + line);
                }
            }
        }
        p.waitFor();
        return out;
    }

    /** One new-space run for the whole-process row: Tr T_n, n ≤ 10^4 coprime to N, on S_k^new(Γ0(N)). */
    private static void once(int level, int weight) {
        System.out.println(newSum(TraceFormula.forLevel(level, HurwitzClassNumbers.upTo(4L * B + 4)), weight));
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
