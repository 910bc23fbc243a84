package io.github.eigengate.arith;

/**
 * A field whose elements do their own arithmetic: the {@link Field} operations delegate to them after checking
 * that both operands belong to this field (mixing fields fails with a message naming both).
 *
 * @param <E> the element type
 */
abstract class ElementField<E extends ElementField.Arithmetic<E>> implements Field<E> {

    /** What an element of such a field provides. */
    interface Arithmetic<E> {
        Field<E> field();

        E add(E o);

        E subtract(E o);

        E multiply(E o);

        E negate();

        E inverse();

        boolean isZero();
    }

    final E own(E a) {
        Field<E> f = a.field();
        if (f != this && !f.equals(this)) {
            throw new IllegalArgumentException("element of " + f.name() + " used as an element of " + name());
        }
        return a;
    }

    @Override
    public final E add(E a, E b) {
        return own(a).add(own(b));
    }

    @Override
    public final E subtract(E a, E b) {
        return own(a).subtract(own(b));
    }

    @Override
    public final E multiply(E a, E b) {
        return own(a).multiply(own(b));
    }

    @Override
    public final E negate(E a) {
        return own(a).negate();
    }

    @Override
    public final E inverse(E a) {
        return own(a).inverse();
    }

    @Override
    public final boolean isZero(E a) {
        return own(a).isZero();
    }
}
