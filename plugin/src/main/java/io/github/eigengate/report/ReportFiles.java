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

    /** Longest certificate file name kept as it is; file systems allow 255 bytes. */
    static final int MAX_NAME = 120;

    /**
     * The file a certificate is written to: its name when that is short and plain ({@code [A-Za-z0-9._-]}), else a
     * plain prefix of it and the start of its SHA-256, so that an id with a path separator, characters a file system
     * cannot encode, or 300 bytes still gives one safe, distinct, reproducible file name.
     */
    static String fileName(String name) {
        if (name.length() <= MAX_NAME && name.matches("[A-Za-z0-9._-]+") && !name.startsWith(".")) {
            return name;
        }
        String plain = name.replaceAll("[^A-Za-z0-9._-]", "_").replaceFirst("^\\.+", "_");
        if (plain.length() > 60) {
            plain = plain.substring(0, 60);
        }
        try {
            byte[] h = java.security.MessageDigest.getInstance("SHA-256").digest(name.getBytes(StandardCharsets.UTF_8));
            return plain + "-" + java.util.HexFormat.of().formatHex(h, 0, 8) + ".txt";
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every JDK", e);
        }
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
                Files.writeString(certs.resolve(fileName(c.name())), c.text(), StandardCharsets.UTF_8);
            }
        }
    }
}
