package io.github.eigengate.check.weights;

import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.Weight;
import java.util.Set;
import java.util.TreeSet;

/** Words for findings: a local shape as a representation of inertia, and the difference of two weight sets. */
final class Shapes {

    private Shapes() {
    }

    /**
     * ρ̄|I_p in the notation of Serre 1987, §2: {@code ω₂^n ⊕ ω₂^pn} (exponents reduced mod p² − 1), {@code ω^a ⊕ ω^b},
     * or {@code (ω^a * ; 0 ω^b)} with the sub first, followed by non-split / peu / très ramifié.
     */
    static String describe(LocalShape s) {
        int p = s.p();
        switch (s.kind()) {
            case IRREDUCIBLE:
                return "ω₂^" + s.n() + " ⊕ ω₂^" + (long) s.n() * p % ((long) p * p - 1);
            case SPLIT:
                return "ω^" + s.a() + " ⊕ ω^" + s.b();
            case NONSPLIT:
                return "(ω^" + s.a() + " * ; 0 ω^" + s.b() + ") non-split"
                        + (Math.floorMod(s.a() - s.b(), p - 1) == 1 ? ", peu ramifié" : "");
            case TRES:
                return "(ω^" + s.a() + " * ; 0 ω^" + s.b() + ") très ramifié";
            default:
                throw new AssertionError(s.kind());
        }
    }

    /** {@code missing X; extra Y} for found against expected, each part only when non-empty. */
    static String difference(Set<Weight> expected, Set<Weight> found) {
        Set<Weight> missing = new TreeSet<>(expected);
        missing.removeAll(found);
        Set<Weight> extra = new TreeSet<>(found);
        extra.removeAll(expected);
        StringBuilder b = new StringBuilder();
        if (!missing.isEmpty()) {
            b.append("missing ").append(Weight.formatSet(missing));
        }
        if (!extra.isEmpty()) {
            b.append(b.length() > 0 ? ", " : "").append("extra ").append(Weight.formatSet(extra));
        }
        return b.toString();
    }
}
