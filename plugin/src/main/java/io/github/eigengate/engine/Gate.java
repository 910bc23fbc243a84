package io.github.eigengate.engine;

import io.github.eigengate.check.Check;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CatalogReader;
import io.github.eigengate.data.CoefficientReader;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Runs every enabled check over every dataset: read → check → report, in one direction. Plain Java, no Maven
 * types, so the same engine can serve a command line.
 */
public final class Gate {

    private final Settings settings;
    private final List<Check> checks;
    private final List<Observer> observers;

    public Gate(Settings settings) {
        this(settings, Checks.all(settings));
    }

    public Gate(Settings settings, List<Check> available) {
        this(settings, available, List.of());
    }

    /** A gate whose observers see every form beside the checks (report data, progress). */
    public Gate(Settings settings, List<Check> available, List<Observer> observers) {
        this.settings = settings;
        this.observers = List.copyOf(observers);
        List<Check> enabled = new ArrayList<>();
        for (Check c : available) {
            if (!settings.skip().contains(c.id())) {
                enabled.add(c);
            }
        }
        this.checks = List.copyOf(enabled);
    }

    /** The ids of the checks that can be named in a skip list. */
    public static List<String> knownIds() {
        return Checks.all(Settings.defaults()).stream().map(Check::id).toList();
    }

    /** A dataset directory and how reports name it. */
    public record Dataset(Path directory, String display) {
    }

    public Report run(List<Dataset> datasets) {
        Collector collector = new Collector(settings.maxFindings());
        long rows = 0;
        int forms = 0;
        for (Dataset d : datasets) {
            Catalog catalog = CatalogReader.read(d.directory(), d.display(), collector);
            if (catalog == null) {
                continue;
            }
            forms += catalog.forms().size();
            rows += runChecks(catalog, collector);
        }
        return new Report(datasets.stream().map(Dataset::display).toList(), checks.stream().map(Check::id).toList(),
                List.copyOf(collector.kept()), collector.counts(), collector.dropped(), collector.examined(), rows,
                forms, List.copyOf(collector.certificates()), collector.examinedIn(),
                List.copyOf(collector.measures()));
    }

    /**
     * Streams the coefficients once; if some form's rows turn out not to be contiguous, everything this dataset
     * produced is discarded and it is streamed again with those forms held back until the end (correct for any
     * row order; memory bounded by the largest form when rows are grouped).
     */
    private long runChecks(Catalog catalog, Collector outer) {
        Set<String> holdBack = Set.of();
        while (true) {
            Collector local = new Collector(settings.maxFindings(), catalog.display());
            List<Check.Pass> passes = new ArrayList<>();
            for (Check c : checks) {
                passes.add(c.start(catalog));
            }
            for (Observer o : observers) {
                passes.add(o.start(catalog));
            }
            Set<String> seen = new HashSet<>();
            long[] rows = {0};
            Set<String> scattered = CoefficientReader.stream(catalog, holdBack, local, data -> {
                seen.add(data.form().id());
                rows[0] += data.coefficients().size();
                for (Check.Pass p : passes) {
                    p.form(data, local);
                }
            });
            if (!scattered.isEmpty()) {
                Set<String> more = new HashSet<>(holdBack);
                more.addAll(scattered);
                holdBack = Set.copyOf(more);
                continue;
            }
            for (Form f : catalog.forms().values()) {
                if (!seen.contains(f.id())) {
                    FormData<?> empty = empty(f);
                    for (Check.Pass p : passes) {
                        p.form(empty, local);
                    }
                }
            }
            for (Check.Pass p : passes) {
                p.finish(local);
            }
            outer.absorb(local);
            return rows[0];
        }
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private static FormData<?> empty(Form f) {
        return new FormData(f, f.coefficientField(), new Coefficients.Builder<>().build(), f.zeta());
    }
}
