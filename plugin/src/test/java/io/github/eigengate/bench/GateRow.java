package io.github.eigengate.bench;

import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The whole gate (all checks) against a plain commons-csv parse of the same coefficient table: {@code forms} copies
 * (distinct ids) of the level-32 newform with a_n for n ≤ {@code rows} each ({@link Level32Form}). Rounds are
 * interleaved (parse, gate) so that load on the machine hits both; the figure is parse time / gate time, i.e. the
 * gate's speed as a fraction of the parse's.
 */
final class GateRow implements Bench.Report {

    private final String name;
    private final int forms;
    private final int rows;

    GateRow(String name, int forms, int rows) {
        this.name = name;
        this.forms = forms;
        this.rows = rows;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String title() {
        return "whole gate vs plain commons-csv parse, " + forms + " form(s) x " + rows + " rows";
    }

    @Override
    public String measure(Path work) throws IOException {
        Path dir = dataset(work, forms, rows);
        Path table = dir.resolve("coefficients.csv");
        parse(table);
        gateOnce(dir);
        long[] parse = new long[5];
        long[] gate = new long[5];
        for (int i = 0; i < 5; i++) {
            long t0 = Bench.cpuNanos();
            parse(table);
            parse[i] = Bench.cpuNanos() - t0;
            t0 = Bench.cpuNanos();
            gateOnce(dir);
            gate[i] = Bench.cpuNanos() - t0;
        }
        return String.format("parse min %.0f ms median %.0f ms; gate min %.0f ms median %.0f ms;"
                        + " gate speed / parse speed: min-based %.2f, median-based %.2f (%.1f MB, %,d rows)",
                Bench.ms(Bench.min(parse)), Bench.ms(Bench.median(parse)), Bench.ms(Bench.min(gate)),
                Bench.ms(Bench.median(gate)), (double) Bench.min(parse) / Bench.min(gate),
                (double) Bench.median(parse) / Bench.median(gate), Files.size(table) / 1e6, (long) forms * rows);
    }

    /** Writes (once) forms.csv and coefficients.csv under work/gate-&lt;forms&gt;x&lt;rows&gt;. */
    static Path dataset(Path work, int forms, int rows) throws IOException {
        Path dir = work.resolve("gate-" + forms + "x" + rows);
        Path table = dir.resolve("coefficients.csv");
        if (Files.exists(table)) {
            return dir;
        }
        Files.createDirectories(dir);
        int[] a = Level32Form.coefficients(rows);
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("forms.csv"), StandardCharsets.UTF_8)) {
            w.write("id,level,weight\n");
            for (int i = 0; i < forms; i++) {
                w.write("cm" + i + ",32,2\n");
            }
        }
        Path tmp = dir.resolve("coefficients.tmp");
        try (BufferedWriter w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
            w.write("form,n,value\n");
            for (int i = 0; i < forms; i++) {
                String id = "cm" + i + ",";
                for (int n = 1; n <= rows; n++) {
                    w.write(id);
                    w.write(Integer.toString(n));
                    w.write(',');
                    w.write(Integer.toString(a[n]));
                    w.write('\n');
                }
            }
        }
        Files.move(tmp, table);
        return dir;
    }

    /** commons-csv with a header, touching the three cells of every record and nothing else. */
    static long parse(Path table) throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        long sink = 0;
        try (BufferedReader in = Files.newBufferedReader(table, StandardCharsets.UTF_8);
             CSVParser p = CSVParser.builder().setReader(in).setFormat(format).get()) {
            for (CSVRecord r : p) {
                sink += r.get(0).length() + r.get(1).length() + r.get(2).length();
            }
        }
        return sink;
    }

    /** Runs the gate once; real data must pass (exit status 3 from the heap row's child otherwise). */
    static void gateOnce(Path dir) {
        Report r = new Gate(Settings.defaults()).run(List.of(new Gate.Dataset(dir, "bench")));
        if (r.failed()) {
            throw new IllegalStateException("real data failed: " + r.findings().get(0).line());
        }
    }

    @Override
    public String toString() {
        return name + Arrays.toString(new int[] {forms, rows});
    }
}
