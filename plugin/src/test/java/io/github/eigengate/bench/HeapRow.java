package io.github.eigengate.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The smallest heap (-Xmx, from a ladder) with which a child JVM runs the whole gate on one rational form with
 * {@code rows} coefficients ({@link GateRow}'s table) and passes.
 */
final class HeapRow implements Bench.Report {

    private static final int[] LADDER_MB = {32, 48, 64, 96, 128, 192, 256, 384, 512, 768, 1024, 1536};

    private final String name;
    private final int rows;

    HeapRow(String name, int rows) {
        this.name = name;
        this.rows = rows;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String title() {
        return "smallest heap that passes: one rational form with " + rows + " coefficients";
    }

    @Override
    public String measure(Path work) throws IOException {
        Path dir = GateRow.dataset(work, 1, rows);
        int lo = -1; // largest failing index
        int hi = LADDER_MB.length; // smallest passing index
        List<String> tried = new ArrayList<>();
        while (hi - lo > 1) {
            int mid = (lo + hi) / 2;
            boolean ok = passes(dir, LADDER_MB[mid]);
            tried.add(LADDER_MB[mid] + " MB " + (ok ? "passes" : "fails"));
            if (ok) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        String best = hi == LADDER_MB.length ? "more than " + LADDER_MB[LADDER_MB.length - 1] + " MB"
                : LADDER_MB[hi] + " MB";
        return "smallest passing -Xmx: " + best + " (" + String.join(", ", tried) + ")";
    }

    private static boolean passes(Path dir, int mb) throws IOException {
        List<String> cmd = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx" + mb + "m", "-cp", System.getProperty("java.class.path"), Bench.class.getName(),
                "--gate-once", dir.toAbsolutePath().toString());
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        p.getInputStream().readAllBytes();
        try {
            return p.waitFor(30, TimeUnit.MINUTES) && p.exitValue() == 0;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
