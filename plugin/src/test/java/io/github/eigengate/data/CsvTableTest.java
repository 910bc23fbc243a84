package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.engine.Datasets;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

public class CsvTableTest {

    @TempDir
    Path dir;

    /** Records what a reader reports, as strings. */
    public static final class Recorded implements Problems {
        final List<String> errors = new ArrayList<>();
        final List<String> warnings = new ArrayList<>();

        @Override
        public void error(SourceLocation at, String subject, String expected, String found, String reason) {
            errors.add(at + " " + subject + " | " + expected + " | " + found + " | " + reason);
        }

        @Override
        public void warning(SourceLocation at, String subject, String expected, String found, String reason) {
            warnings.add(at + " " + subject + " | " + expected + " | " + found + " | " + reason);
        }
    }

    private List<String> lines(String content, List<String> required, List<String> optional, Recorded problems) {
        Datasets.write(dir, "t.csv", content);
        List<String> seen = new ArrayList<>();
        CsvTable.of(dir.resolve("t.csv"), "t.csv", required, optional).read(problems,
                row -> seen.add(row.line() + ":" + row.get("a") + "/" + row.get("b") + "@" + row.at("b").column()));
        return seen;
    }

    @Test
    void rowsCarryTheirPhysicalLineAcrossCommentsBlankLinesAndQuotedBreaks() {
        Recorded p = new Recorded();
        List<String> seen = lines("# provenance\n# more\nb,a\n\n2,1\n# mid comment\n\"x\ny\",3\n5, 4 \n",
                List.of("a", "b"), List.of(), p);
        assertEquals(List.of("5:1/2@1", "7:3/x\ny@1", "9:4/5@1"), seen);
        assertTrue(p.errors.isEmpty());
    }

    @Test
    void missingRequiredColumnIsAnErrorOnTheHeaderLine() {
        Recorded p = new Recorded();
        List<String> seen = lines("# c\na\n1\n", List.of("a", "b"), List.of(), p);
        assertTrue(seen.isEmpty());
        assertEquals(List.of("t.csv:2 table=t.csv | a column 'b' | columns a | the column 'b' is required in t.csv"),
                p.errors);
    }

    @Test
    void unknownColumnIsAWarning() {
        Recorded p = new Recorded();
        List<String> seen = lines("a,b,c\n1,2,3\n", List.of("a", "b"), List.of("d"), p);
        assertEquals(List.of("2:1/2@2"), seen);
        assertEquals(1, p.warnings.size());
        assertTrue(p.warnings.get(0).startsWith("t.csv:1:3 table=t.csv | one of "), p.warnings.get(0));
        assertTrue(p.warnings.get(0).endsWith("| c | unknown column 'c' is ignored"), p.warnings.get(0));
    }

    @Test
    void emptyFileIsAnError() {
        Recorded p = new Recorded();
        lines("", List.of("a"), List.of(), p);
        assertEquals(List.of("t.csv table=t.csv | a header row | an empty file | every table starts with a header "
                + "row naming its columns"), p.errors);
    }

    @Test
    void unterminatedQuoteIsReportedNotThrown() {
        Recorded p = new Recorded();
        List<String> seen = lines("a,b\n1,2\n3,\"4\n", List.of("a", "b"), List.of(), p);
        assertEquals(List.of("2:1/2@2"), seen);
        assertEquals(1, p.errors.size());
        assertTrue(p.errors.get(0).contains("malformed CSV"), p.errors.get(0));
    }

    @Test
    void invalidUtf8IsReportedAtItsLineAndTheRestIsRead() throws IOException {
        Files.write(dir.resolve("t.csv"), new byte[] {'a', ',', 'b', '\n', (byte) 0xff, ',', '1', '\n', '3', ',',
            '4', '\n'});
        Recorded p = new Recorded();
        List<String> seen = new ArrayList<>();
        boolean ok = CsvTable.of(dir.resolve("t.csv"), "t.csv", List.of("a"), List.of()).read(p,
                row -> seen.add(row.line() + ":" + row.get("a")));
        assertTrue(ok);
        assertEquals(List.of("3:3"), seen);
        assertEquals(List.of("t.csv:2 table=t.csv | UTF-8 text | bytes that are not UTF-8 | line 2 is not valid "
                + "UTF-8; it is not read"), p.errors);
    }

