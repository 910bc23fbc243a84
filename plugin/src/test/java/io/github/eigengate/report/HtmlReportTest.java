package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.engine.Report;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** report.html of a real run, read back with an HTML parser. */
class HtmlReportTest {

    @TempDir
    Path dir;

    private Document failing() throws IOException {
        Path data = ReportDemo.copy(dir.resolve("data"), true);
        Report r = ReportDemo.run(data, dir.resolve("out"));
        assertTrue(r.failed());
        return Jsoup.parse(Files.readString(dir.resolve("out/report.html")));
    }

    @Test
    void verdictCountsAndEveryFindingWithItsAnchor() throws IOException {
        Document d = failing();
        assertEquals("✗ Failing: 10 errors in the tables", d.getElementById("verdict").text());
        Element ramanujan = d.selectFirst("table.eg-counts tr[data-check=ramanujan-bound]");
        assertEquals("ramanujan-bound 3 forms 1 0 0", ramanujan.text());
        List<Element> rows = d.select("#findings-table tr.eg-finding");
        assertEquals(10, rows.size());
        Element deligne = d.selectFirst("tr.eg-finding[data-check=ramanujan-bound]");
        assertEquals("finding-4", deligne.id());
        assertEquals("4 error ramanujan-bound data/coefficients.csv:12 form=lev11_wt2_o1 n=7 a_p^2 <= 4*p^(k-1) = 28 "
                + "a_p^2 = 81 Deligne's bound |a_p| <= 2 p^((k-1)/2) fails at p=7", deligne.text());
        assertEquals("#form-data--lev11_5f_wt2_5f_o1", deligne.selectFirst("td.eg-subject a").attr("href"));
        assertEquals("error", deligne.attr("data-severity"));
    }

    @Test
    void onePairOfPlotsPerFormAndTheFlaggedPrimeDrawn() throws IOException {
        Document d = failing();
        List<Element> forms = d.select("article.eg-form");
        assertEquals(List.of("lev11_wt2_o1", "lev32_wt2_o1", "lev23_wt2_o1"),
                forms.stream().map(a -> a.selectFirst("h3").ownText()).toList());
        for (Element a : forms) {
            assertEquals(1, a.select("svg.eg-scatter").size());
            assertEquals(1, a.select("svg.eg-hist").size());
        }
        assertEquals(List.of("7"), forms.get(0).select("polygon.eg-flag").eachAttr("data-p"));
        assertEquals(0, forms.get(1).select("polygon.eg-flag").size());
        // level 32 has CM by Q(i): a_p = 0 exactly for p ≡ 3 mod 4, 18 of the 34 odd primes below 150
        assertEquals("CM: 18 of 34 a_p vanish", forms.get(1).selectFirst(".eg-tag-cm").text());
        assertEquals(0, forms.get(0).select(".eg-tag-cm").size());
        // the level-23 field x^2 - x - 1 has two real embeddings: 34 points each
        assertEquals(68, forms.get(2).select("circle.eg-pt").size());
    }

    @Test
    void filtersOfferEveryCheckSeverityAndForm() throws IOException {
        Document d = failing();
        Element box = d.getElementById("eg-filters");
        assertTrue(box.hasAttr("hidden"), "shown only by the script");
        assertTrue(d.select("#eg-filter-check option").eachAttr("value").containsAll(List.of("", "hecke-relations",
                "ramanujan-bound", "space-traces")));
        assertEquals(List.of("", "error", "warning", "note"), d.select("#eg-filter-severity option").eachAttr("value"));
        assertEquals(List.of("", "data--lev11_5f_wt2_5f_o1", "data--lev32_5f_wt2_5f_o1", "data--lev23_5f_wt2_5f_o1"),
                d.select("#eg-filter-form option").eachAttr("value"));
    }

    @Test
    void spacesShowTheFormulaBesideTheSumOfDegrees() throws IOException {
        Document d = failing();
        // dim S_2^new(Γ0(N)) = 1, 1, 2 for N = 11, 32, 23: PARI/GP 2.15.2, mfdim([N,2,1],0)
        assertEquals(List.of("data N=11 k=2 1 1 complete", "data N=32 k=2 1 1 complete",
                "data N=23 k=2 2 2 complete"), d.select("table.eg-spaces tbody tr").eachText());
    }

    @Test
    void selfContained() throws IOException {
        Document d = failing();
        assertEquals(0, d.select("link, img, iframe, script[src], object, embed").size());
        for (Element e : d.select("[href]")) {
            assertTrue(e.attr("href").startsWith("#"), e.outerHtml());
        }
        for (Element e : d.select("[src]")) {
            assertFalse(true, "no src: " + e.outerHtml());
        }
        assertFalse(d.html().contains("url("), "no fetched style resources");
    }

    @Test
    void everyDataDerivedStringIsEscaped() {
        String evil = "<script>alert(1)</script>\"'&";
        Finding f = new Finding("normalisation", Severity.ERROR, new SourceLocation("data/" + evil, 3, 0),
                Subject.form(evil, "n=1"), evil, evil, evil);
        Report r = new Report(List.of("data"), List.of("normalisation"), List.of(f), Map.of(Severity.ERROR, 1), 0,
                Map.of("normalisation", Set.of(Subject.form(evil))), 1, 1, List.of(), List.of(),
                Map.of("data", Map.of("normalisation", Set.of(Subject.form(evil)))),
                List.of(new Measure("data", "space-dimension", new Subject("space", evil, ""), "formula", evil)));
        FormSeries s = new FormSeries("data", 0, 0, evil, 11, 2, 1, new long[] {2}, new double[][] {{-0.5}}, 0, "",
                new double[0]);
        String html = HtmlReport.render(r, List.of(s));
        Document d = Jsoup.parse(html);
        assertEquals(1, d.select("script").size(), "only the report's own script");
        assertFalse(html.contains("<script>alert"));
        Element row = d.selectFirst("tr.eg-finding");
        assertEquals(evil, row.selectFirst("td.eg-reason").text());
        assertEquals(evil, row.select("td.eg-value").get(0).text());
        assertEquals("form=" + evil + " n=1", row.selectFirst("td.eg-subject").text());
        assertEquals(evil, d.selectFirst("article.eg-form h3").ownText());
        assertTrue(d.selectFirst("table.eg-spaces").text().contains(evil));
    }

