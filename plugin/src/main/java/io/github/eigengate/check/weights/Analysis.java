package io.github.eigengate.check.weights;

import io.github.eigengate.arith.NumberField;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.ResidueMap;
import io.github.eigengate.check.Finding;
import io.github.eigengate.check.Severity;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.FormData;
import io.github.eigengate.data.Problems;
import io.github.eigengate.data.SourceLocation;
import io.github.eigengate.theory.serre.LocalShape;
import io.github.eigengate.theory.serre.SerreWeights;
import io.github.eigengate.theory.serre.Weight;
import io.github.eigengate.theory.spaces.Dimensions;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * One pass over a dataset for the weight checks: keeps the residue of a_p at the named prime for each (form, p)
 * that {@code modp-weights.csv} needs (nothing else of the coefficients), then turns every row into the local shape
 * of ρ̄ at p.
 *
 * <p>From a form of weight k and level N with p ∤ N and 2 ≤ k ≤ p + 1 (Edixhoven, Invent. Math. 109 (1992), §2;
 * theorem numbers as in {@code theory.serre}, from memory):
 * <ul>
 *   <li>a_p ≡ 0 mod 𝔭 (supersingular): ρ̄|I_p ≅ ω₂^{k−1} ⊕ ω₂^{p(k−1)} (Fontaine; Edixhoven Thm 2.6);</li>
 *   <li>otherwise (ordinary): ρ̄|G_p ≅ (ω^{k−1}·λ(a_p⁻¹) * ; 0 λ(a_p)) with λ(c) unramified, Frob_p ↦ c
 *       (Deligne; Edixhoven Thm 2.5), so ρ̄|I_p ≅ (ω^{k−1} * ; 0 1). Whether * vanishes is not in a_p: it is read
 *       from {@code local}; failing that, for 2 ≤ k ≤ p − 1 it is split exactly when a companion form is declared
 *       (Gross, Duke Math. J. 61 (1990); Coleman–Voloch, Invent. Math. 110 (1992); volume numbers from memory),
 *       and otherwise assumed non-split with a note. For k = p + 1, ρ̄ is taken peu ramifié when a congruence
 *       (twist 0) with a weight-2 form of level prime to p is declared (then ρ̄ arises in weight 2; Serre 1987, §2,
 *       Edixhoven 1992, §4 — from memory), and otherwise assumed très ramifié, the generic case, with a note.</li>
 * </ul>
 * Gross's companion relation, as declared in {@code congruences.csv} (a_ℓ(form) ≡ ℓ^j a_ℓ(other) mod p): the two
 * weights add up to p + 1, both levels are prime to p and j ≡ k_form − 1 mod p − 1; in either order, since
 * ρ̄_f ≅ ρ̄_g ⊗ ω^{k−1} is the same statement as ρ̄_g ≅ ρ̄_f ⊗ ω^{k'−1} (ω^{k+k'−2} = ω^{p−1} = 1).
 */
final class Analysis {

    /** A row turned into a local shape; {@code how} says in words where the shape came from. */
    record Resolved(WeightRow row, LocalShape shape, String how) {
    }

    /** Everything a check needs at the end of a pass. */
    record Result(WeightTable table, List<Resolved> resolved, Map<Rho, Resolved> byRho, List<Finding> tableFindings,
                  List<Finding> formFindings) {
    }

    private record Ap(boolean zero, String text, String failure) {
    }

    /** Weights k beyond this are not expanded into Jordan–Hölder constituents (the check is skipped). */
    static final int MAX_EXPANDED_WEIGHT = 1_000_000;

    private final WeightTable table;
    private final Map<String, List<WeightRow>> need = new HashMap<>();
    private final Map<WeightRow, Ap> ap = new IdentityHashMap<>();

    Analysis(Catalog catalog) {
        this.table = WeightTable.read(catalog);
        for (WeightRow row : table.rows()) {
            if (row.form() != null && smallWeight(row.form(), row.p())) {
                need.computeIfAbsent(row.form().id(), k -> new ArrayList<>()).add(row);
            }
        }
    }

    /** 2 ≤ k ≤ p + 1 and p ∤ N: where a_p decides ρ̄|I_p. */
    static boolean smallWeight(Form f, int p) {
        return f.weight() >= 2 && f.weight() <= p + 1 && f.level() % p != 0;
    }

