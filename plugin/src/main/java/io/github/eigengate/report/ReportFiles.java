package io.github.eigengate.report;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.engine.Report;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes the report files of a run into an output directory (never into a dataset). */
public final class ReportFiles {

    public static final String JSON = "report.json";
    public static final String JUNIT = "TEST-eigengate.xml";
    public static final String CERTIFICATES = "certificates";

    private ReportFiles() {
    }

    public static void write(Report report, Path dir) throws IOException {
        Files.createDirectories(dir);
        Files.writeString(dir.resolve(JSON), JsonReport.render(report), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve(JUNIT), JUnitXmlReport.render(report), StandardCharsets.UTF_8);
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
