package io.github.eigengate.theory.curves;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * #E(Q)_tors against PARI/GP's {@code elltors} on one curve of each of the fifteen groups of Mazur's list (orders
 * 1–10 and 12 cyclic; Z/2 × Z/2n of orders 4, 8, 12, 16), minimal and scaled by u = 6 (curves/torsion.csv).
 */
class TorsionTest {

    @Test
    void everyGroupOfMazursList() {
        List<Map<String, String>> rows = CurveFixtures.rows("torsion.csv");
        assertEquals(30, rows.size());
        List<String> wrong = new ArrayList<>();
        for (Map<String, String> r : rows) {
            int ours = Torsion.order(CurveFixtures.model(r.get("curve")));
            if (ours != Integer.parseInt(r.get("torsion"))) {
                wrong.add(r.get("curve") + " " + r.get("structure") + ": PARI " + r.get("torsion") + ", ours " + ours);
            }
        }
        assertEquals(List.of(), wrong);
    }
}
