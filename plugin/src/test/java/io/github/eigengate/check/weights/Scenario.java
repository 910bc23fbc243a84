package io.github.eigengate.check.weights;

import io.github.eigengate.check.Check;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * A dataset for the weight checks: forms.csv and coefficients.csv from {@code weights/} (PARI/GP, see weights.gp
 * there), plus the claims tables a test writes. Runs only the four weight checks.
 */
final class Scenario {

    static final String WEIGHTS_HEADER = "form,p,prime,local,serre_weight,weights,shape,exponents\n";
    static final String CONGRUENCES_HEADER = "form,other,p,twist\n";
    static final String REDUCIBLE_HEADER = "form,p,i,j\n";

    private final List<String> files = new ArrayList<>();

    private Scenario() {
        files.add("forms.csv");
        files.add(Fixture.of("weights/forms.csv").text());
        files.add("coefficients.csv");
        files.add(Fixture.of("weights/coefficients.csv").text());
    }

    /** modp-weights.csv with the given rows (header added). */
    static Scenario weights(String... rows) {
        Scenario s = new Scenario();
        s.files.add("modp-weights.csv");
        s.files.add(WEIGHTS_HEADER + String.join("\n", rows) + "\n");
        return s;
    }

    Scenario congruences(String... rows) {
        files.add("congruences.csv");
        files.add(CONGRUENCES_HEADER + String.join("\n", rows) + "\n");
        return this;
    }

    Scenario reducible(String... rows) {
        files.add("reducible.csv");
        files.add(REDUCIBLE_HEADER + String.join("\n", rows) + "\n");
        return this;
    }

    Scenario file(String name, String content) {
        files.add(name);
        files.add(content);
        return this;
    }

    Report report(Path dir, Set<String> skip) {
        Datasets.write(dir, files.toArray(new String[0]));
        List<Check> checks = WeightChecks.all(skip).stream().filter(c -> !skip.contains(c.id())).toList();
        return new Gate(Settings.defaults(), checks).run(List.of(new Gate.Dataset(dir, "data")));
    }

    /** The finding lines of a run of all four checks. */
    List<String> lines(Path dir) {
        return Datasets.lines(report(dir, Set.of()));
    }
}
