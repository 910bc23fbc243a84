package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.engine.Report;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report layouts of docs/reports.md, asserted whole. */
class ReportsTest {

    @TempDir
    Path dir;

    private static Report sample() {
        Finding error = new Finding("normalisation", Severity.ERROR, new SourceLocation("data/c.csv", 4, 0),
                Subject.form("f<1>", "n=1"), "1", "2", "a newform is normalised so that a_1 = 1");
        Finding warning = new Finding("table-format", Severity.WARNING, new SourceLocation("data/c.csv", 1, 4),
                new Subject("table", "data/c.csv", "table=data/c.csv"), "one of form,n,value", "x \"y\"",
                "unknown column 'x \"y\"' is ignored");
        Map<String, Set<Subject>> examined = new LinkedHashMap<>();
        examined.put("normalisation", new LinkedHashSet<>(List.of(Subject.form("f<1>"), Subject.form("g"))));
        return new Report(List.of("data"), List.of("normalisation"), List.of(error, warning),
                Map.of(Severity.ERROR, 1, Severity.WARNING, 1, Severity.NOTE, 0), 0, examined, 24, 2,
                List.of(new Certificate("congruence-f-g-p5.txt", "certified\n")));
    }

    @Test
    void jsonListsEveryFindingWithItsPlace() {
        assertEquals("""
                {
                  "format": "eigengate-report/1",
                  "passed": false,
                  "summary": {"errors": 1, "warnings": 1, "notes": 0, "not_listed": 0, "forms": 2, "coefficient_rows": 24},
                  "datasets": ["data"],
                  "checks": ["normalisation"],
                  "findings": [
                    {"check": "normalisation", "severity": "error", "file": "data/c.csv", "line": 4, "column": 0, \
                "subject": {"kind": "form", "name": "f<1>", "detail": "n=1"}, "expected": "1", "found": "2", \
                "reason": "a newform is normalised so that a_1 = 1"},
                    {"check": "table-format", "severity": "warning", "file": "data/c.csv", "line": 1, "column": 4, \
                "subject": {"kind": "table", "name": "data/c.csv", "detail": "table=data/c.csv"}, "expected": \
                "one of form,n,value", "found": "x \\"y\\"", "reason": "unknown column 'x \\"y\\"' is ignored"}
                  ]
                }
                """, JsonReport.render(sample()));
    }

    @Test
    void junitXmlHasACasePerCheckAndUnit() {
        String xml = JUnitXmlReport.render(sample());
        assertEquals("""
                <?xml version="1.0" encoding="UTF-8"?>
                <testsuites name="eigengate" tests="3" failures="1" errors="0">
                  <testsuite name="eigengate.normalisation" tests="2" failures="1" errors="0" skipped="0">
                    <testcase classname="eigengate.normalisation" name="data: form f&lt;1&gt;">
                      <failure message="data/c.csv:4: error [normalisation] form=f&lt;1&gt; n=1: expected 1, found 2; \
                a newform is normalised so that a_1 = 1" type="normalisation">data/c.csv:4: error [normalisation] \
                form=f&lt;1&gt; n=1: expected 1, found 2; a newform is normalised so that a_1 = 1</failure>
                    </testcase>
                    <testcase classname="eigengate.normalisation" name="data: form g"/>
                  </testsuite>
                  <testsuite name="eigengate.table-format" tests="1" failures="0" errors="0" skipped="0">
                    <testcase classname="eigengate.table-format" name="data: table data/c.csv">
                      <system-out>data/c.csv:1:4: warning [table-format] table=data/c.csv: expected one of \
                form,n,value, found x "y"; unknown column 'x "y"' is ignored</system-out>
                    </testcase>
                  </testsuite>
                </testsuites>
                """, xml);
    }

    @Test
    void filesAreWrittenAndStaleCertificatesRemoved() throws IOException {
        Path out = dir.resolve("eigengate");
        Files.createDirectories(out.resolve("certificates"));
        Files.writeString(out.resolve("certificates/old.txt"), "from an earlier run");
        ReportFiles.write(sample(), out);
        assertTrue(Files.readString(out.resolve("report.json")).contains("\"passed\": false"));
        assertTrue(Files.readString(out.resolve("TEST-eigengate.xml")).startsWith("<?xml"));
        assertEquals("certified\n", Files.readString(out.resolve("certificates/congruence-f-g-p5.txt")));
        assertFalse(Files.exists(out.resolve("certificates/old.txt")));
    }

    @Test
    void summaryCountsEverything() {
        assertEquals("1 error, 1 warning, 0 notes in 1 dataset (2 forms, 24 coefficient rows, 1 check)",
                sample().summary());
    }
}
