package io.github.eigengate.check.weights;

import io.github.eigengate.check.FindingSink;

/**
 * A row about a form describes that form's ρ̄ at p: a declared {@code local} or {@code shape} agrees with a_p
 * (supersingular ⇔ ρ̄|I_p irreducible, Fontaine; ordinary ⇒ (ω^{k−1} * ; 0 1), Deligne; très ramifié only in
 * weight p + 1), and for level prime to p, W(ρ̄) contains the form's own weight Sym^{k−2} (for k &gt; p + 1 a
 * Jordan–Hölder constituent of Sym^{k−2}, Ash–Stevens). Also notes each assumption made for an ordinary form whose
 * splitting at p the tables do not settle.
 */
public final class WeightOfFormCheck extends WeightCheck {

    public static final String ID = "weight-of-form";

    WeightOfFormCheck(boolean owner) {
        super(owner);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "local and shape agree with a_p (Deligne, Fontaine) and the form's own weight lies in W(ρ̄)";
    }

    @Override
    void check(Analysis.Result result, FindingSink out) {
        for (Analysis.Resolved r : result.resolved()) {
            if (r.row().form() != null) {
                out.examined(ID, r.row().subject());
            }
        }
        result.formFindings().forEach(out::report);
    }
}
