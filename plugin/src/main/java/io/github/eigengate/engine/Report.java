package io.github.eigengate.engine;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The outcome of a run: findings (the first {@code maxFindings} in report order in full), counts by severity
 * including the ones not kept, the units each check examined, and what was read. {@code notices} are messages about
 * the run itself, not the data (e.g. a damaged cache entry that was rebuilt): a build log shows them as warnings;
 * they are not part of the report files.
 *
 * @param examinedIn dataset → check → the units it examined there (so reports can tell two datasets apart)
 * @param measures   quantities the checks computed about their units, for the reports to show
 */
public record Report(List<String> datasets, List<String> checks, List<Finding> findings,
                     Map<Severity, Integer> counts, int notKept, Map<String, Set<Subject>> examined,
                     long rows, int forms, List<Certificate> certificates, List<String> notices,
                     Map<String, Map<String, Set<Subject>>> examinedIn, List<Measure> measures) {

    /** A report whose examined units are not told apart by dataset, without notices and measures. */
    public Report(List<String> datasets, List<String> checks, List<Finding> findings,
                  Map<Severity, Integer> counts, int notKept, Map<String, Set<Subject>> examined,
                  long rows, int forms, List<Certificate> certificates) {
        this(datasets, checks, findings, counts, notKept, examined, rows, forms, certificates, List.of(),
                datasets.isEmpty() ? Map.of() : Map.of(datasets.get(0), examined), List.of());
    }

    public int errors() {
        return counts.getOrDefault(Severity.ERROR, 0);
    }

    public int warnings() {
        return counts.getOrDefault(Severity.WARNING, 0);
    }

    public int notes() {
        return counts.getOrDefault(Severity.NOTE, 0);
    }

    public boolean failed() {
        return errors() > 0;
    }

    /** The count line printed before the findings. */
    public String summary() {
        return String.format("%d error%s, %d warning%s, %d note%s in %d dataset%s (%d forms, %d coefficient rows, "
                        + "%d check%s)%s",
                errors(), errors() == 1 ? "" : "s", warnings(), warnings() == 1 ? "" : "s", notes(),
                notes() == 1 ? "" : "s", datasets.size(), datasets.size() == 1 ? "" : "s", forms, rows,
                checks.size(), checks.size() == 1 ? "" : "s", notKept > 0 ? "; " + notKept + " findings beyond the first " + findings.size()
                        + " are counted but not listed" : "");
    }
}
