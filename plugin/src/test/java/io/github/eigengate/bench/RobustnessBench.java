package io.github.eigengate.bench;

import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The benchmarks of docs/benchmarks.md, section "Threads, cache and memory" (not a test). Real data only: copies, under
 * distinct ids, of the degree-20 orbit lev389_wt2_o5 of S_2^new(Γ0(389)) with its a_1..a_100 (datasets/bigfields,
 * PARI/GP 2.15.2, fixtures-gp/), and of the level-11 newform's a_1..a_1000 (reference/level11.csv, OEIS A006571).
 *
 * <pre>
 *   RobustnessBench cache FORMS [quick]  degree-20 table of FORMS × 100 rows: cold run, then an unchanged re-run
 *   RobustnessBench threads FORMS   level-11 table of FORMS × 1000 rows at 1 and 2 threads
 *   RobustnessBench memory FORMS    level-11 table of FORMS × 1000 rows, one run (give -Xmx256m)
 * </pre>
 */
public final class RobustnessBench {

    private RobustnessBench() {
    }

    public static void main(String[] args) throws IOException {
        String mode = args[0];
        int forms = Integer.parseInt(args[1]);
        Path dir = Files.createTempDirectory("eigengate-robustness-bench");
        try {
            switch (mode) {
                case "cache" -> cache(dir, forms, args.length > 2 && args[2].equals("quick"));
                case "threads" -> threads(dir, forms);
                case "memory" -> memory(dir, forms);
                default -> throw new IllegalArgumentException("mode: cache, threads or memory");
            }
        } finally {
            try (var all = Files.walk(dir)) {
                for (Path p : all.sorted(java.util.Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    /** With {@code quick} (for big tables): no warm-up and no run without cache; cold is the run writing it. */
    private static void cache(Path dir, int forms, boolean quick) throws IOException {
        Path data = Files.createDirectories(dir.resolve("data"));
        String poly = null;
        for (String l : Files.readAllLines(Fixture.dataset("bigfields").resolve("forms.csv"))) {
            if (l.startsWith("lev389_wt2_o5,")) {
                poly = l.substring(l.lastIndexOf(',') + 1);
            }
        }
        Fixture big = Fixture.of("datasets/bigfields/coefficients.csv");
        List<String> values = new ArrayList<>();
        for (int n = 1; n <= 100; n++) {
            values.add(big.valueOf("lev389_wt2_o5", n));
        }
        try (BufferedWriter w = Files.newBufferedWriter(data.resolve("forms.csv"), StandardCharsets.UTF_8)) {
            w.write("id,level,weight,field\n");
            for (int i = 0; i < forms; i++) {
                w.write("c" + i + ",389,2,\"" + poly + "\"\n");
            }
        }
        try (BufferedWriter w = Files.newBufferedWriter(data.resolve("coefficients.csv"), StandardCharsets.UTF_8)) {
            w.write("form,n,value\n");
            for (int i = 0; i < forms; i++) {
                for (int n = 1; n <= 100; n++) {
                    w.write("c" + i + "," + n + ",\"" + values.get(n - 1) + "\"\n");
                }
            }
        }
        System.out.printf("table: %d rows, %d degree-20 forms, %.1f MB%n", forms * 100L, forms,
                Files.size(data.resolve("coefficients.csv")) / 1e6);
        Path cache = dir.resolve("cache");
        Settings s = new Settings(1000, COPIES, false).withCache(cache);
        if (!quick) {
            time(new Settings(1000, COPIES, false), data); // warm-up of the JVM, not counted
        }
        long cold = quick ? time(s, data) : 0;
        long none = quick ? cold : time(new Settings(1000, COPIES, false), data);
        cold = quick ? cold : time(s, data);
        long warm = Long.MAX_VALUE;
        for (int i = 0; i < 3; i++) {
            warm = Math.min(warm, time(s, data));
        }
        // one changed a_n: that dataset is parsed again, the unchanged forms' results come from the cache
        Path c = data.resolve("coefficients.csv");
        String text = Files.readString(c);
        Files.writeString(c, text.replaceFirst("\nc0,7,\"[^\"]*\"", "\nc0,7,\"" + values.get(6) + " + 0\""));
        long oneChanged = time(s, data);
        if (quick) {
            System.out.printf("cold, writing the cache (no warm-up): %d ms%n", cold / 1_000_000);
        } else {
            System.out.printf("cold without cache (after a warm-up run): %d ms; cold, writing the cache: %d ms%n",
                    none / 1_000_000, cold / 1_000_000);
        }
        System.out.printf("unchanged re-run (best of 3): %d ms = %.1f× faster than cold%n",
                warm / 1_000_000, (double) none / warm);
        System.out.printf("one a_n rewritten (same value): %d ms = %.1f× faster than cold%n",
                oneChanged / 1_000_000, (double) none / oneChanged);
    }

    private static void threads(Path dir, int forms) throws IOException {
        level11(dir, forms);
        long[] best = {Long.MAX_VALUE, Long.MAX_VALUE};
        for (int round = 0; round < 6; round++) { // interleaved, best of 5 after a warm-up round
            for (int t = 1; t <= 2; t++) {
                long ns = time(new Settings(1000, COPIES, false).withThreads(t), dir);
                if (round > 0) {
                    best[t - 1] = Math.min(best[t - 1], ns);
                }
            }
        }
        for (int t = 1; t <= 2; t++) {
            System.out.printf("%d thread%s: %d ms, %,.0f rows/s%n", t, t == 1 ? "" : "s", best[t - 1] / 1_000_000,
                    forms * 1000L * 1e9 / best[t - 1]);
        }
    }

    private static void memory(Path dir, int forms) throws IOException {
        level11(dir, forms);
        System.out.printf("table: %d rows, %.1f MB; max heap %d MB%n", forms * 1000L,
                Files.size(dir.resolve("coefficients.csv")) / 1e6, Runtime.getRuntime().maxMemory() >> 20);
        long ns = time(new Settings(1000, COPIES, false).withThreads(Settings.availableThreads()), dir);
        System.out.printf("passed in %d ms (%,.0f rows/s)%n", ns / 1_000_000, forms * 1000L * 1e9 / ns);
    }

    private static void level11(Path dir, int forms) throws IOException {
        Fixture level11 = Fixture.of("reference/level11.csv");
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("forms.csv"), StandardCharsets.UTF_8)) {
            w.write("id,level,weight\n");
            for (int i = 0; i < forms; i++) {
                w.write("copy" + i + ",11,2\n");
            }
        }
        List<String> values = new ArrayList<>();
        for (int n = 1; n <= 1000; n++) {
            values.add(level11.valueOf("f11", n));
        }
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("coefficients.csv"), StandardCharsets.UTF_8)) {
            w.write("form,n,value\n");
            for (int i = 0; i < forms; i++) {
                for (int n = 1; n <= 1000; n++) {
                    w.write("copy" + i + "," + n + "," + values.get(n - 1) + "\n");
                }
            }
        }
    }

    /** With {@code -Deigengate.bench.reports=true}: the run as the goal does it, report.html's observer included. */
    /** The tables are copies of one form under distinct ids, which duplicate-orbit rightly refuses. */
    private static final Set<String> COPIES = Set.of("duplicate-orbit");

    private static final boolean REPORTS = Boolean.getBoolean("eigengate.bench.reports");

    private static long time(Settings s, Path dir) {
        long t0 = System.nanoTime();
        Report r;
        try {
            r = REPORTS ? io.github.eigengate.report.GateRun.run(s, List.of(new Gate.Dataset(dir, "bench")),
                    dir.resolveSibling(dir.getFileName() + "-reports"),
                    Set.copyOf(io.github.eigengate.report.ReportFiles.FORMATS), List.of())
                    : new Gate(s).run(List.of(new Gate.Dataset(dir, "bench")));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        long ns = System.nanoTime() - t0;
        if (r.failed()) {
            throw new IllegalStateException("real data failed: " + r.findings().get(0).line());
        }
        return ns;
    }
}
