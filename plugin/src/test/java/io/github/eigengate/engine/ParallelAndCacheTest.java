package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.report.ReportFiles;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reports do not depend on the number of threads or on the cache: every report file, byte for byte, on the real
 * datasets under src/test/resources/datasets (computed with PARI/GP 2.15.2; the scripts under fixtures-gp/ and the
 * header of each CSV give the commands), including true congruences with their certificates and planted errors.
 */
class ParallelAndCacheTest {

    static final List<String> ALL = List.of("level1", "weight2", "higherlevel", "bigfields", "modp", "congruences");

    @TempDir
    Path dir;

    static List<Gate.Dataset> datasets() {
        return ALL.stream().map(n -> new Gate.Dataset(Fixture.dataset(n), n)).toList();
    }

    /** Every report file of a run, with the console lines, as file name → bytes (as text). */
    static Map<String, String> files(Report r, Path out) {
        try {
            ReportFiles.write(r, out);
            Map<String, String> all = new TreeMap<>();
            try (Stream<Path> s = Files.walk(out)) {
                for (Path p : s.filter(Files::isRegularFile).toList()) {
                    all.put(out.relativize(p).toString(), Files.readString(p, StandardCharsets.UTF_8));
                }
            }
            all.put("console", r.summary() + "\n" + String.join("\n", Datasets.lines(r)));
            return all;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A planted error in the weight-2 data: with it, reports hold findings from several checks. */
    private Path planted() throws IOException {
        Path d = dir.resolve("planted");
        Files.createDirectories(d);
        try (Stream<Path> s = Files.list(Fixture.dataset("weight2"))) {
            for (Path p : s.toList()) {
                Files.copy(p, d.resolve(p.getFileName()));
            }
        }
        Path c = d.resolve("coefficients.csv");
        List<String> lines = Files.readAllLines(c);
        for (int i = 0; i < lines.size(); i++) {
            if (!lines.get(i).startsWith("#") && lines.get(i).matches("[^,]+,7,.*")) {
                lines.set(i, lines.get(i).replaceFirst(",7,(.*)$", ",7,\"$1+1\""));
                break;
            }
        }
        Files.write(c, lines);
        return d;
    }

    private List<Gate.Dataset> withPlanted() throws IOException {
        List<Gate.Dataset> sets = new java.util.ArrayList<>(datasets());
        sets.add(new Gate.Dataset(planted(), "planted"));
        return sets;
    }

    private static Settings base() {
        return new Settings(1000, Set.of(), true);
    }

    @Test
    void oneAndFourThreadsWriteTheSameReports() throws IOException {
        List<Gate.Dataset> sets = withPlanted();
        Report one = new Gate(base()).run(sets);
        Report four = new Gate(base().withThreads(4)).run(sets);
        assertTrue(one.errors() > 0, "the planted error is found");
        assertTrue(!one.certificates().isEmpty());
        assertEquals(files(one, dir.resolve("one")), files(four, dir.resolve("four")));
        assertEquals(files(one, dir.resolve("again")), files(new Gate(base().withThreads(3)).run(sets),
                dir.resolve("three")));
    }

    /** Every file a run writes as the goal and the command line do it (report.html included), with the console. */
    private Map<String, String> fullRun(Settings settings, List<Gate.Dataset> sets, String name) throws IOException {
        Path out = dir.resolve(name);
        Report r = io.github.eigengate.report.GateRun.run(settings, sets, out, Set.copyOf(ReportFiles.FORMATS),
                List.of());
        Map<String, String> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(out)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                all.put(out.relativize(p).toString(), Files.readString(p, StandardCharsets.UTF_8));
            }
        }
        all.put("console", r.summary() + "\n" + String.join("\n", Datasets.lines(r)));
        return all;
    }

    @Test
    void theHtmlReportIsTheSameAtOneAndFourThreadsAndFromTheCache() throws IOException {
        List<Gate.Dataset> sets = withPlanted();
        Map<String, String> one = fullRun(base(), sets, "html-one");
        assertTrue(one.containsKey("report.html"), one.keySet().toString());
        assertTrue(one.get("report.html").contains("eg-scatter"), "plots drawn");
        assertEquals(one, fullRun(base().withThreads(4), sets, "html-four"));
        Path cache = dir.resolve("html-cache");
        assertEquals(one, fullRun(base().withCache(cache).withThreads(2), sets, "html-cold"));
        assertEquals(one, fullRun(base().withCache(cache), sets, "html-warm"));
    }

    @Test
    void aCachedRunWritesTheSameReportsAndAChangeIsSeen() throws IOException {
        List<Gate.Dataset> sets = withPlanted();
        Path cache = dir.resolve("cache");
        Map<String, String> cold = files(new Gate(base()).run(sets), dir.resolve("cold"));
        Report first = new Gate(base().withCache(cache).withThreads(2)).run(sets);
        Report second = new Gate(base().withCache(cache)).run(sets);
        assertEquals(cold, files(first, dir.resolve("first")));
        assertEquals(cold, files(second, dir.resolve("second")));
        assertEquals(List.of(), second.notices());
        // a changed a_n: that dataset is checked again (its unchanged forms come from the per-form cache)
        Path c = sets.get(sets.size() - 1).directory().resolve("coefficients.csv");
        String text = Files.readString(c);
        Files.writeString(c, text.replace("+1\"", "\""));
        Report fixed = new Gate(base().withCache(cache)).run(sets);
        assertEquals(files(new Gate(base()).run(sets), dir.resolve("fresh")), files(fixed, dir.resolve("fixed")));
        assertNotEquals(cold.get("console"), files(fixed, dir.resolve("fixed2")).get("console"));
    }

    @Test
    void damagedCacheEntriesAreIgnoredWithANoticeAndRebuilt() throws IOException {
        List<Gate.Dataset> sets = datasets().subList(0, 2);
        Path cache = dir.resolve("cache");
        Map<String, String> cold = files(new Gate(base()).run(sets), dir.resolve("cold"));
        new Gate(base().withCache(cache)).run(sets);
        List<Path> entries;
        try (Stream<Path> s = Files.walk(cache)) {
            entries = s.filter(Files::isRegularFile).sorted().toList();
        }
        assertTrue(entries.size() > 2);
        int i = 0;
        for (Path e : entries) {
            byte[] b = Files.readAllBytes(e);
            switch (i++ % 3) {
                case 0 -> Files.write(e, java.util.Arrays.copyOf(b, b.length / 2)); // truncated
                case 1 -> {
                    b[b.length - 3] ^= 1; // one bit flipped
                    Files.write(e, b);
                }
                default -> Files.writeString(e, "something else\n"); // foreign
            }
        }
        Report damaged = new Gate(base().withCache(cache)).run(sets);
        assertEquals(cold, files(damaged, dir.resolve("damaged")));
        assertTrue(!damaged.notices().isEmpty());
        assertTrue(damaged.notices().stream().allMatch(n -> n.startsWith("eigengate cache: entry ")
                && n.endsWith("; it is ignored and rebuilt")), damaged.notices().toString());
        Report rebuilt = new Gate(base().withCache(cache)).run(sets);
        assertEquals(List.of(), rebuilt.notices());
        assertEquals(cold, files(rebuilt, dir.resolve("rebuilt")));
    }
}
