package io.github.eigengate.data;

import io.github.eigengate.arith.Field;

/**
 * A form together with all of its coefficients in the tables.
 *
 * @param field the coefficient field, in which every a_n lives
 */
public record FormData<E>(Form form, Field<E> field, Coefficients<E> coefficients) {
}
