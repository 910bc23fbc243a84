package io.github.eigengate.check.form;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.check.Values;
import java.math.BigInteger;

/** Test-scope access to the exact bound decision, for the benchmark. */
public final class RamanujanBoundProbe {

    private RamanujanBoundProbe() {
    }

    /** Whether every embedding of a_p satisfies |a_p| ≤ 2 p^{(k−1)/2}. */
    public static boolean holds(Object ap, int p, int k) {
        return RamanujanBound.withinBound(Values.charPoly(ap), BigInteger.valueOf(p).pow(k - 1).shiftLeft(2));
    }

    /** The test with a character: every conjugate of χ̄(p)a_p² real in [0, 4p^{k−1}], from χ̄(p) and a_p. */
    public static boolean holdsWithCharacter(NumberField.Element ap, NumberField.Element chiBarP, int p, int k) {
        NumberField.Element b = chiBarP.multiply(ap.multiply(ap));
        return RamanujanBound.withinBoundWithCharacter(Values.charPoly(b),
                BigInteger.valueOf(p).pow(k - 1).shiftLeft(2));
    }
}
