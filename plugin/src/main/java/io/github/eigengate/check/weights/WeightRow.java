package io.github.eigengate.check.weights;

import io.github.eigengate.arith.ResidueMap;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.TableRow;
import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.Weight;
import java.util.Set;

/**
 * One well-formed row of {@code modp-weights.csv}.
 *
 * @param source      the row as read
 * @param form        the form whose ρ̄ the row describes, or {@code null} for a row giving ρ̄ at p directly
 * @param p           the prime, 5 ≤ p
 * @param prime       the prime above p for a form with a coefficient field, else {@code null}
 * @param rho         the representation described, {@code null} for a direct row
 * @param local       the declared {@code local} word, or {@code null}
 * @param shape       the declared {@code shape}/{@code exponents}, or {@code null}
 * @param serreWeight the declared k(ρ̄), or {@code null}
 * @param weights     the declared W(ρ̄), or {@code null}
 */
record WeightRow(TableRow source, Form form, int p, ResidueMap prime, Rho rho, LocalShape.Kind local,
                 LocalShape shape, Integer serreWeight, Set<Weight> weights) {

    /** {@code form=f p=7 prime=x + 3} or {@code p=7}, as table-format findings name the row. */
    String label() {
        String s = form == null ? "p=" + p : "form=" + form.id() + " p=" + p;
        return prime == null ? s : s + " prime=" + prime.factor();
    }

    /** The subject of findings about this row: the form, or for a direct row the shape. */
    Subject subject() {
        String detail = prime == null ? "p=" + p : "p=" + p + " prime=" + prime.factor();
        if (form != null) {
            return Subject.form(form.id(), detail);
        }
        return new Subject("weights", shape.kind().word() + " " + shape.exponents(), detail);
    }
}
