package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.report.JUnitXmlReport;
import io.github.eigengate.report.ReportFiles;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Regression cases for what fuzzing the committed datasets found (issue 14). Coefficients of the weight-2 newform of
 * level 11: OEIS A006571, a_1..a_12 = 1, -2, -1, 2, 1, 2, -2, 0, -2, -2, 1, -2.
 */
class FuzzRegressionTest {

    static final String A11 = "form,n,value\n" + "f11,1,1\nf11,2,-2\nf11,3,-1\nf11,4,2\nf11,5,1\nf11,6,2\nf11,7,-2\n"
            + "f11,8,0\nf11,9,-2\nf11,10,-2\nf11,11,1\nf11,12,-2\n";

    @TempDir
    Path dir;

    /** An index near 2^31 made the class-number table throw IllegalArgumentException; now it is a limit. */
    @Test
    void anIndexNearTwoToThe31IsBeyondTheTraceLimitNotACrash() {
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", "id,level,weight\nf11,11,2\n", "spaces.csv",
                "level,weight\n11,2\n", "coefficients.csv", A11 + "f11,2147483647,0\n"));
        assertEquals(List.of("data/spaces.csv:2: warning [space-traces] space=N=11 k=2: expected n ≤ 100000, found n "
                + "up to 2147483647; traces at n > 100000 are not compared (the class-number table the trace "
                + "formula needs would not fit a build)"), Datasets.lines(r));
    }

    /** U+FFFE, U+FFFF and control characters in an id were written raw, and no XML parser read the report. */
    @Test
    void charactersXmlForbidsAreReplacedInTheJUnitReport() throws Exception {
        String id = "f\uFFFE\uFFFF\u0001\u001bx";
        Report r = Datasets.run(Datasets.write(dir, "forms.csv", "id,level,weight\n\"" + id + "\",0,2\n",
                "coefficients.csv", "form,n,value\n"));
        assertEquals(1, r.errors());
        String xml = JUnitXmlReport.render(r);
        DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)));
        assertTrue(xml.contains("form=f\uFFFD\uFFFD\uFFFD\uFFFDx: expected an integer"), xml);
    }

    /** A 300-byte id, a path separator and unencodable characters made certificate writes fail. */
    @Test
    void certificateFileNamesAreSafe() throws IOException {
        Report base = Datasets.run(Datasets.write(dir.resolve("d"), "forms.csv", "id,level,weight\n",
                "coefficients.csv", "form,n,value\n"));
        List<Certificate> certs = List.of(new Certificate("congruence-f-g-p5.txt", "a\n"),
                new Certificate("congruence-" + "x".repeat(300) + "-p5.txt", "b\n"),
                new Certificate("congruence-../../escape-p5.txt", "c\n"),
                new Certificate("congruence-\uD800\uFFFE-p5.txt", "d\n"));
        Report r = new Report(base.datasets(), base.checks(), base.findings(), base.counts(), 0, base.examined(),
                0, 0, certs);
        Path out = dir.resolve("out");
        ReportFiles.write(r, out);
        Set<String> names = new TreeSet<>();
        try (Stream<Path> s = Files.list(out.resolve(ReportFiles.CERTIFICATES))) {
            s.forEach(p -> names.add(p.getFileName().toString()));
        }
        assertEquals(4, names.size(), names.toString());
        assertTrue(names.contains("congruence-f-g-p5.txt"));
        for (String n : names) {
            assertTrue(n.matches("[A-Za-z0-9._-]{1,120}") && !n.startsWith("."), n);
        }
        assertEquals(List.of("escape"), List.of("escape").stream().filter(e -> !Files.exists(dir.resolve(e)))
                .toList());
        Map<String, String> again = Map.of();
        assertEquals(again, Map.of()); // names are a function of the id: the same on every run (below)
        Path out2 = dir.resolve("out2");
        ReportFiles.write(r, out2);
        try (Stream<Path> s = Files.list(out2.resolve(ReportFiles.CERTIFICATES))) {
            assertEquals(names, new TreeSet<>(s.map(p -> p.getFileName().toString()).toList()));
        }
    }

    /** forms.csv as a link to a file outside the dataset echoed that file's first line into the report. */
    @Test
    void tablesThatResolveOutsideTheDatasetAreNotRead() throws IOException {
        Path outside = Datasets.write(dir.resolve("elsewhere"), "secret.csv", "id,level,weight\nTOPSECRET,11,2\n");
        Path d = dir.resolve("d");
        Files.createDirectories(d);
        Files.createSymbolicLink(d.resolve("forms.csv"), outside.resolve("secret.csv"));
        Report r = Datasets.run(d);
        assertEquals(List.of("data/forms.csv: error [table-format] table=data/forms.csv: expected a file inside "
                + d.toRealPath() + ", found " + outside.resolve("secret.csv").toRealPath() + "; the table resolves "
                + "(through symbolic links) outside the project root; it is not read"), Datasets.lines(r));
        // inside the configured root, the same link is followed
        Report inRoot = new Gate(Settings.defaults().withRoot(dir)).run(List.of(new Gate.Dataset(d, "data")));
        assertEquals(List.of(), Datasets.lines(inRoot));
        assertEquals(1, inRoot.forms());
        // a dataset directory that resolves outside the root is refused as a whole
        Files.createSymbolicLink(dir.resolve("linked"), outside);
        Report linked = new Gate(Settings.defaults().withRoot(d)).run(List.of(new Gate.Dataset(dir.resolve("linked"),
                "linked")));
        assertEquals(List.of("linked: error [table-format] dataset=linked: expected a directory inside "
                + d.toRealPath() + ", found " + outside.toRealPath() + "; the dataset directory resolves (through "
                + "symbolic links) outside the project root; it is not read"), Datasets.lines(linked));
    }

    /** Dangling links, FIFOs and directories named like shards were skipped without a word. */
    @Test
    void unreadableShardsAreFindings() throws Exception {
        Path d = Datasets.write(dir.resolve("d"), "forms.csv", "id,level,weight\nf11,11,2\n", "coefficients.csv", A11);
        Files.createSymbolicLink(d.resolve("coefficients-a.csv"), d.resolve("nothing-here.csv"));
        Files.createDirectories(d.resolve("coefficients-b.csv"));
        Process mk = new ProcessBuilder("mkfifo", d.resolve("coefficients-c.csv").toString()).start();
        boolean fifo = mk.waitFor() == 0;
        Report r = Datasets.run(d);
        List<String> expected = new java.util.ArrayList<>(List.of(
                "data/coefficients-a.csv: error [table-format] table=data/coefficients-a.csv: expected a readable file, "
                        + "found a dangling symbolic link; the table is a symbolic link to nothing; it is not read",
                "data/coefficients-b.csv: error [table-format] table=data/coefficients-b.csv: expected a regular file, "
                        + "found a directory; the table is not a regular file; it is not read"));
        if (fifo) {
            expected.add("data/coefficients-c.csv: error [table-format] table=data/coefficients-c.csv: expected a "
                    + "regular file, found a special file (FIFO, device or socket); the table is not a regular file; it "
                    + "is not read");
        }
        assertEquals(expected, Datasets.lines(r));
        assertEquals(12, r.rows());
    }
}
