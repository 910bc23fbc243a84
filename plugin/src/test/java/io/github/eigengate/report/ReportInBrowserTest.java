package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * report.html of a failing run opened in a real headless Chromium (Debian package {@code chromium}): the DOM after
 * the page's script ran, and a screenshot under target/ for a person to look at. Skipped when no chromium is on the
 * PATH, unless {@code EIGENGATE_REQUIRE_BROWSER} is set (CI sets it, after installing chromium).
 */
class ReportInBrowserTest {

    private static final Path OUT = Path.of("target/browser-report").toAbsolutePath();
    private static String chromium;

    @BeforeAll
    static void writeReport() throws IOException {
        chromium = find();
        if (System.getenv("EIGENGATE_REQUIRE_BROWSER") != null) {
            assertTrue(chromium != null, "EIGENGATE_REQUIRE_BROWSER is set but no chromium is on the PATH");
        }
        assumeTrue(chromium != null, "no chromium on the PATH");
        if (Files.exists(OUT)) {
            try (Stream<Path> all = Files.walk(OUT)) {
                for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
        Path data = ReportDemo.copy(OUT.resolve("data"), true);
        assertTrue(ReportDemo.run(data, OUT.resolve("eigengate")).failed());
    }

    private static String find() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser")) {
                if (Files.isExecutable(Path.of(dir, name))) {
                    return Path.of(dir, name).toString();
                }
            }
        }
        return null;
    }

    private static String browser(String... extra) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("eigengate-chromium");
        List<String> cmd = new ArrayList<>(List.of(chromium, "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--user-data-dir=" + profile));
        cmd.addAll(List.of(extra));
        Path stdout = Files.createTempFile("eigengate-chromium", ".out");
        Process p = new ProcessBuilder(cmd).redirectOutput(stdout.toFile())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("chromium did not finish within 120 s: " + cmd);
        }
        String out = Files.readString(stdout, StandardCharsets.UTF_8);
        Files.delete(stdout);
        return out;
    }

    private static String page(String fragment) {
        return OUT.resolve("eigengate/report.html").toUri() + fragment;
    }

    @Test
    void theDomShowsFindingsPlotsAndLiveFilters() throws Exception {
        Document d = Jsoup.parse(browser("--dump-dom", page("")));
        assertFalse(d.getElementById("eg-filters").hasAttr("hidden"), "the script showed the filter bar");
        assertEquals("10 of 10 findings shown", d.getElementById("eg-filter-count").text());
        assertEquals(10, d.select("#findings-table tr.eg-finding").size());
        List<Element> forms = d.select("article.eg-form");
        assertEquals(3, forms.size());
        for (Element a : forms) {
            assertEquals(1, a.select("svg.eg-scatter").size(), a.id());
            assertEquals(1, a.select("svg.eg-hist").size(), a.id());
        }
        assertEquals(List.of("7"), d.select("#form-data--lev11_5f_wt2_5f_o1 polygon.eg-flag").eachAttr("data-p"));
    }

    @Test
    void aFilteredLinkShowsOnlyWhatItNames() throws Exception {
        Document d = Jsoup.parse(browser("--dump-dom", page("#only:check=ramanujan-bound&severity=error")));
        List<Element> shown = d.select("tr.eg-finding:not([hidden])");
        assertEquals(1, shown.size());
        assertEquals("ramanujan-bound", shown.get(0).attr("data-check"));
        assertEquals("1 of 10 findings shown", d.getElementById("eg-filter-count").text());
        assertEquals(List.of("check-ramanujan_2d_bound"), d.select("article.eg-check:not([hidden])").eachAttr("id"));
        Document f = Jsoup.parse(browser("--dump-dom", page("#only:form=data--lev32_5f_wt2_5f_o1")));
        assertEquals(List.of("form-data--lev32_5f_wt2_5f_o1"), f.select("article.eg-form:not([hidden])").eachAttr("id"));
        assertEquals(0, f.select("tr.eg-finding:not([hidden])").size());
    }

    @Test
    void aScreenshotIsSavedForAPersonToLookAt() throws Exception {
        Path png = OUT.resolve("report-screenshot.png");
        browser("--screenshot=" + png, "--window-size=1280,2000", page(""));
        byte[] head = Files.readAllBytes(png);
        assertTrue(head.length > 20_000, "a real picture, " + head.length + " bytes");
        assertEquals((byte) 0x89, head[0]);
        assertEquals('P', head[1]);
    }
}
