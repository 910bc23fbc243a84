package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Automorphisms from PARI/GP 2.15.2: {@code nfgaloisconj(x^3-3*x-1)} = [x, -x^2 + 2, x^2 - x - 2] (a cyclic cubic);
 * {@code lift(subst(x^2+x, x, Mod(-x^2+2, x^3-3*x-1)))} = -2*x^2 + x + 6; {@code nfgaloisconj(x^2-x-1)} = [-x + 1, x].
 */
class ConjugationTest {

    private static NumberField field(String f) {
        return NumberField.of(QPoly.parse(f));
    }

    @Test
    void theAutomorphismOfACyclicCubicIsRecovered() {
        NumberField k = field("x^3 - 3*x - 1");
        NumberField.Element e = k.element(QPoly.parse("x^2 + x"));
        NumberField.Element image = k.element(QPoly.parse("-2*x^2 + x + 6"));
        assertEquals(k.element(QPoly.parse("-x^2 + 2")), Conjugation.automorphismImageOfX(e, image));
    }

    @Test
    void theQuadraticConjugationIsRecovered() {
        NumberField k = field("x^2 - x - 1");
        assertEquals(k.element(QPoly.parse("-x + 1")), Conjugation.automorphismImageOfX(
                k.element(QPoly.parse("-2*x")), k.element(QPoly.parse("2*x - 2"))));
    }

    @Test
    void nonConjugatesAndNonGeneratorsGiveNothing() {
        NumberField k = field("x^2 - x - 1");
        assertNull(Conjugation.automorphismImageOfX(k.element(QPoly.parse("x")), k.element(QPoly.parse("x + 1"))));
        assertNull(Conjugation.automorphismImageOfX(k.element(QPoly.parse("3")), k.element(QPoly.parse("3"))));
        // in Q(2^(1/4)) = Q[x]/(x^4 - 2), x^2 and -x^2 share the charpoly (t^2 - 2)^2 but x^2 does not generate K
        NumberField q = field("x^4 - 2");
        assertNull(Conjugation.automorphismImageOfX(q.element(QPoly.parse("x^2")), q.element(QPoly.parse("-x^2"))));
        assertEquals(true, Conjugation.sameCharPoly(q.element(QPoly.parse("x^2")), q.element(QPoly.parse("-x^2"))));
    }

    @Test
    void linearSystemsHaveAUniqueSolutionOrNone() {
        Rational one = Rational.ONE;
        Rational two = Rational.of(2);
        // x + y = 3, x - y = 1, 2x = 4: consistent, x = 2, y = 1
        assertEquals(List.of(two, one), LinearSystem.solveUnique(List.of(List.of(one, one), List.of(one,
                one.negate()), List.of(two, Rational.ZERO)), List.of(Rational.of(3), one, Rational.of(4))));
        // x + y = 3, 2x + 2y = 5: inconsistent
        assertNull(LinearSystem.solveUnique(List.of(List.of(one, one), List.of(two, two)), List.of(Rational.of(3),
                Rational.of(5))));
        // one equation, two unknowns: not unique
        assertNull(LinearSystem.solveUnique(List.of(List.of(one, one)), List.of(Rational.of(3))));
    }
}
