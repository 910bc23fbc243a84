package io.github.eigengate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.engine.Checks;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Settings;
import io.github.eigengate.maven.CheckMojo;
import io.github.eigengate.maven.MojoRunner;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.maven.plugin.MojoFailureException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line: every exit code, the options, and the same console lines as the Maven goal. */
class MainTest {

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
        List<String> lines() {
            return out.lines().toList();
        }
    }

    private Run run(String... args) {
        return run(false, args);
    }

    private Run run(boolean terminal, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, dir, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), terminal);
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /**
     * The report-demo dataset (PARI/GP, fixtures-gp/report-demo.gp) copied to {@code name}, with a_7 of the level-11
     * form set to 9 when {@code broken} (true value −2, OEIS A006571).
     */
    private Path demo(String name, boolean broken) throws IOException {
        Path d = dir.resolve(name);
        Files.createDirectories(d);
        Path src = Fixture.dataset("report-demo");
        Files.copy(src.resolve("forms.csv"), d.resolve("forms.csv"));
        Files.copy(src.resolve("spaces.csv"), d.resolve("spaces.csv"));
        Fixture c = Fixture.of("datasets/report-demo/coefficients.csv");
        if (broken) {
            c.plant("lev11_wt2_o1", 7, "9");
        }
        Files.writeString(d.resolve("coefficients.csv"), c.text());
        return d;
    }

    @Test
    void exit0WhenTheTablesPass() throws IOException {
        demo("data", false);
        Run r = run("data");
        assertEquals(0, r.code(), r.err());
        assertEquals(List.of("[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (3 forms, 450 coefficient "
                + "rows, 22 checks)", "[INFO] eigengate: report in target/eigengate/report.html"), r.lines());
        for (String f : List.of("report.html", "report.json", "TEST-eigengate.xml")) {
            assertTrue(Files.isRegularFile(dir.resolve("target/eigengate").resolve(f)), f);
        }
        assertEquals("", r.err(), "no progress line when stderr is not a terminal");
    }

    @Test
    void exit1OnErrorsWithTheFindingLines() throws IOException {
        demo("data", true);
        Run r = run("data");
        assertEquals(1, r.code());
        assertEquals("[ERROR] eigengate: 10 errors, 0 warnings, 0 notes in 1 dataset (3 forms, 450 coefficient rows, "
                + "22 checks)", r.lines().get(0));
        assertTrue(r.lines().contains("[ERROR] data/coefficients.csv:12: error [ramanujan-bound] form=lev11_wt2_o1 "
                + "n=7: expected a_p^2 <= 4*p^(k-1) = 28, found a_p^2 = 81; Deligne's bound |a_p| <= 2 p^((k-1)/2) "
                + "fails at p=7"), r.out());
        assertEquals("[ERROR] eigengate: report in target/eigengate/report.html", r.lines().get(11));
    }

    @Test
    void theConsoleLinesEqualTheMavenGoals() throws Exception {
        Path data = demo("data", true);
        Run cli = run("data");
        CheckMojo mojo = MojoRunner.check(dir, List.of(data));
        MojoRunner.set(mojo, "outputDirectory", dir.resolve("mvn-out").toFile());
        List<String> mvn = MojoRunner.capture(mojo);
        assertThrows(MojoFailureException.class, mojo::execute);
        assertEquals(11, mvn.size());
        assertEquals(mvn, cli.lines().subList(0, 11));
    }

    @Test
    void exit2OnBadUsage() throws IOException {
        demo("data", false);
        assertEquals(2, run().code(), "no dataset");
        Run unknownOption = run("--no-such-option", "data");
        assertEquals(2, unknownOption.code());
        assertTrue(unknownOption.err().startsWith("eigengate: Unknown option: '--no-such-option'"), unknownOption.err());
        Run unknownCheck = run("--skip-checks", "no-such-check", "data");
        assertEquals(2, unknownCheck.code());
        assertTrue(unknownCheck.err().startsWith("eigengate: unknown check 'no-such-check' in --skip-checks; known "
                + "checks: normalisation, "), unknownCheck.err());
        assertEquals("eigengate: --uncertified must be error or warning, was 'maybe'\nTry 'eigengate --help' for "
                + "more.\n", run("--uncertified", "maybe", "data").err());
        assertEquals(2, run("--max-findings", "0", "data").code());
        assertEquals(2, run("--max-findings", "many", "data").code());
        assertEquals(2, run("--format", "pdf", "data").code());
        Run missing = run("no-such-dir");
        assertEquals(2, missing.code());
        assertEquals("eigengate: not a dataset directory: no-such-dir\nTry 'eigengate --help' for more.\n",
                missing.err());
    }

    @Test
    void exit2WhenTheReportsCannotBeWritten() throws IOException {
        demo("data", false);
        Files.writeString(dir.resolve("blocked"), "a file where the report directory should go");
        Run r = run("--out", "blocked/eigengate", "data");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("eigengate: cannot write reports to blocked/eigengate: "), r.err());
    }

    @Test
    void helpAndVersion() {
        Run help = run("--help");
        assertEquals(0, help.code());
        assertTrue(help.out().startsWith("Usage: eigengate "), help.out());
        for (String option : List.of("--skip-checks", "--max-findings", "--uncertified", "--out", "--format",
                "--fail-on-warning", "--report-only", "--quiet", "Exit codes:")) {
            assertTrue(help.out().contains(option), option);
        }
        Run version = run("--version");
        assertEquals(0, version.code());
        assertTrue(version.out().startsWith("eigengate "), version.out());
    }

    @Test
    void optionsChangeTheRun() throws IOException {
        demo("data", true);
        Run skipped = run("--skip-checks", "hecke-relations,space-traces", "--out", "elsewhere", "data");
        assertEquals(1, skipped.code());
        assertEquals("[ERROR] eigengate: 3 errors, 0 warnings, 0 notes in 1 dataset (3 forms, 450 coefficient rows, "
                + "20 checks)", skipped.lines().get(0));
        assertTrue(Files.isRegularFile(dir.resolve("elsewhere/report.html")));

        Run capped = run("--max-findings", "2", "--out", "capped", "data");
        assertEquals("[ERROR] eigengate: 10 errors, 0 warnings, 0 notes in 1 dataset (3 forms, 450 coefficient rows, "
                + "22 checks); 8 findings beyond the first 2 are counted but not listed", capped.lines().get(0));
        assertEquals(4, capped.lines().size());

        Run json = run("--format", "json", "--out", "json-only", "data");
        assertTrue(Files.isRegularFile(dir.resolve("json-only/report.json")));
        assertFalse(Files.exists(dir.resolve("json-only/report.html")));
        assertFalse(Files.exists(dir.resolve("json-only/TEST-eigengate.xml")));
        assertFalse(json.out().contains("report in"), "no html, so no pointer to it");

        assertEquals(0, run("--report-only", "--out", "lenient", "data").code());
        assertEquals(1, run("--uncertified", "warning", "--out", "u", "data").code(), "accepted; errors remain");
    }

    @Test
    void failOnWarningCountsWarnings() throws IOException {
        Path d = demo("data", false);
        // an unknown column is a warning of the reader (docs/data-contract.md)
        String text = Files.readString(d.resolve("forms.csv")).replace("id,level,weight,character,field",
                "id,level,weight,character,field,remark");
        Files.writeString(d.resolve("forms.csv"), text);
        assertEquals(0, run("data").code());
        assertEquals(1, run("--fail-on-warning", "data").code());
    }

    @Test
    void threadsAndCacheDoNotChangeTheOutput() throws IOException {
        demo("data", true);
        Run one = run("--threads", "1", "--out", "one", "data");
        Run two = run("--threads", "2", "--cache", "cache", "--out", "two", "data");
        Run cached = run("--cache", "cache", "--out", "three", "data");
        assertEquals(1, one.code());
        assertEquals(one.lines().subList(0, 11), two.lines().subList(0, 11));
        assertEquals(one.lines().subList(0, 11), cached.lines().subList(0, 11));
        assertTrue(Files.isDirectory(dir.resolve("cache")), "the cache directory was written");
        assertEquals(Files.readString(dir.resolve("one/report.json")), Files.readString(dir.resolve("three/report.json")));
        assertEquals(2, run("--threads", "0", "data").code());
    }

    @Test
    void twoDatasetsAreCheckedAndNamed() throws IOException {
        demo("first", false);
        demo("second", true);
        Run r = run("first", "second");
        assertEquals(1, r.code());
        assertTrue(r.lines().get(0).contains("in 2 datasets (6 forms, 900 coefficient rows"), r.lines().get(0));
        assertTrue(r.lines().get(1).startsWith("[ERROR] second/"), r.lines().get(1));
        String xml = Files.readString(dir.resolve("target/eigengate/TEST-eigengate.xml"));
        assertTrue(xml.contains("name=\"first: form lev11_wt2_o1\"/>"), xml);
        assertTrue(xml.contains("name=\"second: form lev11_wt2_o1\">"), xml);
    }

    @Test
    void theProgressLineCountsRowsAndForms() throws Exception {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Progress p = new Progress(new PrintStream(err, true, StandardCharsets.UTF_8), true);
        assertEquals("eigengate: 0 rows read, 0 forms checked, 0 rows/s", p.line());
        p.begin();
        Path d = demo("data", false);
        new Gate(Settings.defaults(), Checks.all(Settings.defaults()), List.of(p))
                .run(List.of(new Gate.Dataset(d, "data")));
        Thread.sleep(700);
        p.end();
        assertTrue(p.line().startsWith("eigengate: 450 rows read, 3 forms checked, "), p.line());
        String shown = err.toString(StandardCharsets.UTF_8);
        assertTrue(shown.contains("\r\033[Keigengate: 450 rows read, 3 forms checked, "), shown);
        assertTrue(shown.endsWith("\r\033[K"), "the line is cleared at the end");

        ByteArrayOutputStream quiet = new ByteArrayOutputStream();
        Progress off = new Progress(new PrintStream(quiet, true, StandardCharsets.UTF_8), false);
        off.begin();
        Thread.sleep(600);
        off.end();
        assertEquals("", quiet.toString(StandardCharsets.UTF_8));
    }

    @Test
    void quietSilencesTheProgressLineOnATerminal() throws IOException {
        demo("data", false);
        assertEquals("", run(true, "--quiet", "data").err());
    }

    @Test
    void aPipeIsNotATerminal() {
        // surefire's forked JVM writes stderr to a pipe, as CI and `2> file` do
        assertFalse(Terminal.stderrIsTerminal());
    }
}
