package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The zeta cell: Φ_m against PARI/GP's polcyclo, and the verdicts on real roots of unity. */
class ZetaCellTest {

    @Test
    void cyclotomicPolynomialsAgreeWithPari() throws IOException {
        int seen = 0;
        try (InputStream in = getClass().getClassLoader().getResourceAsStream("arith/cyclotomic.txt")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] mf = line.split("\\|");
                assertEquals(QPoly.parse(mf[1]), ZetaCell.cyclotomic(Integer.parseInt(mf[0])), line);
                seen++;
            }
        }
        assertEquals(11, seen);
    }

    /** Q(ζ12) = Q[x]/(x^4 − x^2 + 1) (PARI polcyclo(12)): x is a primitive 12th root, x^2 = ζ6 has Φ_12(ζ6) = ζ3^2 - ζ3 + 1 = -2ζ3 = -2x^2 + 2 (ζ3 = x^4 = x^2 - 1). */
    @Test
    void primitiveRootsPassAndOthersSayWhy() {
        NumberField k = NumberField.of(QPoly.parse("x^4 - x^2 + 1"));
        DirichletCharacter chi = CharacterCell.parse("2:1/12", 13).character();
        ZetaCell.Parsed good = ZetaCell.parse("x", chi, k, true);
        assertTrue(good.ok());
        assertEquals(k.generator(), good.zeta());
        ZetaCell.Parsed small = ZetaCell.parse("x^2", chi, k, true);
        assertEquals("Φ_12(zeta) = -2*x^2 + 2 ≠ 0: zeta is not a root of unity of order 12 (it is a root of unity of smaller "
                + "order)", small.problem());
        ZetaCell.Parsed quad = ZetaCell.parse("", CharacterCell.parse("2:1/2", 13).character(), k, false);
        assertTrue(quad.ok());
        assertNull(quad.zeta());
    }
}
