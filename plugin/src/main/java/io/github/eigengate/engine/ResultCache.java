package io.github.eigengate.engine;

import io.github.eigengate.cache.ContentStore;
import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Measure;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Coefficients;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.SourceLocation;
import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import java.util.stream.Stream;

/**
 * Results kept between runs, on two levels, both keyed by content (see docs/configuration.md, "Cache"):
 *
 * <ul>
 *   <li>a dataset: the bytes of every file in its directory, the settings that affect verdicts, the enabled checks
 *       and the code of Eigengate itself. An unchanged dataset is read and hashed, not parsed or checked;
 *   <li>a form, for the per-form checks: its row and every coefficient with its file and line, the same settings
 *       and code. When a dataset changed, unchanged forms are parsed but not re-checked; the checks across forms
 *       (spaces, congruences, weights) are always recomputed for a changed dataset.
 * </ul>
 *
 * An entry that is not intact is ignored with a warning and rebuilt (see {@link ContentStore}): the cache can make a
 * run faster, never change its verdict.
 */
class ResultCache {

    /** What a dataset produced. */
    record DatasetResult(Collector.Snapshot collected, long rows, int forms) {
    }

    static final ResultCache NONE = new ResultCache(null, null, null);

    private static volatile String codeId;

    private final ContentStore store;
    private final String base;

    ResultCache(ContentStore store, Settings settings, List<String> checks) {
        this.store = store;
        this.base = store == null ? "" : "code=" + codeId() + "\nsettings=" + settings.fingerprint() + "\nroot="
                + settings.root() + "\nchecks=" + String.join(",", checks) + "\n";
    }

