package io.github.eigengate.check.weights;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every weight-2 newform of datasets/weight2 (levels 11 … 389, fields up to degree 20) at every prime 5 ≤ p ≤ 47
 * not dividing the level, at every prime above p. Which of these are supersingular was computed independently with
 * PARI/GP from mfinit/nfinit (weights/supersingular-weight2.gp, the command at the top of the CSV); the checks find
 * it from the dataset's coefficients by reducing a_p at the named prime.
 *
 * <p>For weight 2, both cases give k(ρ̄) = 2 and W = {Sym^0, Sym^{p−1}} (supersingular: Fontaine; ordinary and,
 * with no companion declared, non-split and peu ramifié: Serre 1987 §2, BDJ 2010 §3 — from memory), so every row
 * declares those and must pass; the ordinary rows, and only they, carry the note that non-split was assumed.
 */
class Weight2DatasetTest {

    @TempDir
    Path dir;

    @Test
    void supersingularPrimesAgreeWithPariAndEveryRowPasses() {
        StringBuilder weights = new StringBuilder("form,p,prime,serre_weight,weights\n");
        Set<String> ordinary = new TreeSet<>();
        List<String> index = new ArrayList<>();
        int rows = 0;
        for (String line : Fixture.of("weights/supersingular-weight2.csv").text().split("\n")) {
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("form,")) {
                continue;
            }
            String[] c = line.split(",", -1);
            int p = Integer.parseInt(c[1]);
            String prime = c[2].equals("index") ? "" : c[2];
            weights.append(c[0]).append(',').append(p).append(',').append(prime).append(",2,\"(0,0);(")
                    .append(p - 1).append(",0)\"\n");
            rows++;
            if (c[2].equals("index")) {
                index.add(c[0] + " p=" + p);
            } else if (c[3].equals("0")) {
                ordinary.add(c[0] + " p=" + p + (prime.isEmpty() ? "" : " prime=" + prime));
            }
        }
        Datasets.write(dir, "forms.csv", Fixture.of("datasets/weight2/forms.csv").text(), "coefficients.csv",
                Fixture.of("datasets/weight2/coefficients.csv").text(), "modp-weights.csv", weights.toString());
        Report r = new Gate(Settings.defaults(), WeightChecks.all(Set.of())).run(List.of(new Gate.Dataset(dir,
                "data")));
        Set<String> noted = new TreeSet<>();
        List<String> errors = new ArrayList<>();
        for (Finding f : r.findings()) {
            if (f.severity() == Severity.NOTE && f.check().equals(WeightOfFormCheck.ID)) {
                noted.add(f.subject().name() + " " + f.subject().detail());
            } else {
                errors.add(f.line());
            }
        }
        assertEquals(ordinary, noted);
        assertEquals(List.of("lev389_wt2_o5 p=5"), index);
        assertEquals(1, errors.size(), String.join("\n", errors));
        assertTrue(errors.get(0).startsWith("data/modp-weights.csv:"), errors.get(0));
        assertTrue(errors.get(0).contains("error [table-format] form=lev389_wt2_o5 p=5: expected a prime above 5 "
                + "named by a factor of"), errors.get(0));
        assertTrue(errors.get(0).endsWith("5 divides the index of Z[x] in the ring of integers of Q[x]/(x^20 - 3*x^19 "
                + "- 29*x^18 + 91*x^17 + 338*x^16 - 1130*x^15 - 2023*x^14 + 7432*x^13 + 6558*x^12 - 28021*x^11 - "
                + "10909*x^10 + 61267*x^9 + 6954*x^8 - 74752*x^7 + 1407*x^6 + 46330*x^5 - 1087*x^4 - 12558*x^3 - "
                + "942*x^2 + 960*x + 148) (Dedekind's criterion), so the primes above 5 cannot be named by the factors "
                + "of the defining polynomial modulo 5"), errors.get(0));
        assertTrue(ordinary.size() > 300 && rows - ordinary.size() - 1 == 27, ordinary.size() + " of " + rows);
    }
}
