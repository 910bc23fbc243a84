package io.github.eigengate.arith;

import java.util.ArrayList;
import java.util.List;

/**
 * Whether one element of K = Q[x]/(f) is the image of another under an automorphism of K, and which automorphism.
 *
 * <p>If e generates K and b has the characteristic polynomial of e, then e ↦ b defines an embedding K → K, which
 * is an automorphism σ (K ≅ Q[t]/(minpoly e)); σ is fixed by σ(x) = h(b) for the polynomial h with x = h(e),
 * found by writing x in the basis 1, e, …, e^{d−1} (Cohen, GTM 138, §4.5.4: automorphisms as images of the
 * generator, tested exactly).
 */
public final class Conjugation {

    private Conjugation() {
    }

    /**
     * @return σ(x) for the automorphism σ ≠ 1 of K with σ(expected) = found, when expected generates K; {@code null}
     *     when found is not such an image, or expected does not generate K (then see {@link #sameCharPoly})
     */
    public static NumberField.Element automorphismImageOfX(NumberField.Element expected, NumberField.Element found) {
        NumberField k = expected.field();
        int d = k.degree();
        if (d == 1 || expected.equals(found) || !expected.charPoly().equals(found.charPoly())) {
            return null;
        }
        if (expected.charPoly().squarefreePart().degree() != d) {
            return null;
        }
        // columns e^0 .. e^(d-1); solve Σ h_i e^i = x
        List<NumberField.Element> powers = new ArrayList<>();
        NumberField.Element p = k.one();
        for (int i = 0; i < d; i++) {
            powers.add(p);
            p = p.multiply(expected);
        }
        List<List<Rational>> rows = new ArrayList<>();
        List<Rational> rhs = new ArrayList<>();
        List<Rational> x = k.generator().coordinates();
        for (int r = 0; r < d; r++) {
            List<Rational> row = new ArrayList<>();
            for (int i = 0; i < d; i++) {
                row.add(powers.get(i).coordinates().get(r));
            }
            rows.add(row);
            rhs.add(x.get(r));
        }
        List<Rational> h = LinearSystem.solveUnique(rows, rhs);
        if (h == null) {
            return null;
        }
        NumberField.Element image = k.zero();
        NumberField.Element q = k.one();
        for (int i = 0; i < d; i++) {
            image = image.add(q.scale(h.get(i)));
            q = q.multiply(found);
        }
        return image;
    }

    /** Whether the two elements have the same characteristic polynomial over Q (are conjugate over Q). */
    public static boolean sameCharPoly(NumberField.Element a, NumberField.Element b) {
        return a.charPoly().equals(b.charPoly());
    }
}
