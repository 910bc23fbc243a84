package io.github.eigengate.cli;

import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import io.github.eigengate.report.Console;
import io.github.eigengate.report.GateRun;
import io.github.eigengate.report.ReportFiles;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The gate outside Maven: {@code java -jar eigengate-cli.jar [options] DATASET...}. Same checks, console lines and
 * reports as the Maven goal. Exit 0 when the tables pass, 1 when findings fail them, 2 on bad usage or I/O.
 */
@Command(name = "eigengate", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        sortOptions = false, usageHelpAutoWidth = true,
        description = "Checks tables of modular forms (dataset directories with forms.csv, coefficients.csv, …) "
                + "against the theorems they must satisfy, with exact arithmetic.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:the tables pass", "1:findings fail them (errors; warnings with --fail-on-warning)",
                "2:bad usage, a missing dataset directory, or reports that cannot be written"})
public final class Main implements Callable<Integer> {

    public static final int PASS = 0;
    public static final int FAIL = 1;
    public static final int USAGE = 2;

    @Parameters(arity = "1..*", paramLabel = "DATASET", description = "dataset directories to check")
    private List<Path> datasets = new ArrayList<>();

    @Option(names = "--skip-checks", split = ",", paramLabel = "ID",
            description = "ids of checks not to run (see docs/checks.md)")
    private List<String> skipChecks = new ArrayList<>();

    @Option(names = "--max-findings", paramLabel = "N", defaultValue = "1000",
            description = "findings listed in full; the rest are counted (default: ${DEFAULT-VALUE})")
    private int maxFindings;

