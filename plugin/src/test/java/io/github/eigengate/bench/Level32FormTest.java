package io.github.eigengate.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.engine.Fixture;
import org.junit.jupiter.api.Test;

/** The benchmark's generated level-32 coefficients against PARI/GP (bench/level32.csv, command in its header). */
class Level32FormTest {

    @Test
    void agreesWithPariEllan() {
        int[] a = Level32Form.coefficients(2000);
        Fixture gp = Fixture.of("bench/level32.csv");
        int n = 0;
        for (String line : gp.text().split("\n")) {
            if (line.isEmpty() || line.startsWith("#") || line.startsWith("n,")) {
                continue;
            }
            String[] c = line.split(",");
            assertEquals(Integer.parseInt(c[1]), a[Integer.parseInt(c[0])], "a_" + c[0]);
            n++;
        }
        assertEquals(2000, n);
    }
}