    /** The key of a dataset's directory content, or {@code null} without a cache. */
    String datasetKey(Gate.Dataset d) {
        if (store == null) {
            return null;
        }
        MessageDigest md = ContentStore.digest();
        update(md, "eigengate-dataset/1\n" + base + "display=" + d.display() + "\ndirectory="
                + d.directory().toAbsolutePath().normalize() + "\n");
        Path dir = d.directory();
        if (!Files.isDirectory(dir)) {
            update(md, "missing\n");
            return HexFormat.of().formatHex(md.digest());
        }
        try {
            update(md, "real=" + dir.toRealPath() + "\n");
            List<Path> entries;
            try (Stream<Path> s = Files.list(dir)) {
                entries = s.sorted().toList();
            }
            for (Path p : entries) {
                update(md, "entry=" + p.getFileName() + "\n");
                if (Files.isSymbolicLink(p)) {
                    update(md, "link=" + Files.readSymbolicLink(p) + "\n");
                    update(md, "resolves=" + (Files.exists(p) ? p.toRealPath().toString() : "nothing") + "\n");
                }
                if (Files.isRegularFile(p)) {
                    update(md, "size=" + Files.size(p) + "\n");
                    try (InputStream in = Files.newInputStream(p)) {
                        byte[] buf = new byte[1 << 16];
                        for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
                            md.update(buf, 0, n);
                        }
                    }
                } else {
                    update(md, Files.isDirectory(p) ? "directory\n"
                            : Files.exists(p, LinkOption.NOFOLLOW_LINKS) ? "special\n" : "dangling\n");
                }
            }
        } catch (IOException | RuntimeException e) {
            return null; // not hashable: not cached, checked afresh (and the reader reports the problem)
        }
        return HexFormat.of().formatHex(md.digest());
    }

    DatasetResult dataset(String key) {
        if (store == null || key == null) {
            return null;
        }
        String body = store.get(key);
        if (body == null) {
            return null;
        }
        try {
            int nl = body.indexOf('\n');
            String[] meta = body.substring(0, nl).split(" ");
            if (meta.length != 3 || !meta[0].equals("dataset")) {
                throw new IllegalArgumentException("no dataset line");
            }
            return new DatasetResult(read(body.substring(nl + 1)), Long.parseLong(meta[1]),
                    Integer.parseInt(meta[2]));
        } catch (RuntimeException e) {
            return null;
        }
    }

    void putDataset(String key, DatasetResult r) {
        if (store != null && key != null) {
            store.put(key, "dataset " + r.rows() + " " + r.forms() + "\n" + write(r.collected()));
        }
    }

    /** The per-form checks' result for a form, from the cache or computed (and then stored). */
    Collector.Snapshot form(FormData<?> data, Supplier<Collector.Snapshot> compute) {
        if (store == null) {
            return compute.get();
        }
        String key = formKey(data);
        String body = store.get(key);
        if (body != null) {
            try {
                return read(body);
            } catch (RuntimeException e) {
                // a well-formed entry that does not parse: ignore, recompute, overwrite
            }
        }
        Collector.Snapshot s = compute.get();
        store.put(key, write(s));
        return s;
    }

    private String formKey(FormData<?> data) {
        MessageDigest md = ContentStore.digest();
        Form f = data.form();
        StringBuilder b = new StringBuilder(256);
        b.append("eigengate-form/1\n").append(base).append("id=").append(esc(f.id())).append("\nlevel=")
         .append(f.level()).append("\nweight=").append(f.weight()).append("\nfield=").append(f.fieldPolynomial())
         .append("\ncharacter=").append(f.character().cell()).append("\nzeta=").append(data.zeta())
         .append("\nat=").append(esc(f.location().toString())).append('\n');
        update(md, b.toString());
        Coefficients<?> a = data.coefficients();
        for (int n : a.indices()) {
            b.setLength(0);
            b.append(n).append('\t').append(a.get(n)).append('\t').append(esc(a.at(n).toString())).append('\n');
            update(md, b.toString());
        }
        return HexFormat.of().formatHex(md.digest());
    }

    private static void update(MessageDigest md, String s) {
        md.update(s.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Identifies the code that computed a result: the SHA-256 of the plugin's jar (or of its class files when run
     * from a build directory), so that any change of Eigengate, released or not, invalidates the cache.
     */
    static String codeId() {
        String id = codeId;
        if (id == null) {
            MessageDigest md = ContentStore.digest();
            try {
                Path where = Path.of(Gate.class.getProtectionDomain().getCodeSource().getLocation().toURI());
                if (Files.isRegularFile(where)) {
                    md.update(Files.readAllBytes(where));
                } else {
                    try (Stream<Path> all = Files.walk(where)) {
                        for (Path p : all.filter(q -> q.toString().endsWith(".class")).sorted().toList()) {
                            update(md, where.relativize(p).toString());
                            md.update(Files.readAllBytes(p));
                        }
                    }
                }
            } catch (IOException | URISyntaxException | RuntimeException e) {
                update(md, "unknown code " + System.nanoTime()); // never reuse what cannot be attributed
            }
            id = HexFormat.of().formatHex(md.digest());
            codeId = id;
        }
        return id;
    }

    // --- serialisation of a snapshot: one record per line, tab-separated, escaped

    static String write(Collector.Snapshot s) {
        StringBuilder b = new StringBuilder(256);
        b.append("counts");
        for (Severity v : Severity.values()) {
            b.append('\t').append(s.counts().getOrDefault(v, 0));
        }
        b.append('\n');
        s.examined().forEach((check, units) -> units.forEach(u -> line(b, "X", check, u.kind(), u.name(),
                u.detail())));
        for (Finding f : s.findings()) {
            line(b, "F", f.check(), f.severity().name(), f.location().file(),
                    Integer.toString(f.location().line()), Integer.toString(f.location().column()),
                    f.subject().kind(), f.subject().name(), f.subject().detail(), f.expected(), f.found(), f.reason());
        }
        for (Certificate c : s.certificates()) {
            line(b, "C", c.name(), c.text());
        }
        for (Measure m : s.measures()) {
            line(b, "M", m.check(), m.unit().kind(), m.unit().name(), m.unit().detail(), m.quantity(), m.value());
        }
        b.append("end\n");
        return b.toString();
    }

    private static void line(StringBuilder b, String tag, String... fields) {
        b.append(tag);
        for (String f : fields) {
            b.append('\t').append(esc(f));
        }
        b.append('\n');
    }

    static Collector.Snapshot read(String body) {
        Map<Severity, Integer> counts = new EnumMap<>(Severity.class);
        Map<String, List<Subject>> examined = new LinkedHashMap<>();
        List<Finding> findings = new ArrayList<>();
        List<Certificate> certificates = new ArrayList<>();
        List<Measure> measures = new ArrayList<>();
        boolean ended = false;
        for (String line : body.split("\n", -1)) {
            if (ended) {
                if (!line.isEmpty()) {
                    throw new IllegalArgumentException("text after the end");
                }
                continue;
            }
            String[] p = line.split("\t", -1);
            for (int i = 1; i < p.length; i++) {
                p[i] = unesc(p[i]);
            }
            switch (p[0]) {
                case "counts" -> {
                    Severity[] all = Severity.values();
                    need(p, all.length + 1);
                    for (int i = 0; i < all.length; i++) {
                        counts.put(all[i], Integer.parseInt(p[i + 1]));
                    }
                }
                case "X" -> {
                    need(p, 5);
                    examined.computeIfAbsent(p[1], k -> new ArrayList<>()).add(new Subject(p[2], p[3], p[4]));
                }
                case "F" -> {
                    need(p, 12);
                    findings.add(new Finding(p[1], Severity.valueOf(p[2]),
                            new SourceLocation(p[3], Integer.parseInt(p[4]), Integer.parseInt(p[5])),
                            new Subject(p[6], p[7], p[8]), p[9], p[10], p[11]));
                }
                case "C" -> {
                    need(p, 3);
                    certificates.add(new Certificate(p[1], p[2]));
                }
                case "M" -> {
                    need(p, 7);
                    measures.add(new Measure("", p[1], new Subject(p[2], p[3], p[4]), p[5], p[6]));
                }
                case "end" -> ended = true;
                default -> throw new IllegalArgumentException("unknown record " + p[0]);
            }
        }
        if (!ended || counts.size() != Severity.values().length) {
            throw new IllegalArgumentException("incomplete entry");
        }
        return new Collector.Snapshot(List.copyOf(findings), counts, examined, List.copyOf(certificates),
                List.copyOf(measures));
    }

    private static void need(String[] p, int n) {
        if (p.length != n) {
            throw new IllegalArgumentException("a record of " + p.length + " fields, expected " + n);
        }
    }

    /** Backslash escapes for backslash, tab, line breaks, and \\uXXXX for other controls and lone surrogates. */
    static String esc(String s) {
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean plain = c >= 0x20 && c != '\\' && c != 0x7f && !Character.isSurrogate(c);
            if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                if (b != null) {
                    b.append(c).append(s.charAt(i + 1));
                }
                i++;
                continue;
            }
            if (plain) {
                if (b != null) {
                    b.append(c);
                }
                continue;
            }
            if (b == null) {
                b = new StringBuilder(s.length() + 16).append(s, 0, i);
            }
            switch (c) {
                case '\\' -> b.append("\\\\");
                case '\t' -> b.append("\\t");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                default -> b.append(String.format("\\u%04x", (int) c));
            }
        }
        return b == null ? s : b.toString();
    }

    static String unesc(String s) {
        if (s.indexOf('\\') < 0) {
            return s;
        }
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '\\') {
                b.append(c);
                continue;
            }
            char e = s.charAt(++i);
            switch (e) {
                case '\\' -> b.append('\\');
                case 't' -> b.append('\t');
                case 'n' -> b.append('\n');
                case 'r' -> b.append('\r');
                case 'u' -> {
                    b.append((char) Integer.parseInt(s.substring(i + 1, i + 5), 16));
                    i += 4;
                }
                default -> throw new IllegalArgumentException("bad escape \\" + e);
            }
        }
        return b.toString();
    }
}
