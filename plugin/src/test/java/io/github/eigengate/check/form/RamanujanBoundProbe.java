package io.github.eigengate.check.form;

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
}
