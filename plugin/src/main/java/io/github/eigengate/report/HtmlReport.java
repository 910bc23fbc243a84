package io.github.eigengate.report;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.engine.Checks;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * Renders a run as {@code report.html}: one self-contained page (inline style, inline SVG, a little inline script for
 * the filters; nothing fetched), readable with scripts off. Layout in docs/reports.md.
 */
public final class HtmlReport {

    /** Forms drawn with plots; beyond these (forms with findings are always drawn) a form gets a line in a list. */
    static final int MAX_PLOTTED_FORMS = 300;

    private HtmlReport() {
    }

    public static String render(Report r, List<FormSeries> forms) {
        Map<String, String> titles = new HashMap<>();
        for (Check c : Checks.all(Settings.defaults())) {
            titles.put(c.id(), c.title());
        }
        Model m = new Model(r, forms);
        Html body = Html.el("body");
        body.add(header(r));
        body.add(nav());
        body.add(counts(r, titles, m));
        body.add(findings(r, m));
        body.add(formsSection(m));
        body.add(checks(r, titles, m));
        body.add(spaces(r, m));
        body.add(congruences(r, m));
        body.add(Html.el("footer").text("Eigengate: every verdict above comes from exact arithmetic and a published "
                + "theorem (docs/checks.md). The plots use floating point and decide nothing."));
        body.add(Html.script(Assets.SCRIPT));
        Html head = Html.el("head")
                .add(Html.el("meta").attr("charset", "utf-8"))
                .add(Html.el("meta").attr("name", "viewport").attr("content", "width=device-width, initial-scale=1"))
                .add(Html.el("title").text("Eigengate report: " + (r.failed() ? "failing" : "passing")))
                .add(Html.style(Assets.STYLE));
        StringBuilder b = new StringBuilder(1 << 16);
        b.append("<!DOCTYPE html>\n");
        Html.el("html").attr("lang", "en").add(head).add(body).write(b);
        b.append('\n');
        return b.toString();
    }

    /** Findings indexed by form and dataset, the dataset of each finding, and the anchors. */
    private static final class Model {
        final List<Finding> findings;
        final List<String> findingDataset = new ArrayList<>();
        final Map<String, Set<Long>> flaggedPrimes = new HashMap<>();
        final Map<String, List<Integer>> findingsOfForm = new HashMap<>();
        final List<FormSeries> forms;

        Model(Report r, List<FormSeries> forms) {
            this.findings = r.findings();
            this.forms = forms;
            for (int i = 0; i < findings.size(); i++) {
                Finding f = findings.get(i);
                String set = datasetOf(f.location().file(), r.datasets());
                findingDataset.add(set);
                if (f.subject().kind().equals("form")) {
                    String key = formKey(set, f.subject().name());
                    findingsOfForm.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
                    long n = index(f.subject().detail());
                    if (n > 0 && f.severity() != Severity.NOTE) {
                        flaggedPrimes.computeIfAbsent(key, k -> new LinkedHashSet<>()).add(n);
                    }
                }
            }
        }

        String formOf(int i) {
            Finding f = findings.get(i);
            return f.subject().kind().equals("form") ? formKey(findingDataset.get(i), f.subject().name()) : "";
        }
    }

    /** The dataset a file belongs to: the longest display name that prefixes it ("." and "" match any file). */
    static String datasetOf(String file, List<String> datasets) {
        String best = null;
        for (String d : datasets) {
            if ((file.equals(d) || file.startsWith(d + "/")) && (best == null || d.length() > best.length())) {
                best = d;
            }
        }
        if (best != null) {
            return best;
        }
        for (String d : datasets) {
            if (d.isEmpty() || d.equals(".")) {
                return d;
            }
        }
        return datasets.isEmpty() ? "" : datasets.get(0);
    }

    /** The coefficient index n of a detail {@code n=6}, 0 when there is none ({@code p=} names a residue prime). */
    static long index(String detail) {
        for (String part : detail.split(" ")) {
            if (part.startsWith("n=")) {
                try {
                    return Long.parseLong(part.substring(2));
                } catch (NumberFormatException e) {
                    return 0;
                }
            }
        }
        return 0;
    }

