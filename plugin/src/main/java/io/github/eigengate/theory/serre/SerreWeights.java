package io.github.eigengate.theory.serre;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * The mod-p weight recipes for an odd ρ̄ : G_Q → GL2(F̄_p), p ≥ 5, described by its
 * {@link LocalShape} at p: Serre's weight k(ρ̄) and the set W(ρ̄) of Serre weights of
 * Buzzard–Diamond–Jarvis, plus the local data of the representation attached to an eigenform of small
 * weight. All arithmetic is on ints with exact modular reduction.
 *
 * <p>How the two recipes fit together (checked exhaustively for 5 ≤ p &lt; 60 by the tests):
 * <pre>
 *   k(ρ̄) = min over σ ∈ W(ρ̄) of minimalWeight(σ),
 * </pre>
 * where {@link #minimalWeight(Weight, int)} is the least k ≥ 2 such that σ is a Jordan–Hölder
 * constituent of Sym^{k−2} F̄_p² restricted to GL2(F_p). This is the usual passage between weights
 * k and Serre weights (Ash–Stevens, Duke Math. J. 53 (1986); BDJ 2010, §3 — from memory). The simpler
 * guess "k(ρ̄) = least r + 2 + s(p + 1)" (a form of weight r + 2 followed by θ^s) is only an upper
 * bound: it ignores that Sym^r ⊗ det^s already occurs in Sym^{2p−2−r+(p+1)·((r+s) mod (p−1))}; for
 * p = 5 and ρ̄|I_p ≅ (ω * ; 0 ω²) non-split, W = {Sym² ⊗ det²}, the guess gives 16 and k(ρ̄) = 8.
 */
public final class SerreWeights {

    private SerreWeights() {
    }

    /**
     * Serre's weight k(ρ̄), in the normalisation 2 ≤ k(ρ̄) ≤ p² − 1.
     *
     * <p>Definition: J.-P. Serre, <i>Sur les représentations modulaires de degré 2 de Gal(Q̄/Q)</i>,
     * Duke Math. J. 54 (1987), §2 (restated as Def. 4.3 in B. Edixhoven, Invent. Math. 109 (1992);
     * sub-section numbers from memory). In Serre's notation ρ̄|I_p ≅ (χ^β * ; 0 χ^α), i.e. β is the
     * exponent of the sub (our a) and α that of the quotient (our b):
     * <ol>
     *   <li>Level 2 (IRREDUCIBLE): write ρ̄|I_p ≅ ω₂^{x+py} ⊕ ω₂^{y+px} with 0 ≤ x &lt; y ≤ p − 1
     *       (possible since n ≢ 0 mod p + 1); then k = 1 + px + y. This is θ^x applied to a
     *       supersingular form of weight y − x + 1.</li>
     *   <li>Level 1, tame (SPLIT): ρ̄|I_p ≅ ω^α ⊕ ω^β with 0 ≤ α, β ≤ p − 2; with x = min, y = max,
     *       k = 1 + px + y. Serre's recipe gives k = 1 exactly when ρ̄ is unramified at p (α = β = 0);
     *       this implementation returns p instead (a weight-1 form times the Hasse invariant
     *       E_{p−1}), so that k ≥ 2 always.</li>
     *   <li>Level 1, not tame (NONSPLIT, TRES): normalise 0 ≤ α ≤ p − 2 and 1 ≤ β ≤ p − 1; with
     *       x = min(α, β), y = max(α, β): k = 1 + px + y, plus p − 1 when β = α + 1 and
     *       ρ̄ ⊗ ω^{−α} is très ramifié (the TRES kind). The range 1 ≤ β ≤ p − 1 is what makes
     *       ρ̄|I_p ≅ (1 * ; 0 1) wild get k = p rather than 1.</li>
     * </ol>
     * Bounds: the least value is 2 (e.g. ω₂ ⊕ ω₂^p, or ω ⊕ 1), the largest p² − 1 (très ramifié with
     * α = p − 2, β = p − 1).
     *
     * @return k(ρ̄) with 2 ≤ k(ρ̄) ≤ p² − 1
     * @throws NullPointerException if rho is null
     */
    public static int serreK(LocalShape rho) {
        Objects.requireNonNull(rho, "rho");
        int p = rho.p();
        switch (rho.kind()) {
            case IRREDUCIBLE: {
                int x = rho.n() % p;
                int y = rho.n() / p;
                return 1 + p * Math.min(x, y) + Math.max(x, y);
            }
            case SPLIT: {
                int k = 1 + p * Math.min(rho.a(), rho.b()) + Math.max(rho.a(), rho.b());
                return k == 1 ? p : k;
            }
            case NONSPLIT:
            case TRES: {
                int alpha = rho.b();
                int beta = rho.a() == 0 ? p - 1 : rho.a();
                int k = 1 + p * Math.min(alpha, beta) + Math.max(alpha, beta);
                return rho.kind() == LocalShape.Kind.TRES ? k + p - 1 : k;
            }
            default:
                throw new AssertionError(rho.kind());
        }
    }

    /**
     * The set W(ρ̄) of Serre weights of K. Buzzard, F. Diamond and F. Jarvis, <i>On Serre's conjecture
     * for mod ℓ Galois representations over totally real fields</i>, Duke Math. J. 155 (2010), §3
     * (Def. 3.1 and the remarks after it), specialised to F = Q, K = Q_p, one embedding.
     *
     * <p>σ = Sym^r ⊗ det^s lies in W(ρ̄) iff ρ̄|G_{Q_p} has a crystalline lift with Hodge–Tate
     * weights {0, r + 1} twisted by s. Over Q_p this means:
     * <ul>
     *   <li>IRREDUCIBLE: ρ̄|I_p ≅ ω₂^m ⊕ ω₂^{pm} with m = s(p + 1) + r + 1, i.e.
     *       n ≡ m or n ≡ pm mod p² − 1. For each of the two residues there is exactly one (r, s), since
     *       m mod p + 1 fixes r + 1 ∈ [1, p]; so |W| = 2. The pair Sym^0 ⊗ det^s and
     *       Sym^{p−1} ⊗ det^s give conjugate m and belong to the same ρ̄.</li>
     *   <li>reducible, ordering (sub, quotient) = (ω^{s+r+1}, ω^s): a ≡ s + r + 1 and b ≡ s mod p − 1
     *       (the ordinary crystalline lift, sub with Hodge–Tate weight r + 1). When a − b ≡ 1, both r = 0
     *       and r = p − 1 solve this; r = 0 (Hodge–Tate weights {0, 1}, finite flat) needs ρ̄ peu
     *       ramifié, so TRES keeps only r = p − 1.</li>
     *   <li>the other ordering (sub, quotient) = (ω^s, ω^{s+r+1}) only has split reductions
     *       (H^1_f(Q_p, Q_p(−r−1)) = 0, so a crystalline extension of ε^{r+1} by an unramified character
     *       splits; for r = p − 2 both orderings give the same weight anyway), so it counts for SPLIT
     *       shapes only: both (a, b) and (b, a) are tried.</li>
     * </ul>
     * Worked consequences (see the tests): the supersingular weight-k form gives
     * {Sym^{k−2}, Sym^{p+1−k} ⊗ det^{k−2}}; the split ordinary weight-k form adds Gross's companion
     * weight Sym^{p−1−k} ⊗ det^{k−1}.
     *
     * @return a non-empty unmodifiable set in canonical order
     * @throws NullPointerException if rho is null
     */
    public static Set<Weight> bdj(LocalShape rho) {
        Objects.requireNonNull(rho, "rho");
        int p = rho.p();
        SortedSet<Weight> out = new TreeSet<>();
        if (rho.isIrreducible()) {
            long q = (long) p * p - 1;
            long n = rho.n();
            out.add(weightOfLevel2Exponent(n, p));
            out.add(weightOfLevel2Exponent((n * p) % q, p));
        } else {
            addOrdinary(out, rho.a(), rho.b(), p, rho.kind() == LocalShape.Kind.TRES);
            if (rho.kind() == LocalShape.Kind.SPLIT) {
                addOrdinary(out, rho.b(), rho.a(), p, false);
            }
        }
        return Collections.unmodifiableSortedSet(out);
    }

    /** The unique (r, s) with s(p + 1) + r + 1 ≡ m mod p² − 1; requires m ≢ 0 mod p + 1. */
    private static Weight weightOfLevel2Exponent(long m, int p) {
        int r1 = (int) (m % (p + 1));
        // m ≡ r + 1 mod p + 1 with r + 1 ∈ [1, p]; then s(p + 1) = m − r − 1 ≥ 0.
        long s = ((m - r1) / (p + 1)) % (p - 1);
        return new Weight(r1 - 1, (int) s);
    }

    /** Adds the σ with (ω^a * ; 0 ω^b) ≅ (ω^{s+r+1} * ; 0 ω^s) on inertia. */
    private static void addOrdinary(Set<Weight> out, int a, int b, int p, boolean tres) {
        int s = b;
        int r = Math.floorMod(a - b - 1, p - 1);
        if (!(r == 0 && tres)) {
            out.add(new Weight(r, s));
        }
        if (r == 0) {
            out.add(new Weight(p - 1, s));
        }
    }

    /**
     * Returns {σ ⊗ det^j : σ ∈ w}, the weights of ρ̄ ⊗ ω^j when w = W(ρ̄).
     *
     * @return an unmodifiable set in canonical order
     * @throws IllegalArgumentException if p is not supported or some member of w is not a weight for p
     */
    public static Set<Weight> twist(Set<Weight> w, int j, int p) {
        Primes.requireSupported(p);
        SortedSet<Weight> out = new TreeSet<>();
        for (Weight x : w) {
            out.add(x.twist(j, p));
        }
        return Collections.unmodifiableSortedSet(out);
    }

    /**
     * The local shape of ρ̄_f for a normalised eigenform f of weight k, level prime to p,
     * 2 ≤ k ≤ p + 1, with 𝔭 | p the prime of reduction.
     * <ul>
     *   <li>supersingular (a_p ≡ 0 mod 𝔭): ρ̄_f|I_p ≅ ω₂^{k−1} ⊕ ω₂^{p(k−1)} (Fontaine; B. Edixhoven,
     *       Invent. Math. 109 (1992), §2, Thm 2.6). For k = p + 1 this is ω₂^p ⊕ ω₂, the same as for
     *       k = 2.</li>
     *   <li>ordinary: ρ̄_f|I_p ≅ (ω^{k−1} * ; 0 1) (Deligne; Edixhoven 1992, Thm 2.5); the caller says
     *       whether * is zero (SPLIT), non-zero and peu ramifié (NONSPLIT), or très ramifié (TRES).</li>
     * </ul>
     * Très ramifié needs ω^{k−1} = ω, i.e. k ∈ {2, p + 1}; but for k = 2 the representation lives in
     * the p-torsion of the Jacobian J_1(N), which has good reduction at p, so ρ̄_f|G_{Q_p} is finite
     * flat and hence peu ramifié (Serre 1987, §2.8 — from memory). So TRES is accepted for k = p + 1
     * only.
     *
     * @param ordinaryKind SPLIT, NONSPLIT or TRES; ignored (may be null) when supersingular
     * @throws IllegalArgumentException if p is not supported, k ∉ [2, p + 1], ordinaryKind is null or
     *     IRREDUCIBLE for an ordinary form, or TRES with k ≠ p + 1
     */
    public static LocalShape fromForm(int p, int k, boolean supersingular, LocalShape.Kind ordinaryKind) {
        requireSmallWeight(p, k);
        if (supersingular) {
            return LocalShape.irreducible(p, k - 1);
        }
        if (ordinaryKind == null || ordinaryKind == LocalShape.Kind.IRREDUCIBLE) {
            throw new IllegalArgumentException(
                    "an ordinary form needs ordinaryKind split, nonsplit or tres, got " + ordinaryKind);
        }
        if (ordinaryKind == LocalShape.Kind.TRES && k != p + 1) {
            throw new IllegalArgumentException("an ordinary form of weight " + k + " (p = " + p
                    + ") cannot be très ramifié at p: that needs ω^{k−1} = ω and k ≠ 2 (weight 2 is finite flat),"
                    + " i.e. k = p + 1 = " + (p + 1));
        }
        return LocalShape.reducible(p, ordinaryKind, k - 1, 0);
    }

    /**
     * The Serre weight Sym^{k−2} ⊗ det^0 of a form of weight k, 2 ≤ k ≤ p + 1. For k = p + 1 this is
     * Sym^{p−1}, which is a different weight from Sym^0 although both have the same central character;
     * k = p + 1 is not reduced to k = 2.
     *
     * @throws IllegalArgumentException if p is not supported or k ∉ [2, p + 1]
     */
    public static Weight weightOfForm(int p, int k) {
        requireSmallWeight(p, k);
        return new Weight(k - 2, 0);
    }

    /**
     * The Jordan–Hölder constituents, with multiplicity, of Sym^m F̄_p² as a representation of
     * GL2(F_p), in canonical order.
     *
     * <p>Method: multiplication by the Dickson invariant θ = X^pY − XY^p (on which GL2(F_p) acts by
     * det) gives 0 → Sym^{m−p−1} ⊗ det → Sym^m → Q_m → 0 for m ≥ p + 1; for m ≥ p the quotient Q_m of
     * Sym^m by θ·Sym^{m−p−1} has dimension p + 1 and constituents Sym^{r₀} and Sym^{p−1−r₀} ⊗ det^{r₀},
     * where r₀ ∈ [1, p − 1], r₀ ≡ m mod p − 1; Sym^m is irreducible for m ≤ p − 1 (D. J. Glover,
     * 1978; Ash–Stevens 1986 — from memory; the tests check this against Brauer characters,
     * Serre, <i>Linear Representations of Finite Groups</i>, §18).
     *
     * @throws IllegalArgumentException if p is not supported or m &lt; 0
     */
    public static List<Weight> symConstituents(int m, int p) {
        Primes.requireSupported(p);
        if (m < 0) {
            throw new IllegalArgumentException("Sym^m needs m ≥ 0, got m = " + m);
        }
        List<Weight> out = new ArrayList<>();
        int level = 0;
        int rest = m;
        while (true) {
            int j = level % (p - 1);
            if (rest <= p - 1) {
                out.add(new Weight(rest, j));
                break;
            }
            int r0 = (rest - 1) % (p - 1) + 1;
            out.add(new Weight(r0, j));
            out.add(new Weight(p - 1 - r0, (j + r0) % (p - 1)));
            if (rest < p + 1) {
                break;
            }
            rest -= p + 1;
            level++;
        }
        Collections.sort(out);
        return Collections.unmodifiableList(out);
    }

    /**
     * The least k ≥ 2 such that σ = Sym^r ⊗ det^s is a constituent of Sym^{k−2} F̄_p²:
     * <pre>
     *   k = 2 + min( r + s(p + 1),  2p − 2 − r + (p + 1)·((r + s) mod (p − 1)) )
     * </pre>
     * the second term only for r ≤ p − 2. Derivation from {@link #symConstituents(int, int)}: the
     * constituents of Sym^m are those of det^j ⊗ Q_{m−j(p+1)} for each level j with m − j(p + 1) ≥ p,
     * and det^j ⊗ Sym^{m−j(p+1)} at the last level if m − j(p + 1) ≤ p − 1. σ occurs as the last
     * level with j = s (first term), as the first constituent of det^s ⊗ Q_{m'} with m' = r + p − 1
     * (never better), or as the second constituent det^{j+r₀} ⊗ Sym^{p−1−r₀} with r₀ = p − 1 − r,
     * j ≡ r + s and least m' = 2p − 2 − r (second term).
     *
     * @throws IllegalArgumentException if p is not supported or σ is not a weight for p
     */
    public static int minimalWeight(Weight sigma, int p) {
        Primes.requireSupported(p);
        Objects.requireNonNull(sigma, "sigma");
        if (!sigma.isWeightFor(p)) {
            throw new IllegalArgumentException(sigma + " is not a Serre weight for p = " + p);
        }
        int r = sigma.r();
        int s = sigma.s();
        int m = r + s * (p + 1);
        if (r <= p - 2) {
            m = Math.min(m, 2 * p - 2 - r + (p + 1) * ((r + s) % (p - 1)));
        }
        return m + 2;
    }

    /**
     * The least {@link #minimalWeight(Weight, int)} over a non-empty set of weights; for w = W(ρ̄) this
     * equals {@link #serreK(LocalShape)}.
     *
     * @throws IllegalArgumentException if w is empty or contains a non-weight for p
     */
    public static int minimalWeight(Collection<Weight> w, int p) {
        if (w.isEmpty()) {
            throw new IllegalArgumentException("no minimal weight for the empty set of Serre weights");
        }
        int best = Integer.MAX_VALUE;
        for (Weight sigma : w) {
            best = Math.min(best, minimalWeight(sigma, p));
        }
        return best;
    }

    private static void requireSmallWeight(int p, int k) {
        Primes.requireSupported(p);
        if (k < 2 || k > p + 1) {
            throw new IllegalArgumentException(
                    "weight k = " + k + " is outside 2 ≤ k ≤ p + 1 = " + (p + 1) + " for p = " + p);
        }
    }
}
