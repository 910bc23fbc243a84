package io.github.eigengate.report;

import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.engine.Report;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Renders a run in the JUnit XML layout CI servers display: one {@code testsuite} per check, one {@code testcase}
 * per unit it examined (a form, a space, a congruence, a table); errors are failures, warnings and notes go to the
 * test case's {@code system-out}.
 */
public final class JUnitXmlReport {

    private JUnitXmlReport() {
    }

    public static String render(Report r) {
        // a test case per (dataset, unit), so equal form ids in two datasets never collide
        Map<String, Map<Case, List<Finding>>> byCheck = new LinkedHashMap<>();
        for (String set : r.datasets()) {
            Map<String, Set<Subject>> checks = r.examinedIn().getOrDefault(set, Map.of());
            for (Map.Entry<String, Set<Subject>> e : checks.entrySet()) {
                Map<Case, List<Finding>> units = byCheck.computeIfAbsent(e.getKey(), k -> new LinkedHashMap<>());
                for (Subject u : e.getValue()) {
                    units.computeIfAbsent(new Case(set, u), k -> new ArrayList<>());
                }
            }
        }
        for (Finding f : r.findings()) {
            Subject unit = new Subject(f.subject().kind(), f.subject().name(), "");
            Case c = new Case(HtmlReport.datasetOf(f.location().file(), r.datasets()), unit);
            byCheck.computeIfAbsent(f.check(), k -> new LinkedHashMap<>())
                   .computeIfAbsent(c, k -> new ArrayList<>()).add(f);
        }
        StringBuilder b = new StringBuilder(8192);
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        int total = 0;
        int failures = 0;
        for (Map<Case, List<Finding>> units : byCheck.values()) {
            total += units.size();
            for (List<Finding> fs : units.values()) {
                if (fs.stream().anyMatch(f -> f.severity() == Severity.ERROR)) {
                    failures++;
                }
            }
        }
        b.append("<testsuites name=\"eigengate\" tests=\"").append(total).append("\" failures=\"").append(failures)
         .append("\" errors=\"0\">\n");
        for (Map.Entry<String, Map<Case, List<Finding>>> e : byCheck.entrySet()) {
            String suite = "eigengate." + e.getKey();
            Map<Case, List<Finding>> units = e.getValue();
            long failed = units.values().stream()
                    .filter(fs -> fs.stream().anyMatch(f -> f.severity() == Severity.ERROR)).count();
            b.append("  <testsuite name=\"").append(attr(suite)).append("\" tests=\"").append(units.size())
             .append("\" failures=\"").append(failed).append("\" errors=\"0\" skipped=\"0\">\n");
            for (Map.Entry<Case, List<Finding>> u : units.entrySet()) {
                b.append("    <testcase classname=\"").append(attr(suite)).append("\" name=\"")
                 .append(attr(u.getKey().name())).append('"');
                List<Finding> errors = u.getValue().stream().filter(f -> f.severity() == Severity.ERROR).toList();
                List<Finding> others = u.getValue().stream().filter(f -> f.severity() != Severity.ERROR).toList();
                if (errors.isEmpty() && others.isEmpty()) {
                    b.append("/>\n");
                    continue;
                }
                b.append(">\n");
                if (!errors.isEmpty()) {
                    b.append("      <failure message=\"").append(attr(errors.get(0).line())).append("\" type=\"")
                     .append(attr(e.getKey())).append("\">");
                    b.append(text(lines(errors))).append("</failure>\n");
                }
                if (!others.isEmpty()) {
                    b.append("      <system-out>").append(text(lines(others))).append("</system-out>\n");
                }
                b.append("    </testcase>\n");
            }
            b.append("  </testsuite>\n");
        }
        b.append("</testsuites>\n");
        return b.toString();
    }

    /** A test case: a unit of one dataset, named {@code <dataset>: <unit>}, e.g. {@code data: form f1}. */
    private record Case(String dataset, Subject unit) {
        String name() {
            return dataset.isEmpty() ? unit.unit() : dataset + ": " + unit.unit();
        }
    }

    private static String lines(List<Finding> fs) {
        Set<String> ls = new LinkedHashSet<>();
        for (Finding f : fs) {
            ls.add(f.line());
        }
        return String.join("\n", ls);
    }

    /** XML 1.0 §2.2 Char, for one UTF-16 unit outside a surrogate pair. */
    static boolean allowed(char c) {
        return c == '\t' || c == '\n' || c == '\r' || (c >= 0x20 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD);
    }

    private static String attr(String s) {
        return text(s).replace("\"", "&quot;").replace("\n", "&#10;").replace("\r", "&#13;").replace("\t", "&#9;");
    }

    private static String text(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                default -> {
                    if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                        b.append(c).append(s.charAt(++i)); // a pair: a character beyond U+FFFF, allowed
                    } else if (allowed(c)) {
                        b.append(c);
                    } else {
                        b.append('\uFFFD'); // XML 1.0 §2.2 forbids it even as a character reference
                    }
                }
            }
        }
        return b.toString();
    }
}
