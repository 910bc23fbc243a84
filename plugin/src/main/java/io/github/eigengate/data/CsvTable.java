package io.github.eigengate.data;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.csv.DuplicateHeaderMode;

/**
 * Reads one CSV table of the data contract: UTF-8, RFC 4180, a header row, {@code #} comment lines, columns in any
 * order. Missing required columns and undecodable or malformed files are reported to {@link Problems}; unknown
 * columns are warnings. Rows are streamed, never held.
 */
public final class CsvTable {

    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder()
            .setHeader()
            .setSkipHeaderRecord(true)
            .setCommentMarker('#')
            .setIgnoreEmptyLines(true)
            .setDuplicateHeaderMode(DuplicateHeaderMode.ALLOW_ALL) // reported by read(), at the header's line
            .setAllowMissingColumnNames(true)
            .get();

    private final Path path;
    private final String display;
    private final List<String> required;
    private final Set<String> known;
    private final List<String> knownInOrder;

    private CsvTable(Path path, String display, List<String> required, Collection<String> optional) {
        this.path = path;
        this.display = display;
        this.required = List.copyOf(required);
        Set<String> all = new java.util.LinkedHashSet<>(required);
        all.addAll(optional);
        this.known = Set.copyOf(all);
        this.knownInOrder = List.copyOf(all);
    }

    /**
     * @param display  the file name as reports show it
     * @param required columns that must be present
     * @param optional further columns that are understood; any other column is a warning
     */
    public static CsvTable of(Path path, String display, List<String> required, Collection<String> optional) {
        return new CsvTable(path, display, required, optional);
    }

    public String display() {
        return display;
    }

    /**
     * Streams the rows to {@code each}. Returns false (after reporting why) when the table could not be read at all
     * or lacks a required column; rows read before a mid-file syntax error have been delivered. A line that is not
     * valid UTF-8 is reported at its line and skipped, the rest of the file is read; a line of only whitespace is
     * not a row; cells beyond the header's columns are reported.
     */
    public boolean read(Problems problems, Consumer<Row> each) {
        if (!Files.isRegularFile(path)) { // a FIFO would block the build, a directory cannot be read
            problems.error(SourceLocation.file(display), "table=" + display, "a regular file",
                    Files.isDirectory(path) ? "a directory" : Files.exists(path) ? "a special file" : "nothing",
                    "the table is not a regular file; it is not read");
            return false;
        }
        try (Utf8Reader in = new Utf8Reader(Files.newInputStream(path));
             CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            List<String> header = parser.getHeaderNames().stream().map(CsvTable::headerName).toList();
            int headerLine = (int) Math.max(1, parser.getCurrentLineNumber());
            undecodable(in, headerLine, problems);
            if (header.isEmpty()) {
                problems.error(SourceLocation.file(display), "table=" + display, "a header row", "an empty file",
                        "every table starts with a header row naming its columns");
                return false;
            }
            Map<String, Integer> index = new HashMap<>();
            for (int i = 0; i < header.size(); i++) {
                if (header.get(i).isEmpty()) {
                    problems.error(new SourceLocation(display, headerLine, i + 1), "table=" + display,
                            "a column name", "an empty cell", "column " + (i + 1) + " of the header has no name");
                    return false;
                }
                Integer before = index.putIfAbsent(header.get(i), i);
                if (before != null) {
                    problems.error(new SourceLocation(display, headerLine, i + 1), "table=" + display,
                            "distinct column names", header.get(i), "the column '" + header.get(i)
                                    + "' appears twice in the header (columns " + (before + 1) + " and " + (i + 1)
                                    + ")");
                    return false;
                }
            }
            boolean complete = true;
            for (String column : required) {
                if (!index.containsKey(column)) {
                    problems.error(SourceLocation.row(display, headerLine), "table=" + display,
                            "a column '" + column + "'", "columns " + String.join(",", header),
                            "the column '" + column + "' is required in " + display);
                    complete = false;
                }
            }
            for (int i = 0; i < header.size(); i++) {
                if (!known.contains(header.get(i))) {
                    problems.warning(new SourceLocation(display, headerLine, i + 1), "table=" + display,
                            "one of " + String.join(",", knownInOrder), header.get(i),
                            "unknown column '" + header.get(i) + "' is ignored");
                }
            }
            if (!complete) {
                return false;
            }
            Row row = new Row(index);
            Iterator<CSVRecord> records = parser.iterator();
            long previousEnd = parser.getCurrentLineNumber();
            while (true) {
                CSVRecord record;
                try {
                    if (!records.hasNext()) {
                        break;
                    }
                    record = records.next();
                } catch (UncheckedIOException | IllegalStateException e) {
                    undecodable(in, Integer.MAX_VALUE, problems);
                    problems.error(SourceLocation.row(display, (int) parser.getCurrentLineNumber()), "table=" + display,
                            "RFC 4180 CSV", "malformed CSV", "the file cannot be parsed here: " + causeText(e));
                    return false;
                }
                long end = parser.getCurrentLineNumber();
                // a record right after the previous one, on one line, starts where it ends
                int first = end - previousEnd == 1 ? (int) end : startLine(record, end);
                row.set(record, first);
                previousEnd = end;
                undecodable(in, first - 1, problems);
                if (undecodable(in, (int) end, problems)) {
                    continue;
                }
                if (record.size() == 1 && record.get(0).isBlank()) {
                    continue; // a line of only whitespace is not a row
                }
                int spaced = spaceBeforeQuote(record);
                if (spaced >= 0) {
                    problems.error(new SourceLocation(display, row.line(), spaced + 1), "table=" + display,
                            "a quote right after the comma", record.get(spaced),
                            "a quoted cell must start right after the comma (RFC 4180): remove the space before the "
                                    + "quote; the row is skipped");
                    continue;
                }
                if (record.size() > header.size() && !surplusExplained(record, header.size(), row, problems)) {
                    continue;
                }
                each.accept(row);
            }
            undecodable(in, Integer.MAX_VALUE, problems);
            return true;
        } catch (IOException | UncheckedIOException e) {
            Throwable cause = e instanceof UncheckedIOException u ? u.getCause() : e;
            problems.error(SourceLocation.file(display), "table=" + display, "a readable file", "an I/O error",
                    "the file cannot be read: " + causeText(cause));
        } catch (IllegalArgumentException e) {
            problems.error(SourceLocation.row(display, 1), "table=" + display, "a header row of distinct names",
                    "a malformed header", "the header cannot be read: " + causeText(e));
        }
        return false;
    }