    /** Keeps a_p mod 𝔭 for the rows about this form. */
    void accept(FormData<?> data) {
        List<WeightRow> rows = need.get(data.form().id());
        if (rows == null) {
            return;
        }
        for (WeightRow row : rows) {
            Object a = data.coefficients().get(row.p());
            if (a == null) {
                continue;
            }
            int p = row.p();
            try {
                if (a instanceof Rational q) {
                    long r = ResidueMap.reduceRational(q, p);
                    ap.put(row, new Ap(r == 0, "a_" + p + " ≡ " + r + " mod " + p, null));
                } else {
                    var r = row.prime().reduce((NumberField.Element) a);
                    ap.put(row, new Ap(r.isZero(), "a_" + p + " ≡ " + r + " mod " + row.prime(), null));
                }
            } catch (ArithmeticException e) {
                ap.put(row, new Ap(false, "", "a_" + p + " = " + a + " is not integral at " + p + ": "
                        + e.getMessage()));
            }
        }
    }

    Result resolve() {
        List<Resolved> resolved = new ArrayList<>();
        Map<Rho, Resolved> byRho = new LinkedHashMap<>();
        List<Finding> tableFindings = new ArrayList<>(table.problems());
        List<Finding> formFindings = new ArrayList<>();
        for (WeightRow row : table.rows()) {
            if (row.rho() != null) {
                WeightTable.Reducible red = table.reducible(row.rho());
                if (red != null) {
                    tableFindings.add(new Finding(Problems.CHECK_ID, Severity.NOTE, row.source().at(),
                            new Subject("table", row.source().file(), row.label()), "", "",
                            "ρ̄ is declared reducible at " + red.row().at() + "; the weight recipes assume ρ̄ "
                                    + "irreducible, so this row is not checked"));
                    continue;
                }
            }
            Resolved r = row.shape() != null ? declared(row, formFindings) : fromForm(row, tableFindings,
                    formFindings);
            if (r != null) {
                resolved.add(r);
                if (row.rho() != null) {
                    byRho.put(row.rho(), r);
                }
            }
        }
        return new Result(table, resolved, byRho, tableFindings, formFindings);
    }