    static String formKey(String dataset, String id) {
        return Html.anchor(dataset, id);
    }

    private static Html header(Report r) {
        boolean failed = r.failed();
        String verdict = failed ? "Failing: " + r.errors() + " error" + (r.errors() == 1 ? "" : "s")
                + " in the tables" : "Passing: no error in the tables";
        Html h = Html.el("header").cls("eg-top " + (failed ? "eg-failing" : "eg-passing"));
        h.add(Html.el("div", "eg-brand", "eigengate report"));
        h.add(Html.el("h1").attr("id", "verdict").cls("eg-verdict").add(Html.el("span", "eg-stamp", failed ? "✗"
                : "✓")).text(" " + verdict));
        h.add(Html.el("p", "eg-summary", r.summary()));
        h.add(Html.el("p", "eg-datasets", "datasets: " + String.join(", ", r.datasets())));
        return h;
    }

    private static Html nav() {
        Html nav = Html.el("nav").cls("eg-nav");
        String[][] items = {{"counts", "Counts"}, {"findings", "Findings"}, {"forms", "Forms"}, {"checks", "Checks"},
                {"spaces", "Spaces"}, {"congruences", "Congruences"}};
        for (String[] it : items) {
            nav.add(Html.el("a").attr("href", "#" + it[0]).text(it[1]));
        }
        return nav;
    }

    private static Html counts(Report r, Map<String, String> titles, Model m) {
        Html t = Html.el("table").cls("eg-table eg-counts");
        t.add(Html.el("thead").add(row("th", "check", "examined", "errors", "warnings", "notes")));
        Html tb = Html.el("tbody");
        Map<String, int[]> bySev = severityCounts(r);
        for (String id : allChecks(r)) {
            int[] c = bySev.getOrDefault(id, new int[3]);
            Html tr = Html.el("tr").attr("data-check", id);
            tr.add(Html.el("td").add(Html.el("a").attr("href", "#" + checkAnchor(id)).text(id)));
            tr.add(Html.el("td").text(describeExamined(examinedUnits(r, id))));
            for (int s = 0; s < 3; s++) {
                tr.add(Html.el("td", c[s] > 0 ? "eg-n eg-sev-" + Severity.values()[s].label() : "eg-n eg-zero",
                        Integer.toString(c[s])));
            }
            tb.add(tr);
        }
        t.add(tb);
        Html sec = section("counts", "Counts per check and severity");
        sec.add(t);
        if (r.notKept() > 0) {
            sec.add(Html.el("p", "eg-note", r.notKept() + " findings beyond the first " + r.findings().size()
                    + " are counted above but not listed (maxFindings)."));
        }
        return sec;
    }

    /** Listed findings by check: errors, warnings, notes (of the listed findings only). */
    private static Map<String, int[]> severityCounts(Report r) {
        Map<String, int[]> out = new HashMap<>();
        for (Finding f : r.findings()) {
            out.computeIfAbsent(f.check(), k -> new int[3])[f.severity().ordinal()]++;
        }
        return out;
    }

    private static List<String> allChecks(Report r) {
        Set<String> ids = new LinkedHashSet<>(r.checks());
        for (Finding f : r.findings()) {
            ids.add(f.check());
        }
        return List.copyOf(ids);
    }

    private static Map<String, Integer> examinedUnits(Report r, String check) {
        Map<String, Integer> byKind = new TreeMap<>();
        for (Map<String, Set<Subject>> byCheck : r.examinedIn().values()) {
            for (Subject u : byCheck.getOrDefault(check, Set.of())) {
                byKind.merge(u.kind(), 1, Integer::sum);
            }
        }
        return byKind;
    }

    private static String describeExamined(Map<String, Integer> byKind) {
        if (byKind.isEmpty()) {
            return "nothing to examine";
        }
        List<String> parts = new ArrayList<>();
        byKind.forEach((kind, n) -> parts.add(n + " " + plural(kind, n)));
        return String.join(", ", parts);
    }

