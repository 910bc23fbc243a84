package io.github.eigengate.arith;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the semicolon-separated fixture files under {@code /arith/}; lines starting with # are comments. */
final class Fixtures {
    private Fixtures() {}

    static List<String[]> rows(String name) {
        List<String[]> out = new ArrayList<>();
        try (InputStream in = Fixtures.class.getResourceAsStream("/arith/" + name)) {
            if (in == null) {
                throw new IllegalStateException("missing fixture " + name);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                out.add(line.split(";", -1));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        if (out.isEmpty()) {
            throw new IllegalStateException("empty fixture " + name);
        }
        return out;
    }
}
