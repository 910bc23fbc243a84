package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The {@code zeta} cell of {@code forms.csv}: for a character χ of order m &gt; 2, an element ζ of the coefficient
 * field K (the a_n grammar) with Φ_m(ζ) = 0, i.e. a primitive m-th root of unity; it fixes the embedding
 * Q(χ) → K by χ(g) = ζ^(a·m/b) for a cell pair g:a/b. Empty (or the column absent) for m ≤ 2.
 */
final class ZetaCell {

    private static final Map<Integer, QPoly> CYCLOTOMIC = new ConcurrentHashMap<>();

    private ZetaCell() {
    }

    /** A parsed cell: ζ (null for m ≤ 2), or what was expected and why the cell is wrong. */
    record Parsed(NumberField.Element zeta, String expected, String problem) {
        boolean ok() {
            return problem == null;
        }
    }

    static Parsed parse(String text, DirichletCharacter chi, NumberField field, boolean column) {
        int m = chi.order();
        String root = "a root of unity of order " + m + " in the coefficient field (Φ_" + m + "(zeta) = 0)";
        if (m <= 2) {
            if (text.isEmpty()) {
                return new Parsed(null, null, null);
            }
            return new Parsed(null, "an empty cell (χ has order " + m + ", its values are ±1)", "zeta is given only"
                    + " for a character of order m > 2, where it fixes how Q(χ) lies in the coefficient field");
        }
        if (field == null) {
            return new Parsed(null, "a field containing Q(χ) = Q(ζ_" + m + ")", "the coefficients are rational (no"
                    + " field), but Q has no root of unity of order " + m + ": χ of order " + m
                    + " needs a coefficient field containing its values, and zeta in it");
        }
        if (field.degree() % chi.orbitSize() != 0) {
            return new Parsed(null, "a field containing Q(χ) = Q(ζ_" + m + ")", "[K : Q] = " + field.degree()
                    + " is not a multiple of [Q(ζ_" + m + ") : Q] = " + chi.orbitSize()
                    + ", so the field cannot contain the values of χ");
        }
        if (text.isEmpty()) {
            return new Parsed(null, root, (column ? "the cell is empty" : "there is no zeta column")
                    + ": a character of order " + m + " > 2 needs zeta, which fixes how Q(χ) lies in the field"
                    + " (χ(g) = zeta^(a·m/b) for g:a/b)");
        }
        Object parsed = CoefficientReader.element(field, text, null);
        if (parsed instanceof String problem) {
            return new Parsed(null, root, problem);
        }
        NumberField.Element z = (NumberField.Element) parsed;
        NumberField.Element value = evaluate(cyclotomic(m), z, field);
        if (!value.isZero()) {
            return new Parsed(null, root, "Φ_" + m + "(zeta) = " + value + " ≠ 0: zeta is not a root of unity of order " + m + (z.pow(m).equals(field.one()) ? " (it is a root of unity of smaller order)"
                    : ""));
        }
        return new Parsed(z, null, null);
    }

    /** Φ_m = ∏_{d | m} (x^d − 1)^{μ(m/d)} (Lang, <i>Algebra</i>, VI §3), as exact polynomial division. */
    static QPoly cyclotomic(int m) {
        return CYCLOTOMIC.computeIfAbsent(m, ZetaCell::computeCyclotomic);
    }

    private static QPoly computeCyclotomic(int m) {
        QPoly num = QPoly.ONE;
        QPoly den = QPoly.ONE;
        for (int d = 1; d <= m; d++) {
            if (m % d != 0) {
                continue;
            }
            int mu = moebius(m / d);
            QPoly f = QPoly.monomial(Rational.ONE, d).subtract(QPoly.ONE);
            if (mu == 1) {
                num = num.multiply(f);
            } else if (mu == -1) {
                den = den.multiply(f);
            }
        }
        return num.divRem(den)[0];
    }

    private static int moebius(int n) {
        int mu = 1;
        for (int p = 2; (long) p * p <= n; p++) {
            if (n % p == 0) {
                n /= p;
                if (n % p == 0) {
                    return 0;
                }
                mu = -mu;
            }
        }
        return n > 1 ? -mu : mu;
    }

    /** f(z) by Horner's rule in K. */
    private static NumberField.Element evaluate(QPoly f, NumberField.Element z, NumberField field) {
        List<Rational> c = new ArrayList<>(f.coefficients());
        NumberField.Element v = field.zero();
        for (int i = c.size() - 1; i >= 0; i--) {
            v = v.multiply(z).add(field.fromRational(c.get(i)));
        }
        return v;
    }
}
