package io.github.eigengate.check.weights;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.SerreWeights;
import io.github.eigengate.theory.serre.Weight;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Rows that give ρ̄ at p directly (no form), random shapes for 5 ≤ p ≤ 31 with a fixed seed: a table that declares
 * what {@code theory.serre} computes passes (that package is tested against Serre 1987 and BDJ 2010 itself), and one
 * planted change per row — k(ρ̄) + 1, a weight dropped, a weight twisted — gives exactly one error on that row.
 */
class DirectRowsPropertyTest {

    static final int[] PRIMES = {5, 7, 11, 13, 17, 19, 23, 29, 31};

    @TempDir
    Path dir;

    static LocalShape randomShape(Random rnd) {
        int p = PRIMES[rnd.nextInt(PRIMES.length)];
        switch (rnd.nextInt(4)) {
            case 0: {
                int n;
                do {
                    n = rnd.nextInt(p * p - 1);
                } while (n % (p + 1) == 0);
                return LocalShape.irreducible(p, n);
            }
            case 1:
                return LocalShape.reducible(p, LocalShape.Kind.SPLIT, rnd.nextInt(p - 1), rnd.nextInt(p - 1));
            case 2:
                return LocalShape.reducible(p, LocalShape.Kind.NONSPLIT, rnd.nextInt(p - 1), rnd.nextInt(p - 1));
            default: {
                int b = rnd.nextInt(p - 1);
                return LocalShape.reducible(p, LocalShape.Kind.TRES, b + 1, b);
            }
        }
    }

    static String row(LocalShape s, int k, Set<Weight> w) {
        return "," + s.p() + ",,," + k + ",\"" + Weight.formatSet(w) + "\"," + s.kind().word() + "," + s.exponents();
    }

    @Test
    void correctRowsPassAndEachPlantedChangeIsOneError() {
        Random rnd = new Random(20261202L);
        List<String> good = new ArrayList<>();
        List<String> bad = new ArrayList<>();
        List<String> expectedIds = new ArrayList<>();
        for (int i = 0; i < 120; i++) {
            LocalShape s = randomShape(rnd);
            int p = s.p();
            int k = SerreWeights.serreK(s);
            Set<Weight> w = SerreWeights.bdj(s);
            good.add(row(s, k, w));
            switch (i % 3) {
                case 0:
                    bad.add(row(s, k == p * p - 1 ? k - 1 : k + 1, w));
                    expectedIds.add(SerreWeightCheck.ID);
                    break;
                case 1: {
                    Set<Weight> fewer = new TreeSet<>(w);
                    fewer.remove(fewer.iterator().next());
                    if (fewer.isEmpty()) {
                        fewer.add(w.iterator().next().twist(1, p));
                    }
                    bad.add(row(s, k, fewer));
                    expectedIds.add(WeightSetCheck.ID);
                    break;
                }
                default:
                    bad.add(row(s, k, SerreWeights.twist(w, 1, p)));
                    expectedIds.add(WeightSetCheck.ID);
            }
        }
        assertEquals(List.of(), Scenario.weights(good.toArray(new String[0])).lines(dir));
        List<String> lines = Scenario.weights(bad.toArray(new String[0])).lines(dir.resolve("bad"));
        assertEquals(bad.size(), lines.size(), String.join("\n", lines));
        List<String> found = new ArrayList<>();
        for (int i = 0; i < bad.size(); i++) {
            String prefix = "data/modp-weights.csv:" + (i + 2) + ":";
            String line = lines.stream().filter(l -> l.startsWith(prefix)).findFirst().orElseThrow();
            found.add(line.substring(line.indexOf('[') + 1, line.indexOf(']')));
        }
        assertEquals(expectedIds, found);
    }
}