    @Option(names = "--uncertified", paramLabel = "error|warning", defaultValue = "error",
            description = "severity of a congruence that holds as far as the data go but stops below its "
                    + "Sturm-type bound (default: ${DEFAULT-VALUE})")
    private String uncertified;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "target/eigengate",
            description = "where the reports go (default: ${DEFAULT-VALUE})")
    private Path out;

    @Option(names = "--format", split = ",", paramLabel = "FORMAT", defaultValue = "html,json,junit",
            description = "report files to write: html, json, junit (default: ${DEFAULT-VALUE}); certificates are "
                    + "always written")
    private List<String> formats;

    @Option(names = "--fail-on-warning", description = "exit 1 on warnings too")
    private boolean failOnWarning;

    @Option(names = "--report-only", description = "exit 0 even when errors are found (for a first adoption)")
    private boolean reportOnly;

    @Option(names = "--threads", paramLabel = "N",
            description = "forms checked at the same time (default: the available processors); the report does "
                    + "not depend on it")
    private Integer threads;

    @Option(names = "--cache", paramLabel = "DIR",
            description = "keep results in DIR and re-check only what changed (default: no cache)")
    private Path cache;

    @Option(names = {"-q", "--quiet"}, description = "no progress line on stderr")
    private boolean quiet;

    private Path workingDirectory;
    private PrintStream stdout;
    private PrintStream stderr;
    private boolean terminal;

    public static void main(String[] args) {
        System.exit(run(args, Path.of("").toAbsolutePath(), System.out, System.err, Terminal.stderrIsTerminal()));
    }

    /**
     * Runs the command line as {@code main} would, and returns the exit code.
     *
     * @param cwd      what relative paths are relative to, and how datasets are named in reports
     * @param terminal whether stderr is a terminal (the progress line is shown only then)
     */
    public static int run(String[] args, Path cwd, PrintStream stdout, PrintStream stderr, boolean terminal) {
        Main main = new Main();
        main.workingDirectory = cwd;
        main.stdout = stdout;
        main.stderr = stderr;
        main.terminal = terminal;
        CommandLine cl = new CommandLine(main);
        cl.setOut(new java.io.PrintWriter(new java.io.OutputStreamWriter(stdout, StandardCharsets.UTF_8), true));
        cl.setErr(new java.io.PrintWriter(new java.io.OutputStreamWriter(stderr, StandardCharsets.UTF_8), true));
        cl.setExitCodeExceptionMapper(e -> USAGE);
        cl.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            if (e instanceof UsageException u) {
                commandLine.getErr().println("eigengate: " + u.getMessage());
                commandLine.getErr().println("Try 'eigengate --help' for more.");
                return USAGE;
            }
            throw e;
        });
        cl.setParameterExceptionHandler((e, args1) -> {
            CommandLine c = e.getCommandLine();
            c.getErr().println("eigengate: " + e.getMessage());
            c.getErr().println("Try 'eigengate --help' for more.");
            return USAGE;
        });
        return cl.execute(args);
    }

    @Override
    public Integer call() {
        Settings settings = settings();
        Set<String> chosen = formats();
        List<Gate.Dataset> sets = new ArrayList<>();
        for (Path d : datasets) {
            Path abs = workingDirectory.resolve(d).normalize();
            if (!Files.isDirectory(abs)) {
                throw new UsageException("not a dataset directory: " + d);
            }
            sets.add(new Gate.Dataset(abs, display(abs)));
        }
        Path outDir = workingDirectory.resolve(out).normalize();
        Progress progress = new Progress(stderr, terminal && !quiet);
        Report report;
        try {
            progress.begin();
            report = GateRun.run(settings, sets, outDir, chosen, List.of(progress));
        } catch (IOException e) {
            progress.end();
            stderr.println("eigengate: cannot write reports to " + out + ": " + e.getMessage());
            return USAGE;
        } finally {
            progress.end();
        }
        for (Console.Line line : Console.lines(report)) {
            stdout.println(line.prefixed());
        }
        boolean fails = Console.fails(report, !reportOnly, failOnWarning);
        if (chosen.contains("html")) {
            stdout.println((fails ? "[ERROR] " : "[INFO] ") + "eigengate: report in "
                    + display(outDir.resolve(ReportFiles.HTML)));
        }
        stdout.flush();
        return fails ? FAIL : PASS;
    }

    private Settings settings() {
        List<String> known = Gate.knownIds();
        Set<String> skip = new LinkedHashSet<>();
        for (String s : skipChecks) {
            String id = s.strip();
            if (id.isEmpty()) {
                continue;
            }
            if (!known.contains(id)) {
                throw new UsageException("unknown check '" + id + "' in --skip-checks; known checks: "
                        + String.join(", ", known));
            }
            skip.add(id);
        }
        String u = uncertified.strip().toLowerCase(Locale.ROOT);
        if (!u.equals("error") && !u.equals("warning")) {
            throw new UsageException("--uncertified must be error or warning, was '" + uncertified + "'");
        }
        if (maxFindings < 1) {
            throw new UsageException("--max-findings must be at least 1, was " + maxFindings);
        }
        int n = threads == null ? Settings.availableThreads() : threads;
        if (n < 1) {
            throw new UsageException("--threads must be at least 1, was " + n);
        }
        return new Settings(maxFindings, skip, u.equals("warning")).withThreads(n)
                .withCache(cache == null ? null : workingDirectory.resolve(cache));
    }

    private Set<String> formats() {
        Set<String> chosen = new LinkedHashSet<>();
        for (String f : formats) {
            String v = f.strip().toLowerCase(Locale.ROOT);
            if (!ReportFiles.FORMATS.contains(v)) {
                throw new UsageException("unknown --format '" + f + "'; known: "
                        + String.join(", ", ReportFiles.FORMATS));
            }
            chosen.add(v);
        }
        return chosen;
    }

    /** Relative to the working directory when inside it, as the Maven goal names paths relative to the project. */
    private String display(Path abs) {
        Path base = workingDirectory.toAbsolutePath().normalize();
        if (abs.startsWith(base)) {
            String rel = base.relativize(abs).toString();
            return rel.isEmpty() ? "." : rel.replace(java.io.File.separatorChar, '/');
        }
        return abs.toString();
    }

    /** Bad usage found after parsing: exit code 2 with a one-line message. */
    static final class UsageException extends RuntimeException {
        UsageException(String message) {
            super(message);
        }
    }

    /** The version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"eigengate " + (v == null ? "(development build)" : v)};
        }
    }
}
