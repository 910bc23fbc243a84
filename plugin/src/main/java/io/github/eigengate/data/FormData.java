package io.github.eigengate.data;

import io.github.eigengate.arith.Field;

/**
 * A form together with all of its coefficients in the tables.
 *
 * @param field the coefficient field, in which every a_n lives
 * @param zeta  the primitive m-th root of unity in the field that fixes how Q(χ) embeds (χ(g) = zeta^e), for a
 *              character of order m > 2; {@code null} when m ≤ 2
 */
public record FormData<E>(Form form, Field<E> field, Coefficients<E> coefficients, E zeta) {

    /** A form whose character has order at most 2. */
    public FormData(Form form, Field<E> field, Coefficients<E> coefficients) {
        this(form, field, coefficients, null);
    }

    /** χ(n) as an element of the coefficient field (0 when gcd(n, N) > 1). */
    public E chi(long n) {
        return form.character().value(n, field, zeta);
    }
}
