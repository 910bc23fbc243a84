package io.github.eigengate.report;

import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.engine.Report;
import java.util.ArrayList;
import java.util.List;

/**
 * The console lines of a run, the same for the Maven goal and the command line: notices about the run, the count
 * line, then one line per listed finding, each with the level it is logged at.
 */
public final class Console {

    private Console() {
    }

    /** A line and its level ({@link Severity#ERROR} → error, {@link Severity#WARNING} → warning, else info). */
    public record Line(Severity level, String text) {
        /** The line as Maven's console shows it, e.g. {@code [ERROR] data/forms.csv:4: …}. */
        public String prefixed() {
            return switch (level) {
                case ERROR -> "[ERROR] ";
                case WARNING -> "[WARNING] ";
                case NOTE -> "[INFO] ";
            } + text;
        }
    }

    /** Notices about the run itself (e.g. a damaged cache entry rebuilt) as warnings, the count line, the findings. */
    public static List<Line> lines(Report report) {
        List<Line> out = new ArrayList<>();
        for (String notice : report.notices()) {
            out.add(new Line(Severity.WARNING, notice));
        }
        out.add(new Line(report.failed() ? Severity.ERROR : Severity.NOTE, "eigengate: " + report.summary()));
        for (Finding f : report.findings()) {
            out.add(new Line(f.severity(), f.line()));
        }
        return out;
    }

    /**
     * Whether the run fails under the two switches: errors fail unless {@code failOnError} is off; warnings fail
     * only with {@code failOnWarning}.
     */
    public static boolean fails(Report report, boolean failOnError, boolean failOnWarning) {
        return (failOnError && report.errors() > 0) || (failOnWarning && report.warnings() > 0);
    }
}
