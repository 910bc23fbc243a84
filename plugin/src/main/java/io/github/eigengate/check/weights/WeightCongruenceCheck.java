package io.github.eigengate.check.weights;

import io.github.eigengate.check.FindingSink;
import io.github.eigengate.data.Form;
import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.SerreWeights;
import io.github.eigengate.theory.serre.Weight;
import java.util.Collections;
import java.util.Set;

/**
 * Weights across a declared congruence a_ℓ(f) ≡ ℓ^j a_ℓ(g) mod p (a row of {@code congruences.csv} with form f,
 * other g, twist j). By Chebotarev and Brauer–Nesbitt it says ρ̄_f ≅ ρ̄_g ⊗ ω^j, and twisting by ω^j twists every
 * Serre weight by det^j (Buzzard–Diamond–Jarvis 2010, §3), so:
 * <ul>
 *   <li>when both have rows at p: W(ρ̄_f) = W(ρ̄_g) ⊗ det^j;</li>
 *   <li>when only g has one: f of weight k ≥ 2 and level prime to p has its weight Sym^{k−2} (for k &gt; p + 1 a
 *       Jordan–Hölder constituent of it) in W(ρ̄_g) ⊗ det^j — this is how two forms of different weights share one
 *       mod-p eigensystem; symmetrically with det^{−j} when only f has a row;</li>
 *   <li>a companion relation (Gross 1990: weights adding up to p + 1, twist ≡ k_f − 1) makes ρ̄ split at p, so a
 *       row saying otherwise is an error.</li>
 * </ul>
 * Congruences involving a form declared reducible mod p in {@code reducible.csv} are left out.
 */
public final class WeightCongruenceCheck extends WeightCheck {

    public static final String ID = "weight-congruence";

    WeightCongruenceCheck(boolean owner) {
        super(owner);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_l(f) ≡ l^j a_l(g) mod p implies W(ρ̄_f) = W(ρ̄_g) ⊗ det^j; companions make ρ̄ split (Gross 1990)";
    }

    @Override
    void check(Analysis.Result result, FindingSink out) {
        for (WeightTable.Congruence c : result.table().congruences()) {
            congruence(c, result, out);
        }
    }

    private static void congruence(WeightTable.Congruence c, Analysis.Result result, FindingSink out) {
        WeightTable table = result.table();
        if (table.reducible(c.left()) != null || table.reducible(c.right()) != null) {
            return;
        }
        Analysis.Resolved f = result.byRho().get(c.left());
        Analysis.Resolved g = result.byRho().get(c.right());
        if (f == null && g == null) {
            return;
        }
        out.examined(ID, c.subject());
        int p = c.p();
        int j = c.twist();
        String relation = "a_ℓ(" + c.form().id() + ") ≡ ℓ^" + j + " a_ℓ(" + c.other().id() + ") mod " + p
                + " gives ρ̄_" + c.form().id() + " ≅ ρ̄_" + c.other().id() + " ⊗ ω^" + j;
        if (Analysis.isCompanion(c)) {
            for (Analysis.Resolved r : new Analysis.Resolved[] {f, g}) {
                if (r != null && r.shape().kind() != LocalShape.Kind.SPLIT) {
                    out.error(ID, c.row().at(), c.subject(), "split at " + p, r.shape().kind().word() + " "
                            + r.shape().exponents() + " at " + r.row().source().at(), relation + " with weights "
                            + c.form().weight() + " + " + c.other().weight() + " = p + 1 and j ≡ k − 1: a companion "
                            + "pair, so ρ̄|G_" + p + " is split (Gross 1990; Coleman–Voloch 1992), but the row of "
                            + r.row().form().id() + " says " + Shapes.describe(r.shape()) + " [" + r.how() + "]");
                    return;
                }
            }
        }
        if (f != null && g != null) {
            Set<Weight> expected = SerreWeights.twist(SerreWeights.bdj(g.shape()), j, p);
            Set<Weight> found = SerreWeights.bdj(f.shape());
            if (!expected.equals(found)) {
                out.error(ID, c.row().at(), c.subject(), Weight.formatSet(expected), Weight.formatSet(found),
                        Shapes.difference(expected, found) + "; " + relation + ", so W(ρ̄_" + c.form().id()
                                + ") = W(ρ̄_" + c.other().id() + ") ⊗ det^" + j + " (Buzzard–Diamond–Jarvis 2010, §3)"
                                + "; rows at " + f.row().source().at() + " [" + f.how() + "] and "
                                + g.row().source().at() + " [" + g.how() + "]");
            }
            return;
        }
        if (g != null) {
            membership(c, c.form(), g, j, relation, out);
        } else {
            membership(c, c.other(), f, Math.floorMod(-j, p - 1), relation, out);
        }
    }

    /** The weight of {@code form} (which has no row) lies in W(ρ̄) ⊗ det^twist of the row {@code known}. */
    private static void membership(WeightTable.Congruence c, Form form, Analysis.Resolved known, int twist,
                                   String relation, FindingSink out) {
        int p = c.p();
        if (form.weight() < 2 || form.level() % p == 0 || form.weight() > Analysis.MAX_EXPANDED_WEIGHT) {
            return;
        }
        Set<Weight> own = Analysis.constituents(form.weight(), p);
        Set<Weight> w = SerreWeights.twist(SerreWeights.bdj(known.shape()), twist, p);
        if (Collections.disjoint(own, w)) {
            String other = known.row().form().id();
            out.error(ID, c.row().at(), c.subject(), (own.size() == 1 ? "" : "one of ") + Weight.formatSet(own)
                            + " in W(ρ̄_" + other + ") ⊗ det^" + twist,
                    "W(ρ̄_" + other + ") ⊗ det^" + twist + " = " + Weight.formatSet(w), relation + "; "
                            + Analysis.ownWeightReason(form, p) + "; row of " + other + " at "
                            + known.row().source().at() + " [" + known.how() + "]");
        }
    }
}
