package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;

import io.github.eigengate.arith.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * The compact storage gives back what was put: every value, index and row, whatever the layout (dense 1..N, sparse,
 * out of order, interleaved files and comment lines, values beyond int and beyond long, non-integer values). The
 * reference is a plain sorted map of what was put.
 */
class CoefficientsTest {

    @Test
    void denseRowsKeepValuesAndDerivedLines() {
        Coefficients.Builder<Rational> b = new Coefficients.Builder<>();
        for (int n = 1; n <= 1000; n++) {
            b.putInteger(n, n * 7L - 3000, "c.csv", n + 1); // one run: lines 2..1001
        }
        Coefficients<Rational> c = b.build();
        assertEquals(1000, c.size());
        assertEquals(1000, c.maxIndex());
        assertEquals(Rational.of(500), c.get(500));
        assertEquals(SourceLocation.row("c.csv", 501), c.at(500));
        assertNull(c.get(0));
        assertNull(c.get(1001));
        assertFalse(c.has(1001));
        assertEquals(1000, c.indices()[999]);
    }

    @Test
    void everyLayoutAgreesWithAPlainMap() {
        Random rnd = new Random(13);
        for (int trial = 0; trial < 200; trial++) {
            int count = rnd.nextInt(300);
            List<Integer> ns = new ArrayList<>();
            int next = 1;
            for (int i = 0; i < count; i++) {
                next += trial % 3 == 0 ? 1 : 1 + rnd.nextInt(trial % 3 == 1 ? 3 : 5000);
                ns.add(next - 1);
            }
            if (trial % 4 == 3) {
                Collections.shuffle(ns, rnd);
            }
            TreeMap<Integer, Object[]> expected = new TreeMap<>(); // n -> {value, location}
            Coefficients.Builder<Rational> b = new Coefficients.Builder<>();
            int line = 2;
            String file = "a.csv";
            for (int n : ns) {
                if (rnd.nextInt(20) == 0) {
                    line += 1 + rnd.nextInt(3); // comment lines between rows
                }
                if (rnd.nextInt(50) == 0) {
                    file = file.equals("a.csv") ? "b.csv" : "a.csv";
                }
                Rational v = switch (trial % 5) {
                    case 0, 1 -> Rational.of(rnd.nextInt(4001) - 2000);
                    case 2 -> rnd.nextInt(10) == 0 ? Rational.of(rnd.nextLong()) : Rational.of(rnd.nextInt());
                    case 3 -> rnd.nextInt(10) == 0 ? Rational.of(BigInteger.ONE.shiftLeft(70 + rnd.nextInt(9)))
                            : Rational.of(rnd.nextInt(9));
                    default -> rnd.nextInt(10) == 0 ? Rational.of(BigInteger.ONE, BigInteger.valueOf(3))
                            : Rational.of(rnd.nextInt(9));
                };
                if (rnd.nextBoolean()) {
                    b.put(n, v, file, line);
                } else if (v.isInteger() && v.num().bitLength() < 64) {
                    b.putInteger(n, v.num().longValue(), file, line);
                } else {
                    b.put(n, v, file, line);
                }
                expected.put(n, new Object[] {v, SourceLocation.row(file, line)});
                assertEquals(v, b.get(n));
                assertEquals(SourceLocation.row(file, line), b.at(n));
                line++;
            }
            Coefficients<Rational> c = b.build();
            assertEquals(expected.size(), c.size());
            assertEquals(expected.isEmpty() ? 0 : expected.lastKey(), c.maxIndex());
            assertArrayEquals(expected.keySet().stream().mapToInt(Integer::intValue).toArray(), c.indices());
            for (var e : expected.entrySet()) {
                assertEquals(e.getValue()[0], c.get(e.getKey()), "trial " + trial + " n=" + e.getKey());
                assertEquals(e.getValue()[1], c.at(e.getKey()), "trial " + trial + " n=" + e.getKey());
            }
            for (int probe = 0; probe < 50; probe++) {
                int n = rnd.nextInt(next + 10) - 5;
                assertEquals(expected.containsKey(n), c.has(n));
            }
        }
    }
}
