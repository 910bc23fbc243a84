package io.github.eigengate.check.weights;

import io.github.eigengate.check.FindingSink;
import io.github.eigengate.theory.serre.SerreWeights;
import io.github.eigengate.theory.serre.Weight;
import java.util.Set;

/**
 * The declared {@code weights} equal the set W(ρ̄) of Buzzard–Diamond–Jarvis recomputed from ρ̄|I_p (Duke Math. J.
 * 155 (2010), §3, for F = Q; see {@link SerreWeights#bdj}). A finding names the missing and the extra weights.
 */
public final class WeightSetCheck extends WeightCheck {

    public static final String ID = "weight-set";

    WeightSetCheck(boolean owner) {
        super(owner);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "the declared weights are W(ρ̄) of Buzzard–Diamond–Jarvis for the local shape at p (BDJ 2010, §3)";
    }

    @Override
    void check(Analysis.Result result, FindingSink out) {
        for (Analysis.Resolved r : result.resolved()) {
            Set<Weight> declared = r.row().weights();
            if (declared == null) {
                continue;
            }
            out.examined(ID, r.row().subject());
            Set<Weight> w = SerreWeights.bdj(r.shape());
            if (!w.equals(declared)) {
                int p = r.row().p();
                out.error(ID, r.row().source().at("weights"), r.row().subject(), Weight.formatSet(w),
                        Weight.formatSet(declared), Shapes.difference(w, declared) + "; W(ρ̄) for ρ̄|I_" + p
                                + " ≅ " + Shapes.describe(r.shape()) + " [" + r.how()
                                + "] (Buzzard–Diamond–Jarvis 2010, §3)");
            }
        }
    }
}