    /**
     * Reports the undecodable lines up to {@code line}; true when one of them is {@code line} itself (or the
     * record ending there), whose row is then skipped.
     */
    private boolean undecodable(Utf8Reader in, int line, Problems problems) {
        boolean hit = false;
        while (!in.errorLines.isEmpty() && in.errorLines.peekFirst() <= line) {
            int at = in.errorLines.removeFirst();
            hit |= line != Integer.MAX_VALUE;
            problems.error(SourceLocation.row(display, at), "table=" + display, "UTF-8 text",
                    "bytes that are not UTF-8", "line " + at + " is not valid UTF-8; it is not read");
        }
        return hit;
    }

    /**
     * A row longer than the header: empty extra cells (a trailing comma) are a warning and the row is read; an
     * unquoted vector or weight set split at its commas is left to the table's reader, which says so precisely;
     * other extra cells are an error and the row is skipped.
     */
    private boolean surplusExplained(CSVRecord record, int width, Row row, Problems problems) {
        for (int i = 0; i < record.size(); i++) {
            String v = record.get(i).strip();
            if ((v.startsWith("[") && !v.endsWith("]")) || (v.startsWith("(") && !v.endsWith(")"))) {
                return true;
            }
        }
        boolean empty = true;
        for (int i = width; i < record.size(); i++) {
            empty &= record.get(i).isBlank();
        }
        String cells = record.size() + " cells";
        if (empty) {
            problems.warning(new SourceLocation(display, row.line(), width + 1), "table=" + display,
                    width + " cells", cells, "the row has empty cells beyond the header's " + width
                            + " columns; they are ignored");
            return true;
        }
        problems.error(new SourceLocation(display, row.line(), width + 1), "table=" + display, width + " cells",
                cells, "the row has more cells than the header has columns (" + width + "): a comma too many, or "
                        + "a cell that needs quotes; the row is skipped");
        return false;
    }

    /**
     * Decodes UTF-8 strictly, without giving up at a malformed sequence: it becomes U+FFFD and its line (1-based,
     * counting line feeds) is recorded, so the table reports it where it is and reads on. A leading byte-order mark
     * is dropped, so that a comment line after it is still a comment.
     */
    private static final class Utf8Reader extends java.io.Reader {
        private final java.io.InputStream in;
        private final java.nio.charset.CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(java.nio.charset.CodingErrorAction.REPORT)
                .onUnmappableCharacter(java.nio.charset.CodingErrorAction.REPORT);
        private final java.nio.ByteBuffer bytes = java.nio.ByteBuffer.allocate(1 << 13).flip();
        private final char[] chars = new char[1 << 13];
        private final java.util.ArrayDeque<Integer> errorLines = new java.util.ArrayDeque<>();
        private int from;
        private int to;
        private int line = 1;
        private boolean eof;
        private boolean flushed;
        private boolean started;