    /** Regression (fuzzing, issue 14): an undecodable byte past the first 8 KB was reported at line 1, and the rest dropped. */
    @Test
    void invalidUtf8FarIntoTheFileIsReportedAtItsLine() throws IOException {
        java.io.ByteArrayOutputStream b = new java.io.ByteArrayOutputStream();
        b.writeBytes("# a comment\na,b\n".getBytes(java.nio.charset.StandardCharsets.UTF_8));
        for (int i = 1; i <= 3000; i++) {
            b.writeBytes((i + ",é\n").getBytes(java.nio.charset.StandardCharsets.UTF_8));
        }
        b.write(0xc3); // a lead byte whose continuation is missing: line 3003
        b.writeBytes(",x\n3001,y\n3002,\"two\nlines \u00e9\"\n".getBytes(java.nio.charset.StandardCharsets.UTF_8));
        b.write(0xe2);
        b.write(0x82); // truncated at the end of the file: line 3007
        Files.write(dir.resolve("t.csv"), b.toByteArray());
        Recorded p = new Recorded();
        List<String> seen = new ArrayList<>();
        CsvTable.of(dir.resolve("t.csv"), "t.csv", List.of("a"), List.of()).read(p,
                row -> seen.add(row.line() + ":" + row.get("a")));
        assertEquals(3002, seen.size());
        assertEquals(List.of("3:1", "3004:3001", "3005:3002"), List.of(seen.get(0), seen.get(3000), seen.get(3001)));
        assertEquals(List.of("t.csv:3003 table=t.csv | UTF-8 text | bytes that are not UTF-8 | line 3003 is not valid "
                + "UTF-8; it is not read", "t.csv:3007 table=t.csv | UTF-8 text | bytes that are not UTF-8 | line 3007 "
                + "is not valid UTF-8; it is not read"), p.errors);
    }

    @Test
    void duplicateHeaderIsAnErrorAtTheHeadersLine() {
        Recorded p = new Recorded();
        lines("# made by hand\n# second comment\na,a\n1,2\n", List.of("a"), List.of(), p);
        assertEquals(List.of("t.csv:3:2 table=t.csv | distinct column names | a | the column 'a' appears twice in the "
                + "header (columns 1 and 2)"), p.errors);
    }

    @Test
    void anEmptyHeaderNameIsAnErrorAtItsColumn() {
        Recorded p = new Recorded();
        lines("# comment\na,,b\n1,2,3\n", List.of("a"), List.of("b"), p);
        assertEquals(List.of("t.csv:2:2 table=t.csv | a column name | an empty cell | column 2 of the header has no "
                + "name"), p.errors);
    }

    @Test
    void surplusCellsAreReported() {
        Recorded p = new Recorded();
        List<String> seen = lines("a,b\n1,2,3\n4,5,\n6,7\n", List.of("a", "b"), List.of(), p);
        assertEquals(List.of("3:4/5@2", "4:6/7@2"), seen);
        assertEquals(List.of("t.csv:2:3 table=t.csv | 2 cells | 3 cells | the row has more cells than the header has "
                + "columns (2): a comma too many, or a cell that needs quotes; the row is skipped"), p.errors);
        assertEquals(List.of("t.csv:3:3 table=t.csv | 2 cells | 3 cells | the row has empty cells beyond the header's 2 "
                + "columns; they are ignored"), p.warnings);
    }

    @Test
    void aByteOrderMarkBeforeACommentAndBlankLinesAreNotRows() {
        Recorded p = new Recorded();
        List<String> seen = lines("\uFEFF# comment\na,b\n   \n1,2\n \t \n", List.of("a", "b"), List.of(), p);
        assertEquals(List.of("4:1/2@2"), seen);
        assertEquals(List.of(), p.errors);
        assertEquals(List.of(), p.warnings);
    }

    @Test
    void theExpectedColumnsOfAnUnknownColumnAreInContractOrder() {
        Recorded p = new Recorded();
        lines("a,b0,zz\n1,2,3\n", List.of("a", "b0"), List.of("c", "d", "e", "f", "g", "h"), p);
        assertEquals(List.of("t.csv:1:3 table=t.csv | one of a,b0,c,d,e,f,g,h | zz | unknown column 'zz' is "
                + "ignored"), p.warnings);
    }

    @Test
    void aSpaceBeforeAQuoteIsReportedAndTheRowSkipped() {
        Recorded p = new Recorded();
        List<String> seen = lines("a,b\n1, \"x, y\"\n2,\"z\"\n", List.of("a", "b"), List.of(), p);
        assertEquals(List.of("3:2/z@2"), seen);
        assertEquals(List.of("t.csv:2:2 table=t.csv | a quote right after the comma |  \"x | a quoted cell must start "
                + "right after the comma (RFC 4180): remove the space before the quote; the row is skipped"), p.errors);
    }

    @Test
    void spacesAroundPlainCellsAreStripped() {
        Recorded p = new Recorded();
        assertEquals(List.of("2:1/2@2"), lines("a , b\n 1 , 2 \n", List.of("a", "b"), List.of(), p));
    }
}