    private static String plural(String kind, int n) {
        return switch (kind) {
            case "weights" -> n == 1 ? "weight row" : "weight rows";
            case "reducible" -> n == 1 ? "reducibility claim" : "reducibility claims";
            default -> n == 1 ? kind : kind + "s";
        };
    }

    private static Html findings(Report r, Model m) {
        Html sec = section("findings", "Findings");
        if (r.findings().isEmpty()) {
            sec.add(Html.el("p", "eg-none", "No findings: every checked consequence of the theory holds."));
            return sec;
        }
        sec.add(filters(r, m));
        Html t = Html.el("table").attr("id", "findings-table").cls("eg-table eg-findings");
        t.add(Html.el("thead").add(row("th", "#", "severity", "check", "where", "subject", "expected", "found",
                "reason")));
        Html tb = Html.el("tbody");
        for (int i = 0; i < r.findings().size(); i++) {
            Finding f = r.findings().get(i);
            Html tr = Html.el("tr").attr("id", findingAnchor(i)).cls("eg-finding eg-row-" + f.severity().label())
                    .attr("data-check", f.check()).attr("data-severity", f.severity().label())
                    .attr("data-form", m.formOf(i));
            tr.add(Html.el("td").add(Html.el("a").attr("href", "#" + findingAnchor(i)).text(Integer.toString(i + 1))));
            tr.add(Html.el("td").add(Html.el("span", "eg-badge eg-sev-" + f.severity().label(), f.severity().label())));
            tr.add(Html.el("td").add(Html.el("a").attr("href", "#" + checkAnchor(f.check())).text(f.check())));
            tr.add(Html.el("td", "eg-where", f.location().toString()));
            Html subj = Html.el("td", "eg-subject", "");
            String form = m.formOf(i);
            if (!form.isEmpty() && m.forms.stream().anyMatch(s -> formKey(s.dataset(), s.id()).equals(form))) {
                subj.add(Html.el("a").attr("href", "#" + formAnchor(form)).text(f.subject().toString()));
            } else {
                subj.text(f.subject().toString());
            }
            tr.add(subj);
            tr.add(Html.el("td", "eg-value", f.expected()));
            tr.add(Html.el("td", "eg-value", f.found()));
            tr.add(Html.el("td", "eg-reason", f.reason()));
            tb.add(tr);
        }
        t.add(tb);
        sec.add(t);
        sec.add(Html.el("p").cls("eg-note").attr("id", "eg-filter-count").text(r.findings().size() + " findings listed"));
        return sec;
    }

    private static Html filters(Report r, Model m) {
        Html box = Html.el("form").attr("id", "eg-filters").cls("eg-filters").attr("hidden", "hidden");
        box.add(select("check", "check", allChecks(r).stream().map(id -> new String[] {id, id}).toList()));
        List<String[]> sev = new ArrayList<>();
        for (Severity s : Severity.values()) {
            sev.add(new String[] {s.label(), s.label()});
        }
        box.add(select("severity", "severity", sev));
        Map<String, String> forms = new LinkedHashMap<>();
        for (FormSeries s : m.forms) {
            forms.put(formKey(s.dataset(), s.id()), r.datasets().size() > 1 ? s.dataset() + ": " + s.id() : s.id());
        }
        for (int i = 0; i < m.findings.size(); i++) {
            String key = m.formOf(i);
            if (!key.isEmpty()) {
                forms.putIfAbsent(key, m.findings.get(i).subject().name());
            }
        }
        List<String[]> formOptions = new ArrayList<>();
        forms.forEach((k, v) -> formOptions.add(new String[] {k, v}));
        box.add(select("form", "form", formOptions));
        box.add(Html.el("button").attr("type", "reset").attr("id", "eg-filter-reset").text("show all"));
        return box;
    }

    private static Html select(String name, String label, List<String[]> options) {
        Html sel = Html.el("select").attr("name", name).attr("id", "eg-filter-" + name);
        sel.add(Html.el("option").attr("value", "").text("any " + label));
        for (String[] o : options) {
            sel.add(Html.el("option").attr("value", o[0]).text(o[1]));
        }
        return Html.el("label").text(label + " ").add(sel);
    }