    /** A row with shape and exponents; for a form, checks them against a_p and the form's weight. */
    private Resolved declared(WeightRow row, List<Finding> formFindings) {
        LocalShape shape = row.shape();
        Resolved r = new Resolved(row, shape, "shape=" + shape.kind().word() + " " + shape.exponents());
        Form f = row.form();
        if (f == null) {
            return r;
        }
        int p = row.p();
        Ap a = ap.get(row);
        if (smallWeight(f, p) && a != null && a.failure() == null && a.zero() != shape.isIrreducible()) {
            String reason = a.zero()
                    ? a.text() + ": the form is supersingular at " + p + ", so ρ̄|I_" + p
                            + " is irreducible (Fontaine; Edixhoven 1992, Thm 2.6)"
                    : a.text() + ": the form is ordinary at " + p + ", so ρ̄|I_" + p + " is reducible, "
                            + "(ω^" + (f.weight() - 1) + " * ; 0 1) (Deligne; Edixhoven 1992, Thm 2.5)";
            formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.ERROR, row.source().at("shape"),
                    row.subject(), a.zero() ? "irreducible" : "split, nonsplit or tres", shape.kind().word(), reason));
            return r;
        }
        ownWeight(r, formFindings);
        return r;
    }

    /** A row with a form and no shape: the shape from a_p, {@code local} and the declared congruences. */
    private Resolved fromForm(WeightRow row, List<Finding> tableFindings, List<Finding> formFindings) {
        Form f = row.form();
        int p = row.p();
        int k = f.weight();
        if (!smallWeight(f, p)) {
            String why = f.level() % p == 0 ? "p = " + p + " divides the level " + f.level()
                    : "the weight " + k + " is outside 2 ≤ k ≤ p + 1 = " + (p + 1);
            tableFindings.add(tableError(row, row.source().at("shape"), "shape and exponents", "an empty cell",
                    why + ": a_p decides ρ̄|I_p only for 2 ≤ k ≤ p + 1 and p ∤ N (Deligne, Fontaine), so describe "
                            + "ρ̄ at p in 'shape' and 'exponents'"));
            return null;
        }
        Ap a = ap.get(row);
        if (a == null) {
            tableFindings.add(tableError(row, row.source().at("form"), "a_" + p + " in the coefficient tables",
                    "none", "a_" + p + " of " + f.id() + " is needed to tell ordinary from supersingular at " + p));
            return null;
        }
        if (a.failure() != null) {
            tableFindings.add(tableError(row, row.source().at("form"), "a_" + p + " integral at " + p, "",
                    a.failure()));
            return null;
        }
        LocalShape.Kind local = row.local();
        if (a.zero()) {
            if (local != null) {
                formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.ERROR, row.source().at("local"),
                        row.subject(), "an empty cell (supersingular)", local.word(), a.text()
                                + ": the form is supersingular at " + p + ", so ρ̄|I_" + p + " is irreducible, "
                                + "ω₂^" + (k - 1) + " ⊕ ω₂^" + p * (k - 1) + " (Fontaine; Edixhoven 1992, Thm 2.6), "
                                + "and has no split/non-split shape"));
            }
            LocalShape shape = SerreWeights.fromForm(p, k, true, null);
            return ownWeight(new Resolved(row, shape, a.text() + ": supersingular (Fontaine)"), formFindings);
        }
        String how = a.text() + ": ordinary (Deligne)";
        LocalShape.Kind kind;
        if (local != null) {
            if (local == LocalShape.Kind.TRES && k != p + 1) {
                formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.ERROR, row.source().at("local"),
                        row.subject(), "split or nonsplit", local.word(), "très ramifié needs ω^(k−1) = ω and "
                                + "k ≠ 2 (weight 2 is finite flat), i.e. k = p + 1 = " + (p + 1) + ", but k = " + k
                                + " (Serre 1987, §2; Edixhoven 1992, §2)"));
                return null;
            }
            if (local == LocalShape.Kind.SPLIT && k <= p - 1 && f.character().isTrivial()
                    && Dimensions.cuspForms(f.level(), p + 1 - k) == 0) {
                // Gross 1990 (with Coleman–Voloch 1992): irreducible ρ̄, ordinary and split at p, 2 ≤ k ≤ p − 1, has a
                // companion eigenform of weight p + 1 − k and level N, which lifts to S_{p+1−k}(Γ0(N)) (Deligne–Serre)
                formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.ERROR, row.source().at("local"),
                        row.subject(), "nonsplit (no companion can exist)", local.word(), "split at " + p + " with 2 ≤ k"
                                + " ≤ p − 1 needs a companion form of weight p + 1 − k = " + (p + 1 - k) + " and level "
                                + f.level() + " (Gross 1990; Coleman–Voloch 1992), but dim S_" + (p + 1 - k) + "(Γ0("
                                + f.level() + ")) = 0"));
                return null;
            }
            kind = local;
            how = how + ", local=" + local.word();
        } else if (k <= p - 1 && companion(row) != null) {
            kind = LocalShape.Kind.SPLIT;
            how = how + ", split: companion form declared at " + companion(row).row().at() + " (Gross 1990)";
        } else if (k == p + 1) {
            WeightTable.Congruence c = weightTwo(row);
            if (c != null) {
                kind = LocalShape.Kind.NONSPLIT;
                how = how + ", peu ramifié: congruent to a weight-2 form at " + c.row().at();
            } else {
                kind = LocalShape.Kind.TRES;
                how = how + ", très ramifié assumed";
                formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.NOTE, row.source().at("local"),
                        row.subject(), "", "", a.text() + ": ordinary of weight p + 1 = " + (p + 1)
                                + " with no 'local' and no congruence to a weight-2 form of level prime to " + p
                                + ": assumed très ramifié (then k(ρ̄) = " + (p + 1) + "); write local=nonsplit if ρ̄ "
                                + "is peu ramifié (then k(ρ̄) = 2)"));
            }
        } else {
            kind = LocalShape.Kind.NONSPLIT;
            how = how + ", non-split assumed";
            formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.NOTE, row.source().at("local"),
                    row.subject(), "", "", a.text() + ": ordinary and no companion form of weight " + (p + 1 - k)
                            + " is declared in congruences.csv: assumed non-split at " + p
                            + " (Gross 1990); write local=split if it splits"));
        }
        LocalShape shape = SerreWeights.fromForm(p, k, false, kind);
        return ownWeight(new Resolved(row, shape, how), formFindings);
    }

    /** Reports when W(ρ̄) holds no Jordan–Hölder constituent of Sym^{k−2} for a form of level prime to p. */
    private static Resolved ownWeight(Resolved r, List<Finding> formFindings) {
        Form f = r.row().form();
        int p = r.row().p();
        if (f.weight() < 2 || f.level() % p == 0 || f.weight() > MAX_EXPANDED_WEIGHT) {
            return r;
        }
        Set<Weight> own = constituents(f.weight(), p);
        Set<Weight> w = SerreWeights.bdj(r.shape());
        if (Collections.disjoint(own, w)) {
            formFindings.add(new Finding(WeightOfFormCheck.ID, Severity.ERROR,
                    r.row().shape() != null ? r.row().source().at("exponents") : r.row().source().at(),
                    r.row().subject(), (own.size() == 1 ? "" : "one of ") + Weight.formatSet(own) + " in W(ρ̄)",
                    "W(ρ̄) = " + Weight.formatSet(w), ownWeightReason(f, p) + "; ρ̄|I_" + p + " ≅ "
                            + Shapes.describe(r.shape()) + " [" + r.how() + "]"));
        }
        return r;
    }

    static String ownWeightReason(Form f, int p) {
        int k = f.weight();
        return k <= p + 1
                ? f.id() + " has weight " + k + " and level prime to " + p + ", so its own weight Sym^" + (k - 2)
                        + " lies in W(ρ̄) (Buzzard–Diamond–Jarvis 2010, §3)"
                : f.id() + " has weight " + k + " and level prime to " + p + ", so a Jordan–Hölder constituent of "
                        + "Sym^" + (k - 2) + " lies in W(ρ̄) (Ash–Stevens 1986; Buzzard–Diamond–Jarvis 2010, §3)";
    }

    /** The Jordan–Hölder constituents of Sym^{k−2} F̄_p² as a GL2(F_p)-representation, without multiplicity. */
    static Set<Weight> constituents(int k, int p) {
        return Collections.unmodifiableSet(new TreeSet<>(SerreWeights.symConstituents(k - 2, p)));
    }

    /** The first declared companion form of the row's form (see the class comment), or {@code null}. */
    WeightTable.Congruence companion(WeightRow row) {
        for (WeightTable.Congruence c : table.congruences()) {
            if (isCompanion(c) && (c.left().equals(row.rho()) || c.right().equals(row.rho()))) {
                return c;
            }
        }
        return null;
    }

    /**
     * True iff c is Gross's companion relation: k_form + k_other = p + 1 with both in [2, p − 1], both levels prime
     * to p, and twist ≡ k_form − 1 mod p − 1.
     */
    static boolean isCompanion(WeightTable.Congruence c) {
        int p = c.p();
        int kl = c.form().weight();
        int kr = c.other().weight();
        return kl + kr == p + 1 && kl >= 2 && kr >= 2 && c.form().level() % p != 0 && c.other().level() % p != 0
                && Math.floorMod(kl - 1, p - 1) == c.twist();
    }

    /** A declared congruence, twist 0, of the row's form with a weight-2 form of level prime to p, or {@code null}. */
    private WeightTable.Congruence weightTwo(WeightRow row) {
        for (WeightTable.Congruence c : table.congruences()) {
            if (c.twist() != 0) {
                continue;
            }
            if (c.left().equals(row.rho()) && c.other().weight() == 2 && c.other().level() % c.p() != 0
                    || c.right().equals(row.rho()) && c.form().weight() == 2 && c.form().level() % c.p() != 0) {
                return c;
            }
        }
        return null;
    }

    private static Finding tableError(WeightRow row, SourceLocation at, String expected, String found,
                                      String reason) {
        return new Finding(Problems.CHECK_ID, Severity.ERROR, at, new Subject("table", at.file(), row.label()),
                expected, found, reason);
    }
}
