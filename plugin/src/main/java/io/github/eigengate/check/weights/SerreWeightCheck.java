package io.github.eigengate.check.weights;

import io.github.eigengate.check.FindingSink;
import io.github.eigengate.theory.serre.SerreWeights;

/**
 * The declared {@code serre_weight} equals Serre's weight k(ρ̄) recomputed from ρ̄|I_p (Serre, Duke Math. J. 54
 * (1987), §2; normalised to 2 ≤ k(ρ̄) ≤ p² − 1, see {@link SerreWeights#serreK}).
 */
public final class SerreWeightCheck extends WeightCheck {

    public static final String ID = "serre-weight";

    SerreWeightCheck(boolean owner) {
        super(owner);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the declared serre_weight is Serre's k(ρ̄) of the local shape at p (Serre 1987, §2)";
    }

    @Override
    void check(Analysis.Result result, FindingSink out) {
        for (Analysis.Resolved r : result.resolved()) {
            Integer declared = r.row().serreWeight();
            if (declared == null) {
                continue;
            }
            out.examined(ID, r.row().subject());
            int k = SerreWeights.serreK(r.shape());
            if (k != declared) {
                int p = r.row().p();
                out.error(ID, r.row().source().at("serre_weight"), r.row().subject(), Integer.toString(k),
                        declared.toString(), "Serre's weight of ρ̄ with ρ̄|I_" + p + " ≅ "
                                + Shapes.describe(r.shape()) + " [" + r.how() + "] (Serre 1987, §2)");
            }
        }
    }
}