    private static Html checks(Report r, Map<String, String> titles, Model m) {
        Html sec = section("checks", "Checks");
        for (String id : allChecks(r)) {
            Html a = Html.el("article").attr("id", checkAnchor(id)).cls("eg-check").attr("data-check", id);
            List<Integer> mine = new ArrayList<>();
            for (int i = 0; i < m.findings.size(); i++) {
                if (m.findings.get(i).check().equals(id)) {
                    mine.add(i);
                }
            }
            boolean bad = mine.stream().anyMatch(i -> m.findings.get(i).severity() == Severity.ERROR);
            a.add(Html.el("h3").add(Html.el("span", bad ? "eg-dot eg-dot-bad" : "eg-dot eg-dot-ok", bad ? "✗" : "✓"))
                    .text(" " + id));
            a.add(Html.el("p", "eg-title", titles.getOrDefault(id, id.equals("table-format")
                    ? "every cell of every table has the form the data contract requires" : "")));
            a.add(Html.el("p", "eg-examined", "examined: " + describeExamined(examinedUnits(r, id))));
            if (mine.isEmpty()) {
                a.add(Html.el("p", "eg-none", "no findings"));
            } else {
                Html ul = Html.el("ul").cls("eg-list");
                for (int i : mine) {
                    Finding f = m.findings.get(i);
                    ul.add(Html.el("li").attr("data-severity", f.severity().label()).attr("data-form", m.formOf(i))
                            .add(Html.el("a").attr("href", "#" + findingAnchor(i)).text("#" + (i + 1)))
                            .text(" " + f.location() + " " + f.subject()));
                }
                a.add(ul);
            }
            sec.add(a);
        }
        return sec;
    }

    private static Html formsSection(Model m) {
        Html sec = section("forms", "Forms");
        if (m.forms.isEmpty()) {
            sec.add(Html.el("p", "eg-none", "No forms were read."));
            return sec;
        }
        sec.add(Html.el("p", "eg-note", "Left: x_p = a_p / (2 p^((k−1)/2)) for the primes p ∤ N in the tables, every "
                + "real embedding in its own colour; the shaded band is |x_p| ≤ 1 (Ramanujan–Petersson); a "
                + "diamond marks a prime some finding names. Right: their histogram against the distribution the "
                + "theory predicts."));
        int drawn = 0;
        List<String> undrawn = new ArrayList<>();
        for (FormSeries s : m.forms) {
            String key = formKey(s.dataset(), s.id());
            Set<Long> flagged = m.flaggedPrimes.getOrDefault(key, Set.of());
            if (drawn >= MAX_PLOTTED_FORMS && !m.findingsOfForm.containsKey(key)) {
                undrawn.add(s.id());
                continue;
            }
            drawn++;
            Html a = Html.el("article").attr("id", formAnchor(key)).cls("eg-form").attr("data-form", key);
            Html h = Html.el("h3").text(s.id());
            if (s.looksCm()) {
                h.add(Html.el("span", "eg-tag eg-tag-cm", "CM: " + s.zeros() + " of " + s.primes().length
                        + " a_p vanish"));
            }
            List<Integer> fi = m.findingsOfForm.getOrDefault(key, List.of());
            if (!fi.isEmpty()) {
                h.add(Html.el("span", "eg-tag eg-tag-bad", fi.size() + " finding" + (fi.size() == 1 ? "" : "s")));
            }
            a.add(h);
            a.add(Html.el("p", "eg-meta", "dataset " + s.dataset() + " · level " + s.level() + " · weight "
                    + s.weight() + " · field degree " + s.degree() + " · " + s.primes().length + " primes p ∤ N"
                    + (s.degree() > 1 ? " · " + s.embeddings() + " real embedding" + (s.embeddings() == 1 ? "" : "s")
                    : "")));
            if (!s.note().isEmpty() || s.primes().length == 0) {
                a.add(Html.el("p", "eg-none", s.note().isEmpty() ? "no a_p at primes p ∤ N in the tables" : s.note()));
            } else {
                Html plots = Html.el("div").cls("eg-plots");
                Html cap = Html.el("figcaption").text("x_p against p" + (flagged.isEmpty() ? ""
                        : "; " + joinFlagged(flagged, s)));
                for (int e = 0; e < s.roots().length; e++) {
                    cap.add(Html.el("br")).add(Html.el("span", "eg-swatch", "●")
                            .attr("style", "color:" + Plots.EMBEDDING_COLOURS[e % Plots.EMBEDDING_COLOURS.length]))
                            .text(" embedding x ↦ " + String.format(java.util.Locale.ROOT, "%.6f", s.roots()[e]));
                }
                plots.add(Html.el("figure").add(Plots.scatter(s, flagged)).add(cap));
                plots.add(Html.el("figure").add(Plots.histogram(s)).add(Html.el("figcaption").text(s.looksCm()
                        ? "CM distribution: half the mass at 0, the rest with density (1/π)/√(1−x²)"
                        : "Sato–Tate density (2/π)√(1−x²)")));
                a.add(plots);
            }
            if (!fi.isEmpty()) {
                Html ul = Html.el("ul").cls("eg-list");
                for (int i : fi) {
                    Finding f = m.findings.get(i);
                    ul.add(Html.el("li").add(Html.el("a").attr("href", "#" + findingAnchor(i)).text("#" + (i + 1)))
                            .text(" [" + f.check() + "] " + f.subject().detail() + ": " + f.reason()));
                }
                a.add(ul);
            }
            sec.add(a);
        }
        if (!undrawn.isEmpty()) {
            sec.add(Html.el("p", "eg-note", undrawn.size() + " more forms without findings are not drawn (the page "
                    + "draws at most " + MAX_PLOTTED_FORMS + " forms beside every form with a finding): "
                    + String.join(", ", undrawn)));
        }
        return sec;
    }

