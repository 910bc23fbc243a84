package io.github.eigengate.engine;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.SourceLocation;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Gathers the findings of one run, keeping the first {@code cap} in full and counting the rest. */
final class Collector implements FindingSink, Problems {

    private final int cap;
    private final List<Finding> kept = new ArrayList<>();
    private final Map<Severity, Integer> counts = new EnumMap<>(Severity.class);
    private final Map<String, Set<Subject>> examined = new LinkedHashMap<>();
    private final List<Certificate> certificates = new ArrayList<>();
    private int dropped;
    private final String dataset;
    private final Map<String, Map<String, Set<Subject>>> examinedIn = new LinkedHashMap<>();
    private final List<Measure> measures = new ArrayList<>();

    Collector(int cap) {
        this(cap, "");
    }

    /** A collector for one dataset: its examined units and measures are filed under that dataset's name. */
    Collector(int cap, String dataset) {
        this.cap = cap;
        this.dataset = dataset;
        for (Severity s : Severity.values()) {
            counts.put(s, 0);
        }
    }

    @Override
    public void report(Finding finding) {
        counts.merge(finding.severity(), 1, Integer::sum);
        examined(finding.check(), unitOf(finding.subject()));
        if (kept.size() < cap) {
            kept.add(finding);
        } else {
            dropped++;
        }
    }

    private static Subject unitOf(Subject s) {
        return new Subject(s.kind(), s.name(), "");
    }

    /**
     * Takes over everything another collector gathered: its findings (within this collector's cap), the counts of
     * the ones it did not keep, its examined units and certificates.
     */
    void absorb(Collector other) {
        other.examined.forEach((check, units) -> units.forEach(u -> examined(check, u)));
        other.kept.forEach(this::report);
        for (Severity s : Severity.values()) {
            int notKept = other.counts.get(s) - (int) other.kept.stream().filter(f -> f.severity() == s).count();
            counts.merge(s, notKept, Integer::sum);
            dropped += notKept;
        }
        certificates.addAll(other.certificates);
        measures.addAll(other.measures);
        other.examinedIn.forEach((set, byCheck) -> byCheck.forEach((check, units) ->
                examinedIn.computeIfAbsent(set, k -> new LinkedHashMap<>())
                          .computeIfAbsent(check, k -> new LinkedHashSet<>()).addAll(units)));
    }

    @Override
    public void examined(String check, Subject unit) {
        examined.computeIfAbsent(check, k -> new LinkedHashSet<>()).add(unitOf(unit));
        if (!dataset.isEmpty()) {
            examinedIn.computeIfAbsent(dataset, k -> new LinkedHashMap<>())
                      .computeIfAbsent(check, k -> new LinkedHashSet<>()).add(unitOf(unit));
        }
    }

    @Override
    public void measure(String check, Subject unit, String quantity, String value) {
        measures.add(new Measure(dataset, check, unit, quantity, value));
    }

    /** Dataset → check → units examined there. */
    Map<String, Map<String, Set<Subject>>> examinedIn() {
        return examinedIn;
    }

    List<Measure> measures() {
        return measures;
    }

    @Override
    public void error(SourceLocation at, String subject, String expected, String found, String reason) {
        report(new Finding(CHECK_ID, Severity.ERROR, at, new Subject("table", at.file(), subject), expected, found,
                reason));
    }

    @Override
    public void warning(SourceLocation at, String subject, String expected, String found, String reason) {
        report(new Finding(CHECK_ID, Severity.WARNING, at, new Subject("table", at.file(), subject), expected, found,
                reason));
    }

    @Override
    public void certificate(Certificate certificate) {
        certificates.add(certificate);
    }

    List<Certificate> certificates() {
        return certificates;
    }

    List<Finding> kept() {
        return kept;
    }

    Map<Severity, Integer> counts() {
        return counts;
    }

    int dropped() {
        return dropped;
    }

    Map<String, Set<Subject>> examined() {
        return examined;
    }
}
