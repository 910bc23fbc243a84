package io.github.eigengate.theory.spaces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Against PARI/GP 2.15.2 (commands in spaces/new-traces.gp): Tr(T_n | S_k^new(Γ0(N))) for every n ≤ 60, also n not
 * coprime to N, is {@code mfcoefs(mftraceform([N,k],0), 60)[n+1]} for 24 spaces, most of non-squarefree level
 * (spaces/new-traces.csv); Σ_f w_q(f) over the newforms for q ‖ N is the sum of {@code mfatkineigenvalues}
 * (spaces/atkin-lehner.csv).
 */
class NewSpaceTracesTest {

    private static final HurwitzClassNumbers TABLE = HurwitzClassNumbers.upTo(4 * 60 + 4);

    @Test
    void newTracesAtEveryIndexMatchGp() {
        List<String[]> rows = Fixtures.rows("new-traces.csv");
        int compared = 0;
        int notCoprime = 0;
        java.util.Set<String> spaces = new java.util.HashSet<>();
        for (String[] r : rows) {
            if (!r[0].matches("\\d+")) {
                continue;
            }
            int level = Integer.parseInt(r[0]);
            int weight = Integer.parseInt(r[1]);
            long n = Long.parseLong(r[2]);
            BigInteger expected = new BigInteger(r[3]);
            assertEquals(expected, NewSpaceTraces.of(weight, TABLE).newTrace(level, n),
                    "Tr T_" + n + " on S_" + weight + "^new(" + level + ")");
            compared++;
            if (io.github.eigengate.theory.Arith.gcd(n, level) > 1) {
                notCoprime++;
            }
            spaces.add(level + "/" + weight);
        }
        assertEquals(24, spaces.size());
        assertEquals(24 * 60, compared);
        assertEquals(true, notCoprime > 500, "many n share a prime with the level: " + notCoprime);
    }

    @Test
    void atkinLehnerTracesForExactDivisorsMatchGp() {
        int compared = 0;
        for (String[] r : Fixtures.rows("atkin-lehner.csv")) {
            if (!r[0].matches("\\d+")) {
                continue;
            }
            int level = Integer.parseInt(r[0]);
            int weight = Integer.parseInt(r[1]);
            int q = Integer.parseInt(r[2]);
            if ((level / q) % q == 0) {
                continue; // q^2 | N: a_q = 0 carries no sign, not computed here
            }
            assertEquals(new BigInteger(r[4]), NewSpaceTraces.of(weight, TABLE).atkinLehnerTrace(level, q),
                    "Tr W_" + q + " on S_" + weight + "^new(" + level + ")");
            compared++;
        }
        assertEquals(19, compared);
    }
}
