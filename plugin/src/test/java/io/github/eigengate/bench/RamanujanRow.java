package io.github.eigengate.bench;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.RealRoots;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPInputStream;

/**
 * Ramanujan–Petersson on one Hecke orbit: for every a_p of the data file (bench/data/&lt;orbit&gt;.csv.gz, written by
 * bench/gp/orbits.gp), the characteristic polynomial χ of a_p and the exact decision "every root α of χ is real with
 * α² ≤ 4p^(k−1)" — the work of the ramanujan-bound check. PARI/GP side: bench/gp/ramanujan.gp, {@code charpoly(Mod(a,
 * f))} and {@code polsturm} of the root-squared χ(x)χ(−x) on [0, 4p^(k−1)]. Checksum: the number of a_p within the
 * bound and Σ χ(1) mod 10^9 + 7.
 */
final class RamanujanRow implements Bench.Row {

    private static final BigInteger M = BigInteger.valueOf(1_000_000_007L);

    private final String name;
    private final String orbit;
    private final int weight;

    RamanujanRow(String name, String orbit, int weight) {
        this.name = name;
        this.orbit = orbit;
        this.weight = weight;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String title() {
        return "Ramanujan–Petersson (charpoly + real-root decision) on every a_p of " + orbit + " (k = " + weight + ")";
    }

    @Override
    public int warmUp() {
        return weight > 2 ? 1 : 3;
    }

    @Override
    public Bench.Task prepare(Path work) throws IOException {
        List<String[]> rows = read(Bench.root().resolve("bench/data/" + orbit + ".csv.gz"));
        NumberField k = NumberField.of(QPoly.parse(rows.get(0)[1]));
        List<Integer> primes = new ArrayList<>();
        List<QPoly> values = new ArrayList<>();
        for (String[] r : rows.subList(1, rows.size())) {
            primes.add(Integer.parseInt(r[0]));
            values.add(QPoly.parse(r[1]));
        }
        return () -> {
            List<NumberField.Element> fresh = new ArrayList<>(); // no cached characteristic polynomial
            for (QPoly v : values) {
                fresh.add(k.element(v));
            }
            int within = 0;
            BigInteger sum = BigInteger.ZERO;
            for (int i = 0; i < fresh.size(); i++) {
                QPoly chi = fresh.get(i).charPoly();
                BigInteger bound = BigInteger.valueOf(primes.get(i)).pow(weight - 1).shiftLeft(2);
                if (RealRoots.allRootsRealWithSquareAtMost(chi, Rational.of(bound))) {
                    within++;
                }
                sum = sum.add(chi.evaluate(Rational.ONE).num());
            }
            return within + " " + sum.mod(M);
        };
    }

    @Override
    public List<String> gp(Path work) {
        return List.of("bench/gp/ramanujan.gp", "data=\"" + unpacked(work) + "\"", "k=" + weight);
    }

    /** gp reads plain text: the data file unpacked under the work directory. */
    private Path unpacked(Path work) {
        Path out = work.resolve(orbit + ".csv").toAbsolutePath();
        try (GZIPInputStream in = new GZIPInputStream(Files.newInputStream(
                Bench.root().resolve("bench/data/" + orbit + ".csv.gz")))) {
            Files.write(out, in.readAllBytes());
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out;
    }

    /** The data rows (comments and the header skipped): first {@code field,<f>}, then {@code p,<a_p>}. */
    static List<String[]> read(Path file) throws IOException {
        List<String[]> rows = new ArrayList<>();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(
                new GZIPInputStream(Files.newInputStream(file)), StandardCharsets.UTF_8))) {
            String line;
            while ((line = in.readLine()) != null) {
                if (line.isEmpty() || line.startsWith("#") || line.equals("p,value")) {
                    continue;
                }
                int c = line.indexOf(',');
                rows.add(new String[] {line.substring(0, c), line.substring(c + 1)});
            }
        }
        return rows;
    }
}
