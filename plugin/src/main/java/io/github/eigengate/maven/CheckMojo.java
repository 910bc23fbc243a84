package io.github.eigengate.maven;

import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import io.github.eigengate.report.Console;
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
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;

/**
 * Checks the modular-forms datasets of the project against the theorems they must satisfy, and fails the build on
 * any error finding. Reads only; writes reports under {@code outputDirectory}.
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public final class CheckMojo extends AbstractMojo {

    /** Dataset directories to check. Default: {@code ${project.basedir}/data}. */
    @Parameter(property = "eigengate.datasets", defaultValue = "${project.basedir}/data")
    private List<File> datasets;

    /** Skips the whole check. Default: false. */
    @Parameter(property = "eigengate.skip", defaultValue = "false")
    private boolean skip;

    /** Ids of checks not to run (see docs/checks.md). Default: none. */
    @Parameter(property = "eigengate.skipChecks")
    private List<String> skipChecks;

    /** Findings listed in full; further ones are counted only. Default: 1000. */
    @Parameter(property = "eigengate.maxFindings", defaultValue = "1000")
    private int maxFindings;

    /**
     * Severity of a congruence that holds as far as the data go but cannot be certified because the data stop
     * below the Sturm-type bound: {@code error} or {@code warning}. Default: error.
     */
    @Parameter(property = "eigengate.uncertified", defaultValue = "error")
    private String uncertified;

    /** Where report.json, TEST-eigengate.xml and certificates/ go. Default: {@code ${project.build.directory}/eigengate}. */
    @Parameter(property = "eigengate.outputDirectory", defaultValue = "${project.build.directory}/eigengate")
    private File outputDirectory;

    /**
     * Fails the build on an error finding. Set it to false to only report (for a first adoption on old tables).
     * Default: true.
     */
    @Parameter(property = "eigengate.failOnError", defaultValue = "true")
    private boolean failOnError;

    /** Fails the build on a warning finding too. Default: false. */
    @Parameter(property = "eigengate.failOnWarning", defaultValue = "false")
    private boolean failOnWarning;

    @Parameter(defaultValue = "${project.basedir}", readonly = true, required = true)
    private File basedir;

    /** Forms checked at the same time; the reports do not depend on it. Default: the available processors. */
    @Parameter(property = "eigengate.threads")
    private Integer threads;

    /** Whether results are kept between runs (see docs/configuration.md, "Cache"). Default: true. */
    @Parameter(property = "eigengate.cache", defaultValue = "true")
    private boolean cache;

    /**
     * Where results are kept between runs; a CI job may keep it between builds. Default:
     * {@code ${project.build.directory}/eigengate/cache}.
     */
    @Parameter(property = "eigengate.cacheDirectory", defaultValue = "${project.build.directory}/eigengate/cache")
    private File cacheDirectory;

    /**
     * Units of work one check may spend on one form (docs/limits.md); a form beyond it is reported as not decided.
     * Default: 10000000000 (some tens of seconds).
     */
    @Parameter(property = "eigengate.workBudget", defaultValue = "10000000000")
    private long workBudget;

    /** Severity of a form not decided within the work budget: {@code error} or {@code warning}. Default: error. */
    @Parameter(property = "eigengate.overBudget", defaultValue = "error")
    private String overBudget;

    /**
     * Directory every dataset, and every table in it, must resolve into after symbolic links. Default:
     * {@code ${project.basedir}}.
     */
    @Parameter(property = "eigengate.root", defaultValue = "${project.basedir}")
    private File root;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("eigengate: skipped");
            return;
        }
        Settings settings = settings();
        List<Gate.Dataset> sets = new ArrayList<>();
        for (File f : datasets == null ? List.<File>of() : datasets) {
            sets.add(new Gate.Dataset(f.toPath(), display(f.toPath())));
        }
        if (sets.isEmpty()) {
            throw new MojoExecutionException("eigengate: no dataset directories configured (parameter 'datasets')");
        }
        Report report;
        try {
            report = GateRun.run(settings, sets, outputDirectory.toPath(), Set.copyOf(ReportFiles.FORMATS),
                    List.of());
        } catch (IOException e) {
            throw new MojoExecutionException("eigengate: cannot write reports to " + outputDirectory + ": "
                    + e.getMessage(), e);
        }
        log(report);
        String where = " (listed above; full report in " + display(outputDirectory.toPath().resolve(ReportFiles.HTML))
                + ")";
        if (Console.fails(report, failOnError, failOnWarning)) {
            throw new MojoFailureException("eigengate: " + count(report.errors(), "error") + " and "
                    + count(report.warnings(), "warning") + " in the data" + where
                    + (failOnWarning ? "; failOnWarning is set" : ""));
        }
        if (report.failed()) {
            getLog().warn("eigengate: failOnError is false: the build goes on despite "
                    + count(report.errors(), "error") + where);
        }
    }

    private static String count(int n, String what) {
        return n + " " + what + (n == 1 ? "" : "s");
    }

    private Settings settings() throws MojoExecutionException {
        Set<String> skipIds = new HashSet<>();
        List<String> known = Gate.knownIds();
        for (String s : skipChecks == null ? List.<String>of() : skipChecks) {
            String id = s.strip();
            if (id.isEmpty()) {
                continue;
            }
            if (!known.contains(id)) {
                throw new MojoExecutionException("eigengate: unknown check '" + id + "' in skipChecks; known checks: "
                        + String.join(", ", known));
            }
            skipIds.add(id);
        }
        String u = uncertified == null ? "error" : uncertified.strip().toLowerCase(Locale.ROOT);
        if (!u.equals("error") && !u.equals("warning")) {
            throw new MojoExecutionException("eigengate: 'uncertified' must be error or warning, was '" + uncertified
                    + "'");
        }
        if (maxFindings < 1) {
            throw new MojoExecutionException("eigengate: 'maxFindings' must be at least 1, was " + maxFindings);
        }
        Settings base = new Settings(maxFindings, skipIds, u.equals("warning"));
        return limits(base);
    }

    /** The parameters of issue 14: threads, cache, work budget and root. */
    private Settings limits(Settings base) throws MojoExecutionException {
        int n = threads == null ? Settings.availableThreads() : threads;
        if (n < 1) {
            throw new MojoExecutionException("eigengate: 'threads' must be at least 1, was " + n);
        }
        if (workBudget < 1) {
            throw new MojoExecutionException("eigengate: 'workBudget' must be at least 1, was " + workBudget);
        }
        String o = overBudget == null ? "error" : overBudget.strip().toLowerCase(Locale.ROOT);
        if (!o.equals("error") && !o.equals("warning")) {
            throw new MojoExecutionException("eigengate: 'overBudget' must be error or warning, was '" + overBudget
                    + "'");
        }
        return base.withThreads(n).withCache(cache && cacheDirectory != null ? cacheDirectory.toPath() : null)
                .withWorkBudget(workBudget, o.equals("warning"))
                .withRoot(root == null ? basedir.toPath() : root.toPath());
    }

    private void log(Report report) {
        for (Console.Line line : Console.lines(report)) {
            switch (line.level()) {
                case ERROR -> getLog().error(line.text());
                case WARNING -> getLog().warn(line.text());
                case NOTE -> getLog().info(line.text());
            }
        }
    }

    private String display(Path p) {
        Path base = basedir.toPath().toAbsolutePath().normalize();
        Path abs = p.toAbsolutePath().normalize();
        if (abs.startsWith(base)) {
            String rel = base.relativize(abs).toString();
            return rel.isEmpty() ? "." : rel.replace(File.separatorChar, '/');
        }
        return abs.toString();
    }
}
