package io.github.eigengate.check.weights;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The dataset datasets/modp (fixtures-gp/modp.gp, PARI/GP 2.15.2): level-1 forms of weights 12 … 24, weight-2 forms,
 * and companion pairs with coefficient fields of degree 5, with facts.csv saying at every prime above 5 ≤ p ≤ 97
 * (weight ≤ p + 1, p ∤ N) whether a_p ≡ 0, and companions.csv listing five companion pairs found in gp.
 *
 * <p>The weights a row must declare, by the published recipes (from memory where marked in WeightChecksTest):
 * supersingular, k ≤ p: k(ρ̄) = k, W = {Sym^{k−2}, Sym^{p+1−k} ⊗ det^{k−2}}; supersingular, k = p + 1: k(ρ̄) = 2,
 * W = {Sym^0, Sym^{p−1}} (Fontaine; Serre 1987 §2; BDJ 2010 §3). Ordinary with nothing declared is non-split
 * (k ≤ p): k(ρ̄) = k and W = {Sym^{k−2}}, plus Sym^{p−1} for k = 2 (peu ramifié); très ramifié for k = p + 1:
 * k(ρ̄) = p + 1, W = {Sym^{p−1}} (Deligne; Serre 1987 §2; BDJ 2010 §3). Ordinary with a companion: split, W adds
 * Sym^{p−1−k} ⊗ det^{k−1}, and for weight p − 1 also Sym^{p−1} ⊗ det^{p−2} (r = 0 and r = p − 1 both occur for a
 * split shape; BDJ 2010 §3 — from memory).
 */
class ModpDatasetTest {

    @TempDir
    Path dir;

    static Map<String, Integer> weights() {
        Map<String, Integer> k = new HashMap<>();
        for (String line : Fixture.of("datasets/modp/forms.csv").text().split("\n")) {
            if (!line.isEmpty() && !line.startsWith("#") && !line.startsWith("id,")) {
                String[] c = line.split(",", -1);
                k.put(c[0], Integer.parseInt(c[2]));
            }
        }
        return k;
    }

    static String w(int... rs) {
        StringBuilder b = new StringBuilder("\"");
        for (int i = 0; i < rs.length; i += 2) {
            b.append(i == 0 ? "" : ";").append('(').append(rs[i]).append(',').append(rs[i + 1]).append(')');
        }
        return b.append('"').toString();
    }

    Report run(String name, String weightsCsv, String congruencesCsv) {
        Path dir = this.dir.resolve(name);
        Datasets.write(dir, "forms.csv", Fixture.of("datasets/modp/forms.csv").text(), "coefficients.csv",
                Fixture.of("datasets/modp/coefficients.csv").text(), "modp-weights.csv", weightsCsv);
        if (congruencesCsv != null) {
            Datasets.write(dir, "congruences.csv", congruencesCsv);
        }
        return new Gate(Settings.defaults(), WeightChecks.all(Set.of())).run(List.of(new Gate.Dataset(dir, "data")));
    }

    @Test
    void everyFactGivesTheRecipesWeightsAndOrdinaryRowsAreNoted() {
        Map<String, Integer> weight = weights();
        StringBuilder table = new StringBuilder("form,p,prime,serre_weight,weights\n");
        Set<String> ordinary = new TreeSet<>();
        int rows = 0;
        for (String line : Fixture.of("datasets/modp/facts.csv").text().split("\n")) {
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("form,")) {
                continue;
            }
            String[] c = line.split(",", -1);
            int p = Integer.parseInt(c[1]);
            boolean supersingular = c[2].equals("true");
            String prime = c[3];
            int k = weight.get(c[0]);
            int serre;
            String set;
            if (supersingular) {
                serre = k == p + 1 ? 2 : k;
                set = k == p + 1 ? w(0, 0, p - 1, 0) : w(k - 2, 0, p + 1 - k, k - 2);
            } else {
                serre = k;
                set = k == 2 ? w(0, 0, p - 1, 0) : k == p + 1 ? w(p - 1, 0) : w(k - 2, 0);
                ordinary.add(c[0] + " p=" + p + (prime.isEmpty() ? "" : " prime=" + prime));
            }
            table.append(c[0]).append(',').append(p).append(',').append(prime).append(',').append(serre).append(',')
                    .append(set).append('\n');
            rows++;
        }
        table.append("lev57_wt10_o1,43,,,\n");
        Report r = run("facts", table.toString(), null);
        Set<String> noted = new TreeSet<>();
        List<String> other = new ArrayList<>();
        for (Finding f : r.findings()) {
            if (f.severity() == Severity.NOTE && f.check().equals(WeightOfFormCheck.ID)) {
                noted.add(f.subject().name() + " " + f.subject().detail());
            } else {
                other.add(f.line());
            }
        }
        assertEquals(478, rows);
        assertEquals(ordinary, noted);
        assertEquals(1, other.size(), String.join("\n", other));
        assertEquals("data/modp-weights.csv:480:3: error [table-format] form=lev57_wt10_o1 p=43: expected a prime above "
                + "43 named by a factor of x^5 + 15*x^4 - 1560*x^3 - 21336*x^2 + 422496*x + 4243968 mod 43, found an "
                + "empty cell; 43 divides the index of Z[x] in the ring of integers of Q[x]/(x^5 + 15*x^4 - 1560*x^3 "
                + "- 21336*x^2 + 422496*x + 4243968) (Dedekind's criterion), so the primes above 43 cannot be named by "
                + "the factors of the defining polynomial modulo 43", other.get(0));
    }

    @Test
    void companionPairsAreSplitOnBothSides() {
        // companions.csv: (form of weight p − 1, weight-2 form, p, twist p − 2, prime of the first): five pairs, p = 5 to 13
        String congruences = Fixture.of("datasets/modp/companions.csv").text();
        StringBuilder table = new StringBuilder("form,p,prime,serre_weight,weights\n");
        for (String line : congruences.split("\n")) {
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("form,")) {
                continue;
            }
            String[] c = line.split(",", -1);
            int p = Integer.parseInt(c[2]);
            table.append(c[0]).append(',').append(p).append(',').append(c[4]).append(',').append(p - 1).append(',')
                    .append(w(p - 3, 0, 0, p - 2, p - 1, p - 2)).append('\n');
            table.append(c[1]).append(',').append(p).append(",,2,").append(w(0, 0, p - 1, 0, p - 3, 1)).append('\n');
        }
        assertEquals(List.of(), Datasets.lines(run("with", table.toString(), congruences)));
        // without the congruences both sides fall back to non-split: the companion weights are extra
        List<String> lines = Datasets.lines(run("without", table.toString(), null));
        assertEquals(20, lines.size(), String.join("\n", lines));
        assertEquals(10, lines.stream().filter(l -> l.contains("error [weight-set]")).count());
        assertEquals("data/modp-weights.csv:3:5: error [weight-set] form=lev51_wt2_o1 p=7: expected (0,0);(6,0), found "
                + "(0,0);(4,1);(6,0); extra (4,1); W(ρ̄) for ρ̄|I_7 ≅ (ω^1 * ; 0 ω^0) non-split, peu ramifié [a_7 ≡ "
                + "3 mod 7: ordinary (Deligne), non-split assumed] (Buzzard–Diamond–Jarvis 2010, §3)",
                lines.stream().filter(l -> l.contains("form=lev51_wt2_o1") && l.contains("weight-set")).findFirst()
                        .orElseThrow());
    }
}