    @Test
    void formsAreOrderedByDatasetThenFormsCsvWhateverTheArrival() {
        ReportData data = new ReportData(List.of("a", "b"));
        List<FormSeries> in = new ArrayList<>();
        for (String set : List.of("a", "b")) {
            for (int i = 0; i < 4; i++) {
                in.add(new FormSeries(set, set.equals("a") ? 0 : 1, i, "f" + i, 11, 2, 1, new long[0],
                        new double[1][0], 0, "", new double[0]));
            }
        }
        Collections.shuffle(in, new java.util.Random(7));
        data.addAllForTest(in);
        assertEquals(List.of("a/f0", "a/f1", "a/f2", "a/f3", "b/f0", "b/f1", "b/f2", "b/f3"),
                data.forms().stream().map(s -> s.dataset() + "/" + s.id()).toList());
    }

    @Test
    void aPassingRunSaysSo() throws IOException {
        Path data = ReportDemo.copy(dir.resolve("ok"), false);
        Report r = ReportDemo.run(data, dir.resolve("out2"));
        assertFalse(r.failed());
        Document d = Jsoup.parse(Files.readString(dir.resolve("out2/report.html")));
        assertEquals("✓ Passing: no error in the tables", d.getElementById("verdict").text());
        assertEquals("No findings: every checked consequence of the theory holds.",
                d.selectFirst("#findings .eg-none").text());
        assertEquals(0, d.select("polygon.eg-flag").size());
    }

    @Test
    void onlyErrorsAndWarningsAtAnIndexNAreDrawnAsFlags() {
        // a note about the residue prime p=5 names no coefficient; a warning at n=3 does
        Finding note = new Finding("weight-of-form", Severity.NOTE, new SourceLocation("data/modp-weights.csv", 2, 0),
                Subject.form("f", "p=5"), "", "", "a note");
        Finding warning = new Finding("field-sanity", Severity.WARNING, new SourceLocation("data/coefficients.csv", 4,
                0), Subject.form("f", "n=3"), "", "", "a warning");
        Report r = new Report(List.of("data"), List.of("field-sanity"), List.of(note, warning),
                Map.of(Severity.WARNING, 1, Severity.NOTE, 1), 0, Map.of(), 1, 1, List.of());
        FormSeries s = new FormSeries("data", 0, 0, "f", 11, 2, 1, new long[] {3, 5}, new double[][] {{0.1, 0.2}}, 0,
                "", new double[0]);
        Document d = Jsoup.parse(HtmlReport.render(r, List.of(s)));
        assertEquals(List.of("3"), d.select("polygon.eg-flag").eachAttr("data-p"));
        assertEquals(List.of("5"), d.select("circle.eg-pt").eachAttr("data-p"));
    }

    @Test
    void claimsShowTheirBoundAndHowFarTheDataReach() throws IOException {
        // datasets/congruences (fixtures-gp/congruences.gp): a_n for n <= 1000. Sturm (LNM 1240, Thm 1) for
        // lev77 ~ lev11 mod 3 on Γ0(77²): index 5929·(8/7)·(12/11) = 7392, B = floor(2·7392/12) = 1232 (by hand);
        // the second row is the claim the check certifies (its note names B = 160), so the data reach past B
        Report r = GateRun.run(io.github.eigengate.engine.Settings.defaults(), List.of(new io.github.eigengate.engine
                        .Gate.Dataset(io.github.eigengate.engine.Fixture.dataset("congruences"), "data")),
                dir.resolve("c"), Set.of("html"), List.of());
        Document d = Jsoup.parse(Files.readString(dir.resolve("c/report.html")));
        List<String> rows = d.select("table.eg-claims tbody tr").eachText();
        assertEquals("data congruence=lev77_wt2_o1~lev11_wt2_o1 p=3 1232 1000 stops below B", rows.get(0));
        assertTrue(rows.contains("data congruence=lev32_wt12_o2~lev32_wt2_o1 p=13 j=11 160 680 bound reached"),
                String.join("\n", rows));
        assertTrue(r.measures().stream().anyMatch(m -> m.check().equals("reducible")));
    }

    @Test
    void manyFormsWithoutFindingsAreListedNotDrawn() {
        // layout only: 305 forms without data
        List<FormSeries> forms = new ArrayList<>();
        for (int i = 0; i < 305; i++) {
            forms.add(new FormSeries("data", 0, i, "f" + i, 11, 2, 1, new long[0], new double[1][0], 0, "",
                    new double[0]));
        }
        Report r = new Report(List.of("data"), List.of(), List.of(), Map.of(), 0, Map.of(), 0, 305, List.of());
        Document d = Jsoup.parse(HtmlReport.render(r, forms));
        assertEquals(HtmlReport.MAX_PLOTTED_FORMS, d.select("article.eg-form").size());
        assertTrue(d.select("#forms p.eg-note").last().text().startsWith("5 more forms without findings are not "
                + "drawn"), d.select("#forms p.eg-note").last().text());
    }
}
