package io.github.eigengate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the one-way flow read → check → report visible: each package may refer only to the packages below it, and
 * only the Mojo sees Maven (DEVELOPERS.md, "Layout"). A scan of the sources for references, imports or qualified
 * names alike.
 */
class ArchitectureTest {

    private static final Path MAIN = Path.of("src/main/java/io/github/eigengate");

    /** Package prefix → references it must not contain. */
    private static final Map<String, List<String>> FORBIDDEN = Map.of(
            "arith", List.of("io.github.eigengate.", "org.apache."),
            "theory", List.of("io.github.eigengate.data", "io.github.eigengate.check", "io.github.eigengate.engine",
                    "io.github.eigengate.report", "io.github.eigengate.maven", "org.apache."),
            "cache", List.of("io.github.eigengate.", "org.apache."),
            "data", List.of("io.github.eigengate.theory", "io.github.eigengate.check", "io.github.eigengate.engine",
                    "io.github.eigengate.report", "io.github.eigengate.maven", "org.apache.maven"),
            "check", List.of("io.github.eigengate.engine", "io.github.eigengate.report", "io.github.eigengate.maven",
                    "org.apache."),
            "engine", List.of("io.github.eigengate.report", "io.github.eigengate.maven", "org.apache."),
            "report", List.of("io.github.eigengate.maven", "org.apache."),
            // the command line sees the engine and the reports, never Maven
            "cli", List.of("io.github.eigengate.maven", "org.apache.maven", "org.codehaus.plexus"));

    @Test
    void packagesReferOnlyDownwards() throws IOException {
        List<String> violations = new ArrayList<>();
        int files = 0;
        try (Stream<Path> all = Files.walk(MAIN)) {
            for (Path p : all.filter(f -> f.toString().endsWith(".java")).toList()) {
                files++;
                String pkg = MAIN.relativize(p).getName(0).toString();
                String text = Files.readString(p);
                for (String ref : FORBIDDEN.getOrDefault(pkg, List.of())) {
                    String own = "io.github.eigengate." + pkg;
                    for (String line : text.lines().toList()) {
                        if (line.contains(ref) && !(ref.equals("io.github.eigengate.") && line.contains(own))
                                && !line.startsWith("package ")) {
                            violations.add(MAIN.relativize(p) + ": " + line.strip());
                        }
                    }
                }
            }
        }
        assertTrue(files > 40, "sources found: " + files);
        assertEquals(List.of(), violations);
    }

    /** The command line is a thin layer: the engine, the reports and picocli, nothing of Maven. */
    @Test
    void theCommandLineImportsOnlyTheEngineTheReportsAndPicocli() throws IOException {
        List<String> allowed = List.of("java.", "picocli.", "io.github.eigengate.engine.", "io.github.eigengate.report.",
                "io.github.eigengate.check.", "io.github.eigengate.data.", "io.github.eigengate.cli.");
        List<String> violations = new ArrayList<>();
        int files = 0;
        try (Stream<Path> all = Files.list(MAIN.resolve("cli"))) {
            for (Path p : all.filter(f -> f.toString().endsWith(".java")).toList()) {
                files++;
                for (String line : Files.readAllLines(p)) {
                    if (line.startsWith("import ")) {
                        String ref = line.substring(7).replace("static ", "").strip();
                        if (allowed.stream().noneMatch(ref::startsWith)) {
                            violations.add(p.getFileName() + ": " + line);
                        }
                    }
                }
            }
        }
        assertTrue(files >= 3, "cli sources found: " + files);
        assertEquals(List.of(), violations);
    }
}
