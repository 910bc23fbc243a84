package io.github.eigengate.cache;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.function.Consumer;

/**
 * A content-addressed store of text entries: {@code key} (a SHA-256 in hex, computed by the caller from everything
 * the entry depends on) → text. Each entry file starts with a format line, its key and the SHA-256 of its body, so a
 * truncated, corrupt or foreign file is recognised, reported once to {@code warnings}, ignored and overwritten by
 * the next {@link #put}. Writes go to a temporary file moved into place, so concurrent runs never see half an entry.
 * Plain JDK, no Eigengate types.
 */
public final class ContentStore {

    static final String FORMAT = "eigengate-cache/1";

    private final Path directory;
    private final Consumer<String> warnings;
    private boolean unwritable;

    public ContentStore(Path directory, Consumer<String> warnings) {
        this.directory = directory;
        this.warnings = warnings;
    }

    /** SHA-256 of UTF-8 text, in lower-case hex. */
    public static String sha256(String text) {
        return HexFormat.of().formatHex(digest().digest(text.getBytes(StandardCharsets.UTF_8)));
    }

    public static MessageDigest digest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every JDK", e);
        }
    }

    private Path file(String key) {
        if (!key.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("not a SHA-256 key: " + key);
        }
        return directory.resolve(key.substring(0, 2)).resolve(key);
    }

    /** The entry's body, or {@code null} when there is none or it is not intact (then after a warning). */
    public String get(String key) {
        Path f = file(key);
        if (!Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS)) {
            return null;
        }
        String text;
        try {
            text = new String(Files.readAllBytes(f), StandardCharsets.UTF_8);
        } catch (IOException e) {
            warnings.accept("eigengate cache: cannot read entry " + key + " (" + e.getMessage()
                    + "); it is ignored and rebuilt");
            return null;
        }
        String head = FORMAT + "\nkey " + key + "\nsha256 ";
        int bodyAt = head.length() + 65;
        if (!text.startsWith(head) || text.length() < bodyAt || text.charAt(bodyAt - 1) != '\n') {
            warnings.accept("eigengate cache: entry " + key + " is not an Eigengate cache entry for this key; it is "
                    + "ignored and rebuilt");
            return null;
        }
        String sum = text.substring(head.length(), bodyAt - 1);
        String body = text.substring(bodyAt);
        if (!sha256(body).equals(sum)) {
            warnings.accept("eigengate cache: entry " + key + " is corrupt or truncated (checksum mismatch); it is "
                    + "ignored and rebuilt");
            return null;
        }
        return body;
    }

    /** Stores an entry; a cache that cannot be written is reported once and then left alone. */
    public void put(String key, String body) {
        if (unwritable) {
            return;
        }
        Path f = file(key);
        String text = FORMAT + "\nkey " + key + "\nsha256 " + sha256(body) + "\n" + body;
        try {
            Files.createDirectories(f.getParent());
            Path tmp = Files.createTempFile(f.getParent(), key.substring(0, 8), ".tmp");
            try {
                Files.write(tmp, text.getBytes(StandardCharsets.UTF_8));
                try {
                    Files.move(tmp, f, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, f, StandardCopyOption.REPLACE_EXISTING);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (IOException | RuntimeException e) {
            unwritable = true;
            warnings.accept("eigengate cache: cannot write to " + directory + " (" + e.getMessage()
                    + "); this run is not cached");
        }
    }
}
