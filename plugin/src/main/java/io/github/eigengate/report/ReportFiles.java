package io.github.eigengate.report;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.engine.Report;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

/** Writes the report files of a run into an output directory (never into a dataset). */
public final class ReportFiles {

    public static final String JSON = "report.json";
    public static final String JUNIT = "TEST-eigengate.xml";
    public static final String CERTIFICATES = "certificates";
    public static final String HTML = "report.html";

    /** The report files a run can write; certificates are always written. */
    public static final List<String> FORMATS = List.of("html", "json", "junit");

    private ReportFiles() {
    }

    public static void write(Report report, Path dir) throws IOException {
        write(report, dir, List.of(), Set.copyOf(FORMATS));
    }

    /**
     * Writes the chosen formats ({@link #FORMATS}) and the certificates; {@code forms} are the HTML report's plot
     * data ({@link ReportData#forms()}).
     */
    public static void write(Report report, Path dir, List<FormSeries> forms, Set<String> formats)
            throws IOException {
        Files.createDirectories(dir);
        if (formats.contains("json")) {
            Files.writeString(dir.resolve(JSON), JsonReport.render(report), StandardCharsets.UTF_8);
        }
        if (formats.contains("junit")) {
            Files.writeString(dir.resolve(JUNIT), JUnitXmlReport.render(report), StandardCharsets.UTF_8);
        }
        if (formats.contains("html")) {
            Files.writeString(dir.resolve(HTML), HtmlReport.render(report, forms), StandardCharsets.UTF_8);
        }
        Path certs = dir.resolve(CERTIFICATES);
        if (Files.isDirectory(certs)) {
            try (var old = Files.list(certs)) {
                for (Path p : old.toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
        if (!report.certificates().isEmpty()) {
            Files.createDirectories(certs);
            for (Certificate c : report.certificates()) {
                Files.writeString(certs.resolve(c.name()), c.text(), StandardCharsets.UTF_8);
            }
        }
    }
}
