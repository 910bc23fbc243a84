package io.github.eigengate.engine;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Writes tiny in-memory datasets for tests and runs the gate on them. */
public final class Datasets {

    private Datasets() {
    }

    /** Writes {@code name → content} pairs into {@code dir} (created). */
    public static Path write(Path dir, String... nameThenContent) {
        try {
            Files.createDirectories(dir);
            for (int i = 0; i < nameThenContent.length; i += 2) {
                Files.writeString(dir.resolve(nameThenContent[i]), nameThenContent[i + 1], StandardCharsets.UTF_8);
            }
            return dir;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static Report run(Path dir) {
        return new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(dir, "data")));
    }

    public static Report run(Path dir, Settings settings) {
        return new Gate(settings).run(List.of(new Gate.Dataset(dir, "data")));
    }

    /** The report's finding lines, in order. */
    public static List<String> lines(Report r) {
        return r.findings().stream().map(f -> f.line()).toList();
    }

    /** The lines of error findings only. */
    public static List<String> errors(Report r) {
        return r.findings().stream().filter(f -> f.severity() == io.github.eigengate.check.Severity.ERROR)
                .map(f -> f.line()).toList();
    }
}
