package io.github.eigengate.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * The benchmark harness of docs/benchmarks.md (not a test): runs each row of the table in this JVM (CPU time of the
 * process, 5 timed rounds after warm-up, min and median) and, when {@code gp} is on the PATH and the row has a gp
 * side, the same work in PARI/GP (the row's script under {@code bench/gp/}, which prints {@code round <ms>} per round
 * and {@code checksum <text>}); both checksums must be equal. Run with {@code bench/run [row...]} from the repository
 * root.
 *
 * <p>A row is one small class implementing {@link Row}, registered in {@link #ROWS}.
 */
public final class Bench {

    /** One line of the benchmark table. */
    public interface Row {
        /** The short name used on the command line. */
        String name();

        /** What is measured, one line. */
        String title();

        /** Prepares the data under {@code work} (once) and returns the timed work. */
        Task prepare(Path work) throws IOException;

        /**
         * The gp side: the script under bench/gp/ and the gp assignments made before reading it (e.g. {@code
         * data="..."}), or {@code null} when the row has no PARI/GP counterpart.
         */
        default List<String> gp(Path work) {
            return null;
        }

        /** Warm-up rounds before the timed ones. */
        default int warmUp() {
            return 2;
        }
    }

    /** One round of a row's work; returns a checksum of what was computed (equal on both sides). */
    @FunctionalInterface
    public interface Task {
        String run() throws IOException;
    }

    /** A row that reports its own figure (e.g. a smallest heap) instead of timed rounds. */
    public interface Report extends Row {
        String measure(Path work) throws IOException;

        @Override
        default Task prepare(Path work) {
            return () -> "";
        }
    }

    /** The rows, by name; the trace-formula rows are added beside these. */
    static final Map<String, Row> ROWS = new LinkedHashMap<>();

    static {
        for (Row r : List.<Row>of(
                new RamanujanRow("rp-389", "s2-389-deg20", 2),
                new RamanujanRow("rp-997", "s2-997-deg42", 2),
                new RamanujanRow("rp-240", "s240-1-deg20", 240),
                new GateRow("gate-many", 100, 100_000),
                new GateRow("gate-1e6", 1, 1_000_000),
                new GateRow("gate-1e7", 1, 10_000_000),
                new HeapRow("heap-1e7", 10_000_000))) {
            ROWS.put(r.name(), r);
        }
    }

    private static final int ROUNDS = 5;

    private Bench() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length == 2 && args[0].equals("--gate-once")) { // child JVM of the heap row
            GateRow.gateOnce(Path.of(args[1]));
            return;
        }
        List<String> names = args.length == 0 ? new ArrayList<>(ROWS.keySet()) : Arrays.asList(args);
        Path work = Path.of(System.getProperty("bench.work", "target/bench-work"));
        Files.createDirectories(work);
        boolean gp = gpPresent();
        System.out.printf("machine: %d cores, %s %s; PARI/GP %s%n", Runtime.getRuntime().availableProcessors(),
                System.getProperty("java.vm.name"), System.getProperty("java.version"),
                gp ? "present" : "absent (Eigengate alone)");
        for (String name : names) {
            Row row = ROWS.get(name);
            if (row == null) {
                throw new IllegalArgumentException("no row " + name + "; rows: " + ROWS.keySet());
            }
            System.out.println();
            System.out.println("== " + row.name() + ": " + row.title());
            if (row instanceof Report r) {
                System.out.println("   " + r.measure(work));
                continue;
            }
            Task task = row.prepare(work);
            for (int i = 0; i < row.warmUp(); i++) {
                task.run();
            }
            long[] times = new long[ROUNDS];
            String sum = null;
            for (int i = 0; i < ROUNDS; i++) {
                long t0 = cpuNanos();
                String s = task.run();
                times[i] = cpuNanos() - t0;
                if (sum != null && !sum.equals(s)) {
                    throw new IllegalStateException("checksum changed between rounds: " + sum + " / " + s);
                }
                sum = s;
            }
            System.out.printf("   eigengate  min %9.1f ms  median %9.1f ms   checksum %s%n", ms(min(times)),
                    ms(median(times)), sum);
            List<String> side = row.gp(work);
            if (gp && side != null) {
                GpResult g = runGp(side);
                System.out.printf("   pari/gp    min %9.1f ms  median %9.1f ms   checksum %s%n", ms(min(g.times)),
                        ms(median(g.times)), g.checksum);
                System.out.printf("   ratio eigengate/pari: min %.2f  median %.2f   checksums %s%n",
                        (double) min(times) / min(g.times), (double) median(times) / median(g.times),
                        sum.equals(g.checksum) ? "equal" : "DIFFER");
                System.out.println("   gp command: echo '" + String.join("; ", side.subList(1, side.size()))
                        + "; read(\"" + side.get(0) + "\")' | gp -q");
            }
        }
    }

    record GpResult(long[] times, String checksum) {
    }

    /** Runs {@code gp -q} on the row's script; {@code side.get(0)} is the script, the rest are assignments. */
    private static GpResult runGp(List<String> side) throws IOException, InterruptedException {
        String input = String.join(";\n", side.subList(1, side.size())) + ";\nread(\"" + side.get(0) + "\");\n";
        Process p = new ProcessBuilder("gp", "-q", "--default", "parisizemax=2000000000").redirectErrorStream(true)
                .start();
        p.getOutputStream().write(input.getBytes(StandardCharsets.UTF_8));
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor(1, TimeUnit.HOURS);
        List<Long> times = new ArrayList<>();
        String checksum = null;
        for (String line : out.split("\n")) {
            if (line.startsWith("round ")) {
                times.add(Long.parseLong(line.substring(6).trim()) * 1_000_000L);
            } else if (line.startsWith("checksum ")) {
                checksum = line.substring(9).trim();
            }
        }
        if (times.isEmpty() || checksum == null) {
            throw new IllegalStateException("gp printed no rounds:\n" + out);
        }
        return new GpResult(times.stream().mapToLong(Long::longValue).toArray(), checksum);
    }

    private static boolean gpPresent() {
        try {
            Process p = new ProcessBuilder("gp", "--version-short").redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException | InterruptedException e) {
            return false;
        }
    }

    /** CPU time of the whole process (all threads: JIT, GC and workers included). */
    static long cpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    static double ms(long nanos) {
        return nanos / 1e6;
    }

    static long min(long[] t) {
        return Arrays.stream(t).min().orElseThrow();
    }

    static long median(long[] t) {
        long[] s = t.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }

    /** The repository root (bench/ lives there); the harness runs from the root or from plugin/. */
    static Path root() {
        Path here = Path.of("").toAbsolutePath();
        return Files.isDirectory(here.resolve("bench")) ? here : here.getParent();
    }
}