    /** The flagged primes, and how many flagged n are not plotted (composite, or dividing N). */
    private static String joinFlagged(Set<Long> flagged, FormSeries s) {
        Set<Long> plotted = new LinkedHashSet<>(s.primeList());
        List<String> primes = new ArrayList<>();
        int other = 0;
        for (long n : flagged) {
            if (plotted.contains(n)) {
                primes.add("p=" + n);
            } else {
                other++;
            }
        }
        String out = primes.isEmpty() ? "" : "flagged " + String.join(", ", primes);
        if (other > 0) {
            out += (out.isEmpty() ? "" : "; ") + other + " flagged n not plotted (composite or dividing N)";
        }
        return out;
    }

    private static Html spaces(Report r, Model m) {
        Html sec = section("spaces", "Spaces claimed complete");
        Map<String, Map<String, String>> rows = measured(r, "space-dimension");
        if (rows.isEmpty()) {
            sec.add(Html.el("p", "eg-none", "No space is claimed complete (spaces.csv), or its check was skipped."));
            return sec;
        }
        Html t = Html.el("table").cls("eg-table eg-spaces");
        t.add(Html.el("thead").add(row("th", "dataset", "space", "dim S_k^new(Γ0(N)) (formula)",
                "sum of field degrees (found)", "verdict")));
        Html tb = Html.el("tbody");
        for (Map.Entry<String, Map<String, String>> e : rows.entrySet()) {
            String[] ds = e.getKey().split("\u0000", -1);
            Map<String, String> q = e.getValue();
            boolean ok = q.getOrDefault("formula", "").equals(q.getOrDefault("found", ""));
            Html tr = Html.el("tr");
            tr.add(Html.el("td").text(ds[0])).add(Html.el("td").text(ds[1]))
                    .add(Html.el("td", "eg-n", q.getOrDefault("formula", "")))
                    .add(Html.el("td", "eg-n", q.getOrDefault("found", "")))
                    .add(Html.el("td").add(Html.el("span", ok ? "eg-badge eg-ok" : "eg-badge eg-sev-error",
                            ok ? "complete" : "mismatch")));
            tb.add(tr);
        }
        sec.add(t.add(tb));
        return sec;
    }

