package io.github.eigengate.report;

import io.github.eigengate.engine.Checks;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Observer;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/** One run as the Maven goal and the command line both do it: the gate with the report's observer, then the files. */
public final class GateRun {

    private GateRun() {
    }

    /**
     * Runs every enabled check over the datasets and writes the chosen report formats into {@code out}.
     *
     * @param extra further observers (e.g. a progress line)
     * @throws IOException when the reports cannot be written
     */
    public static Report run(Settings settings, List<Gate.Dataset> datasets, Path out, Set<String> formats,
                             List<Observer> extra) throws IOException {
        ReportData data = new ReportData(datasets.stream().map(Gate.Dataset::display).toList());
        List<Observer> observers = new ArrayList<>();
        observers.add(data);
        observers.addAll(extra);
        Report report = new Gate(settings, Checks.all(settings), observers).run(datasets);
        ReportFiles.write(report, out, data.forms(), formats);
        return report;
    }
}
