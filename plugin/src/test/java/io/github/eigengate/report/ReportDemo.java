package io.github.eigengate.report;

import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

/**
 * The report-demo dataset (fixtures-gp/report-demo.gp: S_2^new(Γ0(N)) for N = 11, 32, 23 from PARI/GP) copied to a
 * directory, optionally with one planted error: a_7 of the level-11 form set to 9 (true value −2, OEIS A006571),
 * which breaks Deligne's bound at p = 7 and the Hecke relations at every multiple of 7.
 */
final class ReportDemo {

    static final String FORM = "lev11_wt2_o1";

    private ReportDemo() {
    }

    static Path copy(Path dir, boolean broken) throws IOException {
        Path src = Fixture.dataset("report-demo");
        Files.createDirectories(dir);
        for (String f : List.of("forms.csv", "spaces.csv")) {
            Files.copy(src.resolve(f), dir.resolve(f));
        }
        Fixture c = Fixture.of("datasets/report-demo/coefficients.csv");
        if (broken) {
            c.plant(FORM, 7, "9");
        }
        Files.writeString(dir.resolve("coefficients.csv"), c.text());
        return dir;
    }

    /** Runs the gate with the report's observer over {@code data} and writes every format into {@code out}. */
    static Report run(Path data, Path out) throws IOException {
        return GateRun.run(Settings.defaults(), List.of(new Gate.Dataset(data, "data")), out,
                Set.copyOf(ReportFiles.FORMATS), List.of());
    }
}
