package io.github.eigengate.check;

import io.github.eigengate.arith.Conjugation;
import io.github.eigengate.arith.NumberField;
import java.util.List;

/** Wording shared by the checks that say what is likely wrong, not only that something is. */
public final class Diagnosis {

    /** Indices listed in a finding before the rest are only counted. */
    public static final int LISTED = 5;

    private Diagnosis() {
    }

    /**
     * "; the value found is σ(e) for the automorphism x ↦ … of K" when found = σ(expected) for an automorphism σ ≠ 1
     * of the coefficient field (see {@link Conjugation}); "; the value found is a conjugate of e over Q (same
     * characteristic polynomial)" when only the characteristic polynomials agree; "" otherwise.
     */
    public static String conjugateNote(Object expected, Object found) {
        if (!(expected instanceof NumberField.Element e) || !(found instanceof NumberField.Element f)
                || e.equals(f) || !e.field().equals(f.field())) {
            return "";
        }
        NumberField.Element image = Conjugation.automorphismImageOfX(e, f);
        if (image != null) {
            return "; the value found is σ(" + e + ") for the automorphism σ: x ↦ " + image + " of K";
        }
        if (Conjugation.sameCharPoly(e, f)) {
            return "; the value found is a conjugate of " + e + " over Q (the same characteristic polynomial)";
        }
        return "";
    }

    /** "2, 3, 5" or "2, 3, 5, 7, 11 and 4 more". */
    public static String list(List<?> items) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < items.size() && i < LISTED; i++) {
            b.append(i == 0 ? "" : ", ").append(items.get(i));
        }
        if (items.size() > LISTED) {
            b.append(" and ").append(items.size() - LISTED).append(" more");
        }
        return b.toString();
    }
}
