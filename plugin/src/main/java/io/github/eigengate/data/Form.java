package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.Field;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rationals;

/**
 * One newform (orbit) declared in {@code forms.csv}: level N, weight k, character χ mod N, and the field its
 * coefficients a_n lie in.
 *
 * @param field     the coefficient field Q[x]/(f), or {@code null} when the coefficients are rational
 * @param character the nebentypus χ; its values lie in the coefficient field through the form's {@code zeta}
 *                  (see {@link FormData#chi})
 * @param zeta      the primitive m-th root of unity of the field with χ(g) = zeta^e, for a character of order
 *                  m &gt; 2 (verified by the reader: Φ_m(zeta) = 0); {@code null} when m ≤ 2
 */
public record Form(String id, int level, int weight, NumberField field, SourceLocation location,
                   DirichletCharacter character, NumberField.Element zeta) {

    /** A form with the trivial character. */
    public Form(String id, int level, int weight, NumberField field, SourceLocation location) {
        this(id, level, weight, field, location, DirichletCharacter.trivial(level));
    }

    /** A form whose character has order at most 2 (no root of unity needed). */
    public Form(String id, int level, int weight, NumberField field, SourceLocation location,
                DirichletCharacter character) {
        this(id, level, weight, field, location, character, null);
    }

    public boolean rational() {
        return field == null;
    }

    /** [K_f : Q]. */
    public int degree() {
        return field == null ? 1 : field.degree();
    }

    /** The defining polynomial, {@code x} for Q. */
    public QPoly fieldPolynomial() {
        return field == null ? QPoly.x() : field.polynomial();
    }

    public Field<?> coefficientField() {
        return field == null ? Rationals.FIELD : field;
    }

    /** The space this form belongs to, as reports write it. */
    public SpaceKey space() {
        return new SpaceKey(level, weight);
    }
}
