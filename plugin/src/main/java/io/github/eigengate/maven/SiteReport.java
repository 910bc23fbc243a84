package io.github.eigengate.maven;

import io.github.eigengate.check.Finding;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import io.github.eigengate.report.GateRun;
import io.github.eigengate.report.ReportFiles;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.maven.doxia.sink.Sink;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.apache.maven.reporting.AbstractMavenReport;
import org.apache.maven.reporting.MavenReportException;

/**
 * The Eigengate page of the project's site ({@code mvn site}): the verdict, the findings per check, and the full
 * self-contained {@code report.html} (with the plots) beside it under {@code eigengate/}. Runs the same checks as
 * {@code check} but never fails the site build: a site shows the state of the tables, failing or not.
 */
@Mojo(name = "report", defaultPhase = LifecyclePhase.SITE, threadSafe = true)
public final class SiteReport extends AbstractMavenReport {

    /** Dataset directories to check. Default: {@code ${project.basedir}/data}. */
    @Parameter(property = "eigengate.datasets", defaultValue = "${project.basedir}/data")
    private List<File> datasets;

    /** Ids of checks not to run (see docs/checks.md). Default: none. */
    @Parameter(property = "eigengate.skipChecks")
    private List<String> skipChecks;

    /** Findings listed in full; further ones are counted only. Default: 1000. */
    @Parameter(property = "eigengate.maxFindings", defaultValue = "1000")
    private int maxFindings;

    /** Severity of a congruence that cannot be certified: {@code error} or {@code warning}. Default: error. */
    @Parameter(property = "eigengate.uncertified", defaultValue = "error")
    private String uncertified;

    /** Still required by the interface; {@link #getOutputPath} is what the site plugin reads. */
    @Deprecated
    @Override
    public String getOutputName() {
        return "eigengate";
    }

    @Override
    public String getOutputPath() {
        return "eigengate";
    }

    @Override
    public String getName(Locale locale) {
        return "Eigengate";
    }

    @Override
    public String getDescription(Locale locale) {
        return "The modular-forms tables checked against the theorems they must satisfy";
    }

    @Override
    protected void executeReport(Locale locale) throws MavenReportException {
        Path base = project.getBasedir().toPath();
        List<Gate.Dataset> sets = new ArrayList<>();
        for (File f : datasets == null ? List.<File>of() : datasets) {
            sets.add(new Gate.Dataset(f.toPath(), relative(base, f.toPath())));
        }
        Report report;
        try {
            report = GateRun.run(settings(), sets, getReportOutputDirectory().toPath().resolve("eigengate"),
                    Set.copyOf(ReportFiles.FORMATS), List.of());
        } catch (IOException e) {
            throw new MavenReportException("eigengate: cannot write the site report: " + e.getMessage(), e);
        }
        render(getSink(), report);
    }

    private Settings settings() throws MavenReportException {
        Set<String> skip = new HashSet<>();
        List<String> known = Gate.knownIds();
        for (String s : skipChecks == null ? List.<String>of() : skipChecks) {
            String id = s.strip();
            if (!id.isEmpty() && !known.contains(id)) {
                throw new MavenReportException("eigengate: unknown check '" + id + "' in skipChecks; known checks: "
                        + String.join(", ", known));
            }
            if (!id.isEmpty()) {
                skip.add(id);
            }
        }
        String u = uncertified == null ? "error" : uncertified.strip().toLowerCase(Locale.ROOT);
        if (!u.equals("error") && !u.equals("warning")) {
            throw new MavenReportException("eigengate: 'uncertified' must be error or warning, was '" + uncertified
                    + "'");
        }
        return new Settings(Math.max(1, maxFindings), skip, u.equals("warning"));
    }

    /** The page: Doxia escapes every text event itself. */
    static void render(Sink sink, Report r) {
        sink.head();
        sink.title();
        sink.text("Eigengate");
        sink.title_();
        sink.head_();
        sink.body();
        sink.section(1, null);
        sink.sectionTitle(1, null);
        sink.text("Eigengate: " + (r.failed() ? "failing" : "passing"));
        sink.sectionTitle_(1);
        sink.paragraph();
        sink.text(r.summary());
        sink.paragraph_();
        sink.paragraph();
        sink.text("The full report, with a plot of the normalised a_p of every form: ");
        sink.link("eigengate/" + ReportFiles.HTML);
        sink.text("eigengate/" + ReportFiles.HTML);
        sink.link_();
        sink.text(" (also ");
        sink.link("eigengate/" + ReportFiles.JSON);
        sink.text(ReportFiles.JSON);
        sink.link_();
        sink.text(").");
        sink.paragraph_();

        sink.section(2, null);
        sink.sectionTitle(2, null);
        sink.text("Findings");
        sink.sectionTitle_(2);
        if (r.findings().isEmpty()) {
            sink.paragraph();
            sink.text("No findings: every checked consequence of the theory holds.");
            sink.paragraph_();
        } else {
            sink.table();
            sink.tableRows();
            row(sink, true, "severity", "check", "where", "subject", "expected", "found", "reason");
            for (Finding f : r.findings()) {
                row(sink, false, f.severity().label(), f.check(), f.location().toString(), f.subject().toString(),
                        f.expected(), f.found(), f.reason());
            }
            sink.tableRows_();
            sink.table_();
        }
        sink.section_(2);

        sink.section(2, null);
        sink.sectionTitle(2, null);
        sink.text("Checks run");
        sink.sectionTitle_(2);
        sink.list();
        for (String id : r.checks()) {
            sink.listItem();
            sink.monospaced();
            sink.text(id);
            sink.monospaced_();
            sink.listItem_();
        }
        sink.list_();
        sink.section_(2);
        sink.section_(1);
        sink.body_();
        sink.flush();
        sink.close();
    }

    private static void row(Sink sink, boolean header, String... cells) {
        sink.tableRow();
        for (String c : cells) {
            if (header) {
                sink.tableHeaderCell();
            } else {
                sink.tableCell();
            }
            sink.text(c);
            if (header) {
                sink.tableHeaderCell_();
            } else {
                sink.tableCell_();
            }
        }
        sink.tableRow_();
    }

    private static String relative(Path base, Path p) {
        Path b = base.toAbsolutePath().normalize();
        Path a = p.toAbsolutePath().normalize();
        if (a.startsWith(b)) {
            String rel = b.relativize(a).toString();
            return rel.isEmpty() ? "." : rel.replace(File.separatorChar, '/');
        }
        return a.toString();
    }
}
