package io.github.eigengate.theory.spaces;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the comma-separated fixtures under src/test/resources/spaces; lines starting with '#' are comments. */
final class Fixtures {

    private Fixtures() {
    }

    static List<String[]> rows(String name) {
        InputStream in = Fixtures.class.getResourceAsStream("/spaces/" + name);
        if (in == null) {
            throw new IllegalStateException("missing fixture /spaces/" + name);
        }
        List<String[]> out = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                out.add(line.split(","));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }
}