    private static Html congruences(Report r, Model m) {
        Html sec = section("congruences", "Congruences and reducibility claims");
        Map<String, Map<String, String>> rows = new LinkedHashMap<>();
        rows.putAll(measured(r, "congruence"));
        rows.putAll(measured(r, "reducible"));
        if (rows.isEmpty()) {
            sec.add(Html.el("p", "eg-none", "No claim reached its Sturm-type bound evaluation."));
            return sec;
        }
        Html t = Html.el("table").cls("eg-table eg-claims");
        t.add(Html.el("thead").add(row("th", "dataset", "claim", "bound B", "data reach l ≤", "coverage", "status")));
        Html tb = Html.el("tbody");
        for (Map.Entry<String, Map<String, String>> e : rows.entrySet()) {
            String[] ds = e.getKey().split("\u0000", -1);
            Map<String, String> q = e.getValue();
            String b = q.getOrDefault("bound", "");
            String x = q.getOrDefault("reached", "");
            boolean certified = compare(x, b) >= 0;
            Html tr = Html.el("tr");
            tr.add(Html.el("td").text(ds[0])).add(Html.el("td").text(ds[1]))
                    .add(Html.el("td", "eg-n", b)).add(Html.el("td", "eg-n", x))
                    .add(Html.el("td").add(coverage(x, b)))
                    .add(Html.el("td").add(Html.el("span", certified ? "eg-badge eg-ok" : "eg-badge eg-sev-warning",
                            certified ? "bound reached" : "stops below B")));
            tb.add(tr);
        }
        sec.add(t.add(tb));
        return sec;
    }

    /** A bar of reached / B, for the eye only. */
    private static Html coverage(String reached, String bound) {
        double frac;
        try {
            frac = Math.min(1, Double.parseDouble(reached) / Math.max(1, Double.parseDouble(bound)));
        } catch (NumberFormatException e) {
            frac = 0;
        }
        return Html.el("svg").attr("xmlns", "http://www.w3.org/2000/svg").attr("width", "120").attr("height", "12")
                .attr("viewBox", "0 0 120 12").cls("eg-cover")
                .add(Html.el("rect").attr("x", "0").attr("y", "2").attr("width", "120").attr("height", "8")
                        .cls("eg-cover-bg"))
                .add(Html.el("rect").attr("x", "0").attr("y", "2").attr("width", 120 * frac).attr("height", "8")
                        .cls(frac >= 1 ? "eg-cover-full" : "eg-cover-part"));
    }

    private static int compare(String a, String b) {
        try {
            return new java.math.BigInteger(a).compareTo(new java.math.BigInteger(b));
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    /** dataset NUL subject → quantity → value, for one check's measures, in dataset order then report order. */
    private static Map<String, Map<String, String>> measured(Report r, String check) {
        List<Measure> ms = new ArrayList<>(r.measures());
        ms.sort(java.util.Comparator.comparingInt((Measure x) -> r.datasets().indexOf(x.dataset())));
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        for (Measure x : ms) {
            if (x.check().equals(check)) {
                String shown = x.unit().kind().equals("space") ? x.unit().name() : x.unit().toString();
                out.computeIfAbsent(x.dataset() + "\u0000" + shown, k -> new LinkedHashMap<>())
                        .put(x.quantity(), x.value());
            }
        }
        return out;
    }

    private static Html section(String id, String title) {
        return Html.el("section").attr("id", id).add(Html.el("h2").text(title));
    }

    private static Html row(String cell, String... texts) {
        Html tr = Html.el("tr");
        for (String t : texts) {
            tr.add(Html.el(cell).text(t));
        }
        return tr;
    }

    static String findingAnchor(int i) {
        return "finding-" + (i + 1);
    }

    static String checkAnchor(String id) {
        return "check-" + Html.anchor(id);
    }

    static String formAnchor(String key) {
        return "form-" + key;
    }
}
