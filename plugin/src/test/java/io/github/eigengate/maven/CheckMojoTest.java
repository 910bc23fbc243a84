package io.github.eigengate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.engine.Fixture;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.maven.plugin.MojoFailureException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** failOnError and failOnWarning, and the files every run writes. */
class CheckMojoTest {

    @TempDir
    Path dir;

    /**
     * forms.csv and coefficients.csv of the level-11 weight-2 form, a_1..a_5 = 1, -2, -1, 2, 1 (OEIS A006571), with
     * {@code a1} as a_1 (one error: the prime-power recursion starts from a_p and a_1 = 1, so a wrong a_1 breaks no other relation) and, when {@code extraColumn}, an unknown column that the reader warns about.
     */
    private Path dataset(String a1, boolean extraColumn) throws IOException {
        Path d = dir.resolve("data");
        Files.createDirectories(d);
        Files.writeString(d.resolve("forms.csv"), "id,level,weight,character,field\nlev11_wt2_o1,11,2,,\n");
        String h = extraColumn ? "form,n,value,remark\n" : "form,n,value\n";
        String x = extraColumn ? ",-" : "";
        Files.writeString(d.resolve("coefficients.csv"), h + "lev11_wt2_o1,1," + a1 + x + "\nlev11_wt2_o1,2,-2" + x
                + "\nlev11_wt2_o1,3,-1" + x + "\nlev11_wt2_o1,4,2" + x + "\nlev11_wt2_o1,5,1" + x + "\n");
        return d;
    }

    @Test
    void anErrorFailsTheBuildByDefault() throws IOException {
        CheckMojo m = MojoRunner.check(dir, List.of(dataset("2", false)));
        List<String> log = MojoRunner.capture(m);
        MojoFailureException e = assertThrows(MojoFailureException.class, m::execute);
        assertEquals("eigengate: 1 error and 0 warnings in the data (listed above; full report in "
                + "target/eigengate/report.html)", e.getMessage());
        assertEquals("[ERROR] data/coefficients.csv:2: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, "
                + "found 2; a newform is normalised so that a_1 = 1", log.get(1));
        for (String f : List.of("report.html", "report.json", "TEST-eigengate.xml")) {
            assertTrue(Files.isRegularFile(dir.resolve("target/eigengate").resolve(f)), f);
        }
    }

    @Test
    void failOnErrorFalseOnlyReports() throws Exception {
        CheckMojo m = MojoRunner.check(dir, List.of(dataset("2", false)));
        MojoRunner.set(m, "failOnError", false);
        List<String> log = MojoRunner.capture(m);
        m.execute();
        assertEquals("[WARNING] eigengate: failOnError is false: the build goes on despite 1 error (listed above; "
                + "full report in target/eigengate/report.html)", log.get(log.size() - 1));
    }

    @Test
    void aWarningFailsOnlyWithFailOnWarning() throws Exception {
        Path d = dataset("1", true);
        CheckMojo lenient = MojoRunner.check(dir, List.of(d));
        List<String> log = MojoRunner.capture(lenient);
        lenient.execute();
        assertTrue(log.stream().anyMatch(l -> l.startsWith("[WARNING] data/coefficients.csv:1:4: warning "
                + "[table-format]")), String.join("\n", log));
        CheckMojo strict = MojoRunner.check(dir, List.of(d));
        MojoRunner.set(strict, "failOnWarning", true);
        MojoRunner.capture(strict);
        MojoFailureException e = assertThrows(MojoFailureException.class, strict::execute);
        assertEquals("eigengate: 0 errors and 1 warning in the data (listed above; full report in "
                + "target/eigengate/report.html); failOnWarning is set", e.getMessage());
    }

    @Test
    void theReportDemoDatasetPasses() throws Exception {
        CheckMojo m = MojoRunner.check(dir, List.of(Fixture.dataset("report-demo")));
        // the fixture lies outside this test's project directory, which would bound what is read (docs/limits.md)
        MojoRunner.set(m, "root", Fixture.dataset("report-demo").toFile());
        List<String> log = MojoRunner.capture(m);
        m.execute();
        assertTrue(log.get(0).startsWith("[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (3 forms"),
                log.get(0));
    }
}
