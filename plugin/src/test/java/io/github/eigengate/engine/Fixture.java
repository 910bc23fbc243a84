package io.github.eigengate.engine;

import io.github.eigengate.check.Check;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Builds datasets from the reference CSVs under src/test/resources, with planted changes. */
public final class Fixture {

    private final List<String> lines;

    private Fixture(List<String> lines) {
        this.lines = lines;
    }

    /** The directory of a dataset under src/test/resources/datasets (read in place: the gate never writes). */
    public static Path dataset(String name) {
        try {
            return Path.of(Fixture.class.getClassLoader().getResource("datasets/" + name).toURI());
        } catch (java.net.URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Reads a resource, e.g. {@code reference/tau.csv}. */
    public static Fixture of(String resource) {
        try (InputStream in = Fixture.class.getClassLoader().getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalArgumentException("no test resource " + resource);
            }
            return new Fixture(new ArrayList<>(List.of(new String(in.readAllBytes(), StandardCharsets.UTF_8)
                    .split("\n", -1))));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Replaces the value of (form, n): the planted error. Fails if the row is absent. */
    public Fixture plant(String form, int n, String value) {
        String prefix = form + "," + n + ",";
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(prefix)) {
                lines.set(i, prefix + "\"" + value + "\"");
                return this;
            }
        }
        throw new IllegalArgumentException("no row " + prefix);
    }

    /** The value cell of (form, n), unquoted. */
    public String valueOf(String form, int n) {
        String line = lines.get(lineOf(form, n) - 1);
        String v = line.substring((form + "," + n + ",").length());
        return v.startsWith("\"") ? v.substring(1, v.length() - 1) : v;
    }

    /** The 1-based line of (form, n) in the file. */
    public int lineOf(String form, int n) {
        String prefix = form + "," + n + ",";
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(prefix)) {
                return i + 1;
            }
        }
        throw new IllegalArgumentException("no row " + prefix);
    }

    public String text() {
        return String.join("\n", lines);
    }

    /** Writes forms.csv and this as coefficients.csv into dir and runs the given checks. */
    public Report run(Path dir, String forms, Check... checks) {
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", text());
        return new Gate(Settings.defaults(), List.of(checks)).run(List.of(new Gate.Dataset(dir, "data")));
    }
}
