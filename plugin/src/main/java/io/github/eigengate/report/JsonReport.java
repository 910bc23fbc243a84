package io.github.eigengate.report;

import io.github.eigengate.check.Finding;
import io.github.eigengate.engine.Report;
import java.util.ArrayList;
import java.util.List;

/** Renders a run as {@code report.json}; the layout is documented in docs/reports.md. */
public final class JsonReport {

    private JsonReport() {
    }

    public static String render(Report r) {
        StringBuilder b = new StringBuilder(4096);
        b.append("{\n");
        b.append("  \"format\": \"eigengate-report/1\",\n");
        b.append("  \"passed\": ").append(!r.failed()).append(",\n");
        b.append("  \"summary\": {\"errors\": ").append(r.errors()).append(", \"warnings\": ").append(r.warnings())
         .append(", \"notes\": ").append(r.notes()).append(", \"not_listed\": ").append(r.notKept())
         .append(", \"forms\": ").append(r.forms()).append(", \"coefficient_rows\": ").append(r.rows()).append("},\n");
        b.append("  \"datasets\": ").append(list(r.datasets())).append(",\n");
        b.append("  \"checks\": ").append(list(r.checks())).append(",\n");
        b.append("  \"findings\": [");
        String sep = "\n";
        for (Finding f : r.findings()) {
            b.append(sep).append("    {");
            b.append("\"check\": ").append(Json.str(f.check()));
            b.append(", \"severity\": ").append(Json.str(f.severity().label()));
            b.append(", \"file\": ").append(Json.str(f.location().file()));
            b.append(", \"line\": ").append(f.location().line());
            b.append(", \"column\": ").append(f.location().column());
            b.append(", \"subject\": {\"kind\": ").append(Json.str(f.subject().kind()))
             .append(", \"name\": ").append(Json.str(f.subject().name()))
             .append(", \"detail\": ").append(Json.str(f.subject().detail())).append('}');
            b.append(", \"expected\": ").append(Json.str(f.expected()));
            b.append(", \"found\": ").append(Json.str(f.found()));
            b.append(", \"reason\": ").append(Json.str(f.reason()));
            b.append('}');
            sep = ",\n";
        }
        b.append(r.findings().isEmpty() ? "]\n" : "\n  ]\n");
        b.append("}\n");
        return b.toString();
    }

    private static String list(List<String> items) {
        List<String> quoted = new ArrayList<>();
        for (String s : items) {
            quoted.add(Json.str(s));
        }
        return "[" + String.join(", ", quoted) + "]";
    }
}
