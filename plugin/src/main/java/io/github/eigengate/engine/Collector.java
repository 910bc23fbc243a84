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
import java.util.Comparator;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Gathers the findings of one unit of work (a form, a pass, a dataset, a run), keeping the first {@code cap} in
 * report order in full and counting the rest.
 *
 * <p>Report order is total and independent of timing: dataset (in configured order), file (see {@link #fileRank}),
 * line, check (in registry order, {@code table-format} first), then the order in which the finding reached this
 * collector. Collectors are only ever merged in a fixed order (forms in stream order, passes in check order,
 * datasets in configured order), so that last key is deterministic too.
 */
final class Collector implements FindingSink, Problems {

    private record Kept(Finding finding, int group, long seq) {
    }

    private final int cap;
    private final List<String> checkOrder;
    private final TreeSet<Kept> kept;
    private final Map<Severity, Integer> counts = new EnumMap<>(Severity.class);
    private final Map<String, Set<Subject>> examined = new LinkedHashMap<>();
    private final List<Certificate> certificates = new ArrayList<>();
    private final List<Measure> measures = new ArrayList<>();
    private int dropped;
    private long seq;
    private int group;

    Collector(int cap, List<String> checkOrder) {
        this.cap = cap;
        this.checkOrder = checkOrder;
        this.kept = new TreeSet<>(Comparator.<Kept>comparingInt(k -> k.group)
                .thenComparing(k -> k.finding, this::compare)
                .thenComparingLong(k -> k.seq));
        for (Severity s : Severity.values()) {
            counts.put(s, 0);
        }
    }

    /** A collector of the same kind, for a part of the work to be merged back later. */
    Collector fresh() {
        return new Collector(cap, checkOrder);
    }

    private int compare(Finding a, Finding b) {
        String fa = a.location().file();
        String fb = b.location().file();
        int c = Integer.compare(fileRank(fa), fileRank(fb));
        if (c == 0) {
            c = fa.compareTo(fb);
        }
        if (c == 0) {
            c = Integer.compare(a.location().line(), b.location().line());
        }
        if (c == 0) {
            c = Integer.compare(checkRank(a.check()), checkRank(b.check()));
        }
        if (c == 0) {
            c = a.check().compareTo(b.check());
        }
        return c;
    }

    /** The dataset itself first, then its tables in the order they are read, then any other file by name. */
    static int fileRank(String file) {
        String base = file.substring(file.lastIndexOf('/') + 1);
        if (!base.endsWith(".csv")) {
            return 0;
        }
        return switch (base) {
            case "forms.csv" -> 1;
            case "spaces.csv" -> 2;
            case "coefficients.csv" -> 3;
            default -> base.startsWith("coefficients-") ? 4 : 5;
        };
    }

    private int checkRank(String check) {
        if (check.equals(CHECK_ID)) {
            return -1;
        }
        int i = checkOrder.indexOf(check);
        return i < 0 ? Integer.MAX_VALUE : i;
    }

    /** Longest expected or found text a finding keeps; a hostile cell must not make the report huge. */
    static final int MAX_SHOWN = 1000;

    /** Cuts a text longer than MAX_SHOWN (plus room for the note, so that a cut text is never cut again). */
    private static String shown(String s) {
        return s.length() <= MAX_SHOWN + 64 ? s : s.substring(0, MAX_SHOWN) + "… (" + s.length() + " characters)";
    }

    @Override
    public void report(Finding original) {
        Finding finding = original.expected().length() <= MAX_SHOWN + 64
                && original.found().length() <= MAX_SHOWN + 64 && original.reason().length() <= 4 * MAX_SHOWN ? original
                : new Finding(original.check(), original.severity(), original.location(), original.subject(),
                        shown(original.expected()), shown(original.found()), original.reason().length() <= 4 * MAX_SHOWN
                                ? original.reason() : original.reason().substring(0, 4 * MAX_SHOWN) + "…");
        counts.merge(finding.severity(), 1, Integer::sum);
        examined(finding.check(), unitOf(finding.subject()));
        kept.add(new Kept(finding, group, seq++));
        if (kept.size() > cap) {
            kept.pollLast();
            dropped++;
        }
    }

    private static Subject unitOf(Subject s) {
        return new Subject(s.kind(), s.name(), "");
    }

    /**
     * Takes over everything another collector gathered: its findings (within this collector's cap), the counts of
     * the ones it did not keep, its examined units and certificates. Findings absorbed under a higher group sort
     * after those of a lower one whatever their file.
     */
    void absorb(Collector other, int intoGroup) {
        absorb(other.snapshot(), intoGroup);
    }

    void absorb(Collector other) {
        absorb(other, group);
    }

    void absorb(Snapshot other, int intoGroup) {
        int before = group;
        group = intoGroup;
        other.examined.forEach((check, units) -> units.forEach(u -> examined(check, u)));
        other.findings.forEach(this::report);
        for (Severity s : Severity.values()) {
            int notKept = other.counts.get(s) - (int) other.findings.stream().filter(f -> f.severity() == s).count();
            counts.merge(s, notKept, Integer::sum);
            dropped += notKept;
        }
        certificates.addAll(other.certificates);
        measures.addAll(other.measures);
        group = before;
    }

    /** What this collector holds, in report order; immutable. */
    Snapshot snapshot() {
        Map<String, List<Subject>> ex = new LinkedHashMap<>();
        examined.forEach((check, units) -> ex.put(check, List.copyOf(units)));
        return new Snapshot(kept.stream().map(Kept::finding).toList(), new EnumMap<>(counts), ex,
                List.copyOf(certificates), List.copyOf(measures));
    }

    /**
     * The findings kept (report order), all counts, the examined units by check, the certificates and the measures
     * (their dataset still empty: the engine files them under the dataset when it builds the report).
     */
    record Snapshot(List<Finding> findings, Map<Severity, Integer> counts, Map<String, List<Subject>> examined,
                    List<Certificate> certificates, List<Measure> measures) {
    }

    @Override
    public void examined(String check, Subject unit) {
        examined.computeIfAbsent(check, k -> new LinkedHashSet<>()).add(unitOf(unit));
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

    @Override
    public void measure(String check, Subject unit, String quantity, String value) {
        measures.add(new Measure("", check, unit, quantity, value));
    }

    List<Measure> measures() {
        return measures;
    }

    List<Certificate> certificates() {
        return certificates;
    }

    List<Finding> kept() {
        return kept.stream().map(Kept::finding).toList();
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