        Utf8Reader(java.io.InputStream in) {
            this.in = in;
        }

        @Override
        public int read(char[] buf, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            while (from == to) {
                if (!fill()) {
                    return -1;
                }
            }
            int n = Math.min(len, to - from);
            System.arraycopy(chars, from, buf, off, n);
            from += n;
            return n;
        }

        private boolean fill() throws IOException {
            if (flushed) {
                return false;
            }
            java.nio.CharBuffer out = java.nio.CharBuffer.wrap(chars, 0, chars.length - 1); // room for U+FFFD
            int counted = 0;
            while (out.position() == 0) {
                if (!eof) {
                    bytes.compact();
                    int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
                    if (n < 0) {
                        eof = true;
                    } else {
                        bytes.position(bytes.position() + n);
                    }
                    bytes.flip();
                }
                while (true) {
                    java.nio.charset.CoderResult r = decoder.decode(bytes, out, eof);
                    if (r.isError()) {
                        counted = countLines(counted, out.position());
                        if (errorLines.isEmpty() || errorLines.peekLast() != line) {
                            errorLines.addLast(line);
                        }
                        bytes.position(bytes.position() + r.length());
                        out.put('\uFFFD');
                        continue;
                    }
                    break; // underflow (more bytes needed) or overflow (chars full)
                }
                if (eof && !bytes.hasRemaining()) {
                    decoder.flush(out);
                    flushed = true; // this batch is the last
                    if (out.position() == 0) {
                        return false;
                    }
                    break;
                }
                if (!out.hasRemaining()) {
                    break;
                }
            }
            countLines(counted, out.position());
            from = 0;
            to = out.position();
            if (!started) {
                started = true;
                if (to > 0 && chars[0] == '\uFEFF') {
                    from = 1;
                }
            }
            return true;
        }

        private int countLines(int fromIndex, int toIndex) {
            for (int i = fromIndex; i < toIndex; i++) {
                if (chars[i] == '\n') {
                    line++;
                }
            }
            return toIndex;
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }

    private static String causeText(Throwable e) {
        String m = e.getMessage();
        return m == null ? e.getClass().getSimpleName() : m;
    }

    /** A header name without surrounding spaces or a UTF-8 byte-order mark. */
    private static String headerName(String raw) {
        String s = raw.startsWith("\uFEFF") ? raw.substring(1) : raw;
        return s.strip();
    }

    /** The position of a cell written {@code , "..."}, which RFC 4180 does not read as quoted, or -1. */
    private static int spaceBeforeQuote(CSVRecord record) {
        for (int i = 0; i < record.size(); i++) {
            String v = record.get(i);
            if (!v.isEmpty() && Character.isWhitespace(v.charAt(0)) && v.strip().startsWith("\"")) {
                return i;
            }
        }
        return -1;
    }

    /** The parser reports the line where a record ends; quoted line breaks inside it move the start up. */
    private static int startLine(CSVRecord record, long endLine) {
        int breaks = 0;
        for (String value : record) {
            for (int i = 0; i < value.length(); i++) {
                if (value.charAt(i) == '\n') {
                    breaks++;
                }
            }
        }
        return (int) endLine - breaks;
    }

    /** A reusable view of the current row; valid only inside the callback. */
    public final class Row {
        private final Map<String, Integer> index;
        private CSVRecord record;
        private int line;

        private Row(Map<String, Integer> index) {
            this.index = index;
        }

        private void set(CSVRecord record, int line) {
            this.record = record;
            this.line = line;
        }

        public boolean has(String column) {
            return index.containsKey(column);
        }

        /** The stripped cell, or "" when the column is absent or the row is short. */
        public String get(String column) {
            Integer i = index.get(column);
            return i == null ? "" : get(i);
        }

        /** The stripped cell at a 0-based position (see {@link #position}), "" when the row is short. */
        public String get(int position) {
            if (position < 0 || position >= record.size()) {
                return "";
            }
            return record.get(position).strip();
        }

        /** The 0-based position of a column, or -1. */
        public int position(String column) {
            Integer i = index.get(column);
            return i == null ? -1 : i;
        }

        public int line() {
            return line;
        }

        public SourceLocation at() {
            return SourceLocation.row(display, line);
        }

        public SourceLocation at(String column) {
            Integer i = index.get(column);
            return new SourceLocation(display, line, i == null ? 0 : i + 1);
        }

        public int size() {
            return record.size();
        }

        public int width() {
            return index.size();
        }
    }

    /** Lists the columns a table understands, for messages. */
    public Set<String> known() {
        return known;
    }
}
