package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.report.JUnitXmlReport;
import io.github.eigengate.report.JsonReport;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Mutates the committed real datasets (src/test/resources/datasets, from PARI/GP; see fixtures-gp/) and asserts, for
 * every mutant: the engine returns a report (no exception escapes, no check fails internally), it finishes in time
 * within the work budget, the dataset's files are left byte-identical, and a second run (on another number of
 * threads) gives the same report. Seeded, so a failure names the mutant that reproduces it.
 *
 * <p>CI runs {@value #DEFAULT_MUTANTS} mutants. A long run (docs/configuration.md, "Fuzzing"):
 * {@code mvn -pl plugin test -Dtest=FuzzTest -Deigengate.fuzz.mutants=100000 -Deigengate.fuzz.seed=7}. A crash a
 * long run finds becomes a case of {@link FuzzRegressionTest}.
 */
class FuzzTest {

    static final int DEFAULT_MUTANTS = 2000;

    /** Data rows kept of each coefficient file: the seeds stay small enough for thousands of runs a minute. */
    static final int ROWS = 40;

    static final List<String> DATASETS = List.of("level1", "weight2", "higherlevel", "bigfields", "modp",
            "congruences");

    /** The seeds: per dataset, file name → bytes. */
    static final Map<String, Map<String, byte[]>> SEEDS = new TreeMap<>();

    static Path root;

    @BeforeAll
    static void seeds() throws IOException {
        root = Files.createTempDirectory("eigengate-fuzz");
        for (String d : DATASETS) {
            Map<String, byte[]> files = new TreeMap<>();
            try (Stream<Path> s = Files.list(Fixture.dataset(d))) {
                for (Path p : s.sorted().toList()) {
                    byte[] b = Files.readAllBytes(p);
                    String name = p.getFileName().toString();
                    files.put(name, name.startsWith("coefficients") ? prefix(b, ROWS) : b);
                }
            }
            SEEDS.put(d, files);
        }
    }

    @AfterAll
    static void clean() throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    /** The comment lines, the header and the first {@code rows} data rows. */
    static byte[] prefix(byte[] file, int rows) {
        String[] lines = new String(file, StandardCharsets.UTF_8).split("\n", -1);
        StringBuilder b = new StringBuilder();
        int data = -1;
        for (String l : lines) {
            if (!l.startsWith("#")) {
                data++;
            }
            if (data > rows) {
                break;
            }
            b.append(l).append('\n');
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    @TestFactory
    Stream<DynamicTest> mutantsGiveACleanReproducibleReport() {
        int mutants = Integer.getInteger("eigengate.fuzz.mutants", DEFAULT_MUTANTS);
        long seed = Long.getLong("eigengate.fuzz.seed", 20261202L);
        return IntStream.range(0, mutants).mapToObj(i -> {
            Random rnd = new Random(seed * 1_000_003L + i);
            String dataset = DATASETS.get(rnd.nextInt(DATASETS.size()));
            Map<String, byte[]> files = new TreeMap<>(SEEDS.get(dataset));
            List<String> names = new ArrayList<>(files.keySet());
            StringBuilder what = new StringBuilder(dataset);
            int edits = 1 + (rnd.nextInt(4) == 0 ? rnd.nextInt(3) : 0);
            for (int e = 0; e < edits; e++) {
                String name = pick(rnd, names);
                files.put(name, Mutator.mutate(files.get(name), rnd, what.append(' ').append(name).append(':')));
            }
            return DynamicTest.dynamicTest("mutant " + i + " (seed " + seed + "): " + what, () -> check(i, files));
        });
    }

    /** Names of coefficients files and forms.csv are picked more often: most of the reading happens there. */
    private static String pick(Random rnd, List<String> names) {
        if (rnd.nextInt(3) > 0) {
            for (String n : names) {
                if (n.equals(rnd.nextBoolean() ? "forms.csv" : "coefficients.csv")) {
                    return n;
                }
            }
        }
        return names.get(rnd.nextInt(names.size()));
    }

    private static void check(int i, Map<String, byte[]> files) throws IOException {
        Path dir = root.resolve("m" + i);
        Files.createDirectories(dir);
        for (Map.Entry<String, byte[]> f : files.entrySet()) {
            Files.write(dir.resolve(f.getKey()), f.getValue());
        }
        String before = digest(dir);
        Settings settings = new Settings(200, Set.of(), false).withWorkBudget(200_000_000L, false);
        List<Gate.Dataset> sets = List.of(new Gate.Dataset(dir, "data"));
        Report one = org.junit.jupiter.api.Assertions.assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> new Gate(settings).run(sets));
        Report two = org.junit.jupiter.api.Assertions.assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> new Gate(settings.withThreads(2)).run(sets));
        assertEquals(before, digest(dir), "the gate changed a dataset file");
        List<String> internal = one.findings().stream().filter(f -> f.reason().startsWith("internal error"))
                .map(f -> f.line()).toList();
        assertEquals(List.of(), internal);
        assertEquals(rendered(one), rendered(two));
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.toList()) {
                Files.delete(p);
            }
        }
        Files.delete(dir);
    }

    private static String rendered(Report r) {
        return r.summary() + "\n" + String.join("\n", Datasets.lines(r)) + "\n" + JsonReport.render(r)
                + JUnitXmlReport.render(r);
    }

    private static String digest(Path dir) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.sorted().toList()) {
                md.update(p.getFileName().toString().getBytes(StandardCharsets.UTF_8));
                md.update(Files.readAllBytes(p));
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }

    /** The mutations: each appends what it did to {@code what}, so a failing mutant can be understood. */
    static final class Mutator {

        private Mutator() {
        }

        static byte[] mutate(byte[] b, Random rnd, StringBuilder what) {
            int kind = rnd.nextInt(15);
            List<String> lines = new ArrayList<>(Arrays.asList(new String(b, StandardCharsets.UTF_8).split("\n", -1)));
            int l = rnd.nextInt(Math.max(1, lines.size()));
            switch (kind) {
                case 0 -> {
                    byte[] c = b.clone();
                    int n = 1 + rnd.nextInt(4);
                    for (int k = 0; k < n && c.length > 0; k++) {
                        int at = rnd.nextInt(c.length);
                        c[at] ^= (byte) (1 << rnd.nextInt(8));
                    }
                    what.append("flip ").append(n).append(" bits");
                    return c;
                }
                case 1 -> {
                    int at = b.length == 0 ? 0 : rnd.nextInt(b.length);
                    what.append("truncate at ").append(at);
                    return Arrays.copyOf(b, at);
                }
                case 2 -> {
                    what.append("delete line ").append(l + 1);
                    if (!lines.isEmpty()) {
                        lines.remove(l);
                    }
                }
                case 3 -> {
                    what.append("duplicate line ").append(l + 1);
                    lines.add(Math.min(lines.size(), l + 1 + rnd.nextInt(3)), lines.get(l));
                }
                case 4 -> {
                    int m = rnd.nextInt(lines.size());
                    what.append("swap lines ").append(l + 1).append(',').append(m + 1);
                    String t = lines.get(l);
                    lines.set(l, lines.get(m));
                    lines.set(m, t);
                }
                case 5 -> {
                    String g = garbage(rnd);
                    what.append("garbage cell on line ").append(l + 1).append(" (").append(Math.min(40, g.length()))
                        .append(" of ").append(g.length()).append(" chars: ").append(g, 0, Math.min(40, g.length()))
                        .append(')');
                    lines.set(l, replaceCell(lines.get(l), rnd, g));
                }
                case 6 -> {
                    String g = enormous(rnd);
                    what.append("enormous cell on line ").append(l + 1).append(" (").append(g, 0, Math.min(12, g.length())).append("…, ")
                        .append(g.length()).append(" chars)");
                    lines.set(l, replaceCell(lines.get(l), rnd, g));
                }
                case 7 -> {
                    byte[][] bad = {{(byte) 0xff}, {(byte) 0xc3}, {(byte) 0xe2, (byte) 0x82}, {(byte) 0xed, (byte) 0xa0,
                        (byte) 0x80}, {(byte) 0xc0, (byte) 0xaf}, {(byte) 0xf4, (byte) 0x90, (byte) 0x80, (byte) 0x80}};
                    byte[] ins = bad[rnd.nextInt(bad.length)];
                    int at = rnd.nextInt(b.length + 1);
                    what.append("invalid UTF-8 at byte ").append(at);
                    ByteArrayOutputStream o = new ByteArrayOutputStream();
                    o.write(b, 0, at);
                    o.writeBytes(ins);
                    o.write(b, at, b.length - at);
                    return o.toByteArray();
                }
                case 8 -> {
                    what.append("BOM");
                    ByteArrayOutputStream o = new ByteArrayOutputStream();
                    o.writeBytes(new byte[] {(byte) 0xef, (byte) 0xbb, (byte) 0xbf});
                    o.writeBytes(b);
                    return o.toByteArray();
                }
                case 9 -> {
                    what.append("CRLF");
                    return new String(b, StandardCharsets.UTF_8).replace("\n", "\r\n").getBytes(StandardCharsets.UTF_8);
                }
                case 10 -> {
                    String s = lines.get(l);
                    int at = rnd.nextInt(s.length() + 1);
                    what.append("stray quote on line ").append(l + 1).append(" at ").append(at);
                    lines.set(l, s.substring(0, at) + '"' + s.substring(at));
                }
                case 11 -> {
                    int h = header(lines);
                    String[] cols = lines.get(h).split(",", -1);
                    int c = rnd.nextInt(cols.length);
                    int how = rnd.nextInt(4);
                    what.append("header ").append(new String[] {"rename", "delete", "duplicate", "empty"}[how])
                        .append(" column ").append(c + 1);
                    List<String> cs = new ArrayList<>(Arrays.asList(cols));
                    switch (how) {
                        case 0 -> cs.set(c, cs.get(c) + "x");
                        case 1 -> cs.remove(c);
                        case 2 -> cs.add(cs.get(c));
                        default -> cs.set(c, "");
                    }
                    lines.set(h, String.join(",", cs));
                }
                case 12 -> {
                    String[] odd = {"\u0000", "\uFFFE", "\uFFFF", "\u0007", "\u001b[31m", "\u2028", "\uD83D\uDE00",
                        "\u00a0", "\t", "\r"};
                    String s = lines.get(l);
                    int at = rnd.nextInt(s.length() + 1);
                    String o = odd[rnd.nextInt(odd.length)];
                    what.append("odd character U+").append(String.format("%04X", (int) o.charAt(0)))
                        .append(" on line ").append(l + 1);
                    lines.set(l, s.substring(0, at) + o + s.substring(at));
                }
                case 13 -> {
                    what.append("blank lines and whitespace-only lines");
                    lines.add(l, rnd.nextBoolean() ? "" : "   \t ");
                }
                default -> {
                    String s = lines.get(l);
                    what.append("extra cells on line ").append(l + 1);
                    lines.set(l, s + ",".repeat(1 + rnd.nextInt(3)) + (rnd.nextBoolean() ? "7" : ""));
                }
            }
            return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
        }

        private static int header(List<String> lines) {
            for (int i = 0; i < lines.size(); i++) {
                if (!lines.get(i).startsWith("#")) {
                    return i;
                }
            }
            return 0;
        }

        private static String replaceCell(String line, Random rnd, String cell) {
            String[] cells = line.split(",", -1);
            int c = rnd.nextInt(cells.length);
            cells[c] = rnd.nextBoolean() && cell.indexOf('"') < 0 ? "\"" + cell + "\"" : cell;
            return String.join(",", cells);
        }

        private static String garbage(Random rnd) {
            String[] pieces = {"x", "^", "*", "/", "+", "-", "0", "1", "9", "[", "]", ",", "(", ")", ";", " ", "y", "é",
                "x^", "1/0", "--", "[1,2]", "x^2", "2147483648", "-0", "e5", "NaN", "∞", "\\", "\"\""};
            StringBuilder b = new StringBuilder();
            int n = 1 + rnd.nextInt(12);
            for (int i = 0; i < n; i++) {
                b.append(pieces[rnd.nextInt(pieces.length)]);
            }
            return b.toString();
        }

        private static String enormous(Random rnd) {
            return switch (rnd.nextInt(8)) {
                case 0 -> "9".repeat(1000 + rnd.nextInt(200_000));
                case 1 -> "x^" + (90_000 + rnd.nextInt(20_000));
                case 2 -> "x^" + (1000 + rnd.nextInt(9000)) + " - 1";
                case 3 -> "1" + "0".repeat(1 + rnd.nextInt(100_000)) + "/7";
                case 4 -> "[" + "1,".repeat(rnd.nextInt(5000)) + "1]";
                case 5 -> "x+".repeat(1 + rnd.nextInt(100_000)) + "1";
                case 6 -> "x^" + (64 + rnd.nextInt(900)) + " - 2";
                default -> "(".repeat(1 + rnd.nextInt(10_000));
            };
        }
    }
}
