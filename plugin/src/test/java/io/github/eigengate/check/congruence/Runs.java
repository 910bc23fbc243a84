package io.github.eigengate.check.congruence;

import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.IntPredicate;

/** Builds datasets from committed fixtures and runs only the congruence checks on them. */
final class Runs {

    private Runs() {
    }

    /** The fixture's text, keeping comments, the header and the rows of the form with n accepted by the filter. */
    static String rows(String resource, String form, IntPredicate keep) {
        List<String> out = new ArrayList<>();
        for (String line : Fixture.of(resource).text().split("\n", -1)) {
            if (line.startsWith(form + ",")) {
                int n = Integer.parseInt(line.split(",", 3)[1]);
                if (keep.test(n)) {
                    out.add(line);
                }
            } else if (line.startsWith("#") || line.startsWith("form,")) {
                out.add(line);
            }
        }
        return String.join("\n", out) + "\n";
    }

    static String all(String resource) {
        return Fixture.of(resource).text();
    }

    /** Writes name/content pairs into dir and runs the congruence and reducibility checks. */
    static Report run(Path dir, boolean uncertifiedIsWarning, String... nameThenContent) {
        Datasets.write(dir, nameThenContent);
        Settings settings = new Settings(1000, Set.of(), uncertifiedIsWarning);
        return new Gate(settings, List.of(new CongruenceCheck(uncertifiedIsWarning),
                new ReducibleCheck(uncertifiedIsWarning))).run(List.of(new Gate.Dataset(dir, "data")));
    }

    static Report run(Path dir, String... nameThenContent) {
        return run(dir, false, nameThenContent);
    }
}
