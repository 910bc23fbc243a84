package io.github.eigengate.data;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
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
            .setDuplicateHeaderMode(DuplicateHeaderMode.DISALLOW)
            .get();

    private final Path path;
    private final String display;
    private final List<String> required;
    private final Set<String> known;

    private CsvTable(Path path, String display, List<String> required, Collection<String> optional) {
        this.path = path;
        this.display = display;
        this.required = List.copyOf(required);
        Set<String> all = new java.util.LinkedHashSet<>(required);
        all.addAll(optional);
        this.known = Set.copyOf(all);
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
     * or lacks a required column; rows read before a mid-file syntax error have been delivered.
     */
    public boolean read(Problems problems, Consumer<Row> each) {
        // Files.newBufferedReader decodes strictly: malformed UTF-8 raises CharacterCodingException
        try (BufferedReader in = Files.newBufferedReader(path, StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            List<String> header = parser.getHeaderNames().stream().map(CsvTable::headerName).toList();
            int headerLine = (int) Math.max(1, parser.getCurrentLineNumber());
            if (header.isEmpty()) {
                problems.error(SourceLocation.file(display), "table=" + display, "a header row", "an empty file",
                        "every table starts with a header row naming its columns");
                return false;
            }
            Map<String, Integer> index = new HashMap<>();
            for (int i = 0; i < header.size(); i++) {
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
                            "one of " + String.join(",", known), header.get(i),
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
                    problems.error(SourceLocation.row(display, (int) parser.getCurrentLineNumber()), "table=" + display,
                            "RFC 4180 CSV", "malformed CSV", "the file cannot be parsed here: " + causeText(e));
                    return false;
                }
                long end = parser.getCurrentLineNumber();
                // a record right after the previous one, on one line, starts where it ends
                row.set(record, end - previousEnd == 1 ? (int) end : startLine(record, end));
                previousEnd = end;
                int spaced = spaceBeforeQuote(record);
                if (spaced >= 0) {
                    problems.error(new SourceLocation(display, row.line(), spaced + 1), "table=" + display,
                            "a quote right after the comma", record.get(spaced),
                            "a quoted cell must start right after the comma (RFC 4180): remove the space before the "
                                    + "quote; the row is skipped");
                    continue;
                }
                each.accept(row);
            }
            return true;
        } catch (CharacterCodingException e) {
            problems.error(SourceLocation.file(display), "table=" + display, "UTF-8 text", "bytes that are not UTF-8",
                    "the file is not valid UTF-8");
        } catch (IOException | UncheckedIOException e) {
            Throwable cause = e instanceof UncheckedIOException u ? u.getCause() : e;
            if (cause instanceof CharacterCodingException) {
                problems.error(SourceLocation.file(display), "table=" + display, "UTF-8 text",
                        "bytes that are not UTF-8", "the file is not valid UTF-8");
            } else {
                problems.error(SourceLocation.file(display), "table=" + display, "a readable file", "an I/O error",
                        "the file cannot be read: " + causeText(cause));
            }
        } catch (IllegalArgumentException e) {
            problems.error(SourceLocation.row(display, 1), "table=" + display, "a header row of distinct names",
                    "a malformed header", "the header cannot be read: " + causeText(e));
        }
        return false;
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
