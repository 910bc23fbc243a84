package io.github.eigengate.theory.congruence;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.Rational;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * How many primes ℓ must be compared before a congruence between eigenforms (or between an eigenform and an
 * Eisenstein series) follows for every ℓ. The derivation is written out in docs/congruences.md; in short:
 *
 * <ol>
 *   <li><b>Depletion at the bad primes</b> (characteristic 0). For an eigenform h of weight k and level N and a
 *   prime q ≠ p, the form h♭ = Σ_{q ∤ n} a_n q^n is h − a_q h|V_q + q^{k−1} h|V_{q²} of level Nq² when q ∤ N,
 *   h − a_q h|V_q of level Nq when q ‖ N, and h itself when q² | N (a_q = 0: Li, Math. Ann. 212 (1975), Thm 3). So
 *   depleting both sides at every q | N_f N_g, q ≠ p, gives forms on Γ0(M), M = lcm(N_f, N_g, Q²), Q the product of
 *   those q. The same holds for the Eisenstein series G_w = −B_w/2w + Σ σ_{w−1}(n) q^n (level 1, Hecke eigenvalues
 *   1 + q^{w−1}), whose depletion also has constant term 0.</li>
 *   <li><b>Removing p and twisting</b> (route THETA, p ≥ 5). θ = q d/dq maps the reduction of a form of weight k with
 *   p-integral coefficients on Γ0(M) to the reduction of one of weight k + p + 1 on Γ0(M): θF ≡ (∂F·E_{p−1} + k
 *   E_{p+1} F)/12 with Ramanujan's ∂F = 12θF − kE_2F modular of weight k + 2, E_{p−1} ≡ 1 and E_{p+1} ≡ E_2 mod p
 *   (Serre, <i>Congruences et formes modulaires</i>, Sém. Bourbaki 416 (1972); Swinnerton-Dyer, LNM 350 (1973); Katz,
 *   <i>A result on modular forms in characteristic p</i>, LNM 601 (1977); quoted from memory, without section numbers).
 *   θ^s multiplies a_n by n^s, so θ^s kills the terms with p | n once s ≥ 1, and θ^s h♭, θ^t g♭ have the coefficients
 *   n^s a_n(f), n^t a_n(g) at (n, pQ) = 1.</li>
 *   <li><b>One weight.</b> Multiplying by E_{p−1} ≡ 1 (mod p, p ≥ 5; Serre loc. cit.) raises the weight by p − 1
 *   without changing the reduction; for p = 2, 3, E_4 ≡ E_6 ≡ 1 (240 = 2⁴·3·5, 504 = 2³·3²·7) raise it by any even
 *   amount ≥ 4.</li>
 *   <li><b>Sturm.</b> The difference is a form of weight W on Γ0(M) with 𝔓-integral coefficients; by
 *   {@link SturmBound} it vanishes mod 𝔓 if its coefficients do for n ≤ B = ⌊W·m(M)/12⌋. Its coefficients at
 *   composite n follow from those at primes by the Hecke recursions of both sides, which agree mod p exactly when the
 *   determinant condition below holds; so comparing a_ℓ at primes ℓ ≤ B, ℓ ∤ pQ, suffices.</li>
 * </ol>
 *
 * <p>Route DIRECT (no θ) applies when the twist is trivial mod p − 1: then f♭ and g♭ (resp. G_w♭) are compared
 * including the terms with p | n, which needs the extra comparison a_p(f) ≡ a_p(g) (resp. a_p(f) ≡ 1), since for
 * k ≥ 2 the recursion gives a_{p^e} ≡ a_p^e mod p on both sides. It gives the weight max(k_f, k_g) instead of about
 * k + p², and so usually the smaller bound.
 *
 * <p>The determinant condition k_f ≡ k_g + 2j (mod p − 1) (resp. k − 1 ≡ i + j) is also necessary: if a_ℓ(f) ≡
 * ℓ^j a_ℓ(g) for almost all ℓ then ρ̄_f ≅ ρ̄_g ⊗ ω^j (Chebotarev and Brauer–Nesbitt, p odd), and det ρ̄_f =
 * ω^{k_f−1} (Deligne; trivial character). With characters det ρ̄_f = (χ_f mod 𝔓)ω^{k_f−1}, so the condition reads
 * χ̄_f ω^{k_f−1} = χ̄_g ω^{k_g−1+2j} on (Z/lcm(N_f, N_g, p)Z)^×; the checks decide it in the residue field.
 *
 * <p><b>Characters congruent mod 𝔓</b> (lemma, proved in docs/congruences.md). If F_1 ∈ M_W(Γ0(M), χ_1) and
 * F_2 ∈ M_W(Γ0(M), χ_2) have 𝔓-integral coefficients and χ_1(d) ≡ χ_2(d) mod 𝔓 for every d, then Sturm's bound for
 * Γ0(M) holds for F = F_1 − F_2: F is invariant under Γ_H = {γ ∈ Γ0(M) : χ_1(d) = χ_2(d) = 1}, F|γ ≡ χ_1(d)F
 * mod 𝔓 for γ ∈ Γ0(M), so the product P of F|γ over Γ_H\Γ0(M) (r cosets) lies in M_{Wr}(Γ0(M)) and is ≡ unit·F^r;
 * ord F > W·m(M)/12 gives ord P > Wr·m(M)/12, so P ≡ 0 and F ≡ 0 (F_𝔓[[q]] is a domain). With χ_1 = χ_2 this is
 * the usual bound with a character. So Γ0(M) serves for every pair of sides, with or without characters, once the
 * determinant condition and the weight condition both hold (together they give χ̄_1 = χ̄_2).
 */
public final class CongruenceBounds {

    /** Largest Eisenstein weight for which a constant term −B_w/2w is tested for divisibility by p. */
    static final int BERNOULLI_CAP = 300;

    private CongruenceBounds() {
    }

    /** How the comparison is turned into one modular form. */
    public enum Route {
        /** No θ: the twist is trivial mod p − 1, and a_p is compared as well. */
        DIRECT,
        /** θ^s on one side and θ^t on the other, killing the terms with p | n (p ≥ 5). */
        THETA
    }

    /**
     * One way to certify a congruence.
     *
     * @param route            DIRECT or THETA
     * @param prime            p
     * @param level            M, factored: prime → exponent
     * @param index            m(M) = [SL2(Z) : Γ0(M)]
     * @param weight           W, the common weight of both sides
     * @param bound            B = ⌊W·m(M)/12⌋
     * @param leftTheta        s, the power of θ applied to f (0 for DIRECT)
     * @param rightTheta       t, the power of θ applied to the other side (0 for DIRECT)
     * @param eisensteinWeight w of the Eisenstein series G_w used, 0 for a congruence between two cusp forms
     * @param comparesAtP      whether a_p must be compared too (route DIRECT)
     * @param derivation       one line that says how W and M arose
     * @param swapped          for an Eisenstein series with characters: E = E_w^{φ,ψ} (a_ℓ = φ(ℓ) + ψ(ℓ)ℓ^{w−1})
     *                         instead of E_w^{ψ,φ}
     */
    public record Plan(Route route, long prime, SortedMap<Long, Integer> level, BigInteger index, long weight,
                       BigInteger bound, long leftTheta, long rightTheta, long eisensteinWeight, boolean comparesAtP,
                       String derivation, boolean swapped) {

        public Plan {
            level = Collections.unmodifiableSortedMap(new TreeMap<>(level));
        }

        /** A plan with E_w^{ψ,φ} (or no Eisenstein series). */
        public Plan(Route route, long prime, SortedMap<Long, Integer> level, BigInteger index, long weight,
                    BigInteger bound, long leftTheta, long rightTheta, long eisensteinWeight, boolean comparesAtP,
                    String derivation) {
            this(route, prime, level, index, weight, bound, leftTheta, rightTheta, eisensteinWeight, comparesAtP,
                    derivation, false);
        }

        /** M written as a number. */
        public BigInteger levelValue() {
            return SturmBound.value(level);
        }
    }

    /**
     * Whether k_f ≡ k_g + 2j (mod p − 1), i.e. det ρ̄_f = det(ρ̄_g ⊗ ω^j). Always true for p = 2.
     *
     * @throws IllegalArgumentException if p < 2
     */
    public static boolean determinantsMatch(long p, long kf, long kg, long j) {
        checkPrime(p);
        return Math.floorMod(kf - kg - 2 * Math.floorMod(j, p - 1), p - 1) == 0;
    }

    /** Whether k − 1 ≡ i + j (mod p − 1), i.e. det ρ̄_f = ω^{i+j}. Always true for p = 2. */
    public static boolean eisensteinDeterminantMatches(long p, long k, long i, long j) {
        checkPrime(p);
        return Math.floorMod(k - 1 - Math.floorMod(i, p - 1) - Math.floorMod(j, p - 1), p - 1) == 0;
    }

    /**
     * M = lcm(N_1, …, Q²), Q = the product of the primes q ≠ p dividing some N_i: the level on which the forms
     * depleted at those q live (step 1 above).
     */
    public static SortedMap<Long, Integer> depletedLevel(long p, long... levels) {
        SortedMap<Long, Integer> m = new TreeMap<>();
        for (long n : levels) {
            for (Map.Entry<Long, Integer> e : SturmBound.factor(n).entrySet()) {
                m.merge(e.getKey(), e.getValue(), Math::max);
            }
        }
        for (Map.Entry<Long, Integer> e : m.entrySet()) {
            if (e.getKey() != p) {
                e.setValue(Math.max(e.getValue(), 2));
            }
        }
        return m;
    }

    /**
     * Every plan that certifies a_ℓ(f) ≡ ℓ^j a_ℓ(g) (mod 𝔓) for all primes ℓ ∤ p N_f N_g, for eigenforms f, g of
     * weights k_f, k_g ≥ 1 and levels N_f, N_g, sorted by bound (smallest first). Empty when no route applies (p = 3
     * with j odd). With characters the caller has checked the determinant condition χ̄_f ω^{k_f−1} = χ̄_g
     * ω^{k_g−1+2j} in the residue field; with the weight part required here it gives χ̄_f = χ̄_g, and the lemma of the
     * class comment keeps Γ0(M). Route DIRECT also needs a_p and the p-th recursion constants χ(p)p^{k−1} (0 when
     * p | N) of both sides to agree mod 𝔓: automatic for k ≥ 2, compared by the caller at weight 1.
     *
     * @throws IllegalArgumentException if p is not prime, a weight or a level is below 1, or k_f ≢ k_g + 2j mod
     *                                  p − 1 (then the congruence is false when p ∤ N_f N_g, see the class comment)
     */
    public static List<Plan> forForms(long p, int kf, int nf, int kg, int ng, long j) {
        checkPrime(p);
        if (kf < 1 || kg < 1 || nf < 1 || ng < 1) {
            throw new IllegalArgumentException("weights and levels must be at least 1");
        }
        if (!determinantsMatch(p, kf, kg, j)) {
            throw new IllegalArgumentException("k_f ≢ k_g + 2j mod p − 1");
        }
        SortedMap<Long, Integer> m = depletedLevel(p, nf, ng);
        BigInteger index = SturmBound.index(m);
        String on = " on Γ0(" + SturmBound.value(m) + ")";
        List<Plan> out = new ArrayList<>();
        long jr = Math.floorMod(j, p - 1);
        if (jr == 0) {
            long w = pad(p, kf, kg);
            if (w > 0) {
                out.add(new Plan(Route.DIRECT, p, m, index, w, bound(w, index), 0, 0, 0, true,
                        "f♭ − g♭" + padText(p, kf, kg, w) + on + ", a_p compared too"));
            }
        }
        if (p >= 5) {
            for (long s : new long[] {1, jr == 0 ? 1 : p - jr}) {
                long t = oneTo(s + jr, p);
                long w = Math.max(kf + s * (p + 1), kg + t * (p + 1));
                String text = "θ^" + s + " f♭ − θ^" + t + " g♭ (weights " + (kf + s * (p + 1)) + ", "
                        + (kg + t * (p + 1)) + ", brought to " + w + " by E_" + (p - 1) + ")" + on;
                out.add(new Plan(Route.THETA, p, m, index, w, bound(w, index), s, t, 0, false, text));
            }
        }
        return sorted(out);
    }

    /**
     * Every plan that certifies a_ℓ(f) ≡ ℓ^i + ℓ^j (mod 𝔓) for all primes ℓ ∤ pN, for an eigenform f with trivial
     * character, weight k ≥ 2 and level N, sorted by bound. Empty when no route applies: p = 2, 3 with N a power of
     * p; p = 2, 3 with neither exponent ≡ 0; or N a power of p and no Eisenstein series with constant term ≡ 0 mod p
     * of weight ≤ {@value #BERNOULLI_CAP} fits route DIRECT while p ≤ 3.
     *
     * @throws IllegalArgumentException if p < 2, k < 2, N < 1, or k − 1 ≢ i + j (mod p − 1)
     */
    public static List<Plan> forEisenstein(long p, int k, int n, long i, long j) {
        checkPrime(p);
        if (k < 2 || n < 1) {
            throw new IllegalArgumentException("weight must be at least 2 and level at least 1");
        }
        if (!eisensteinDeterminantMatches(p, k, i, j)) {
            throw new IllegalArgumentException("k − 1 ≢ i + j mod p − 1");
        }
        SortedMap<Long, Integer> m = depletedLevel(p, n);
        BigInteger index = SturmBound.index(m);
        boolean bad = m.keySet().stream().anyMatch(q -> q != p);
        List<Plan> out = new ArrayList<>();
        long ir = Math.floorMod(i, p - 1);
        long jr = Math.floorMod(j, p - 1);
        // route DIRECT: f♭ against G_w♭ with w − 1 ≡ the exponent that is not ≡ 0
        for (long other : new long[] {ir == 0 ? jr : -1, jr == 0 ? ir : -1}) {
            if (other < 0) {
                continue;
            }
            long best = -1;
            long bestW = Long.MAX_VALUE;
            long step = p == 2 ? 2 : p - 1;
            long first = firstEven(Math.floorMod(other + 1, p - 1), p);
            for (long w = first; w <= Math.max(k, first) + 8; w += step) {
                if (!bad && (p <= 3 || !constantTermVanishes(p, w))) {
                    continue;
                }
                long pw = pad(p, k, w);
                if (pw > 0 && pw < bestW) {
                    bestW = pw;
                    best = w;
                }
            }
            if (best > 0) {
                out.add(new Plan(Route.DIRECT, p, m, index, bestW, bound(bestW, index), 0, 0, best, true,
                        "f♭ − G_" + best + "♭" + padText(p, k, best, bestW) + " on Γ0(" + SturmBound.value(m)
                                + "), a_p ≡ 1 compared too" + (bad ? "" : " (p divides the constant term of G_"
                                + best + ")")));
            }
        }
        if (p >= 5) {
            for (long[] ab : new long[][] {{ir, jr}, {jr, ir}}) {
                long r = Math.floorMod(ab[1] - ab[0], p - 1);
                if (r % 2 == 0) {
                    continue;
                }
                long w = r + 1 >= 4 ? r + 1 : p + 1;
                if (w % (p - 1) == 0) {
                    continue; // B_w/w is not p-integral
                }
                for (long s : new long[] {1, oneTo(1 - ab[0], p)}) {
                    long t = oneTo(s + ab[0], p);
                    long weight = Math.max(k + s * (p + 1), w + t * (p + 1));
                    String text = "θ^" + s + " f♭ − θ^" + t + " G_" + w + "♭ (weights " + (k + s * (p + 1)) + ", "
                            + (w + t * (p + 1)) + ", brought to " + weight + " by E_" + (p - 1) + ") on Γ0("
                            + SturmBound.value(m) + ")";
                    out.add(new Plan(Route.THETA, p, m, index, weight, bound(weight, index), s, t, w, false, text));
                }
            }
        }
        return sorted(out);
    }

    /**
     * Every plan that certifies a_ℓ(f) ≡ ψ(ℓ)ℓ^i + φ(ℓ)ℓ^j (mod 𝔓) for all primes ℓ ∤ pN, for an eigenform f of
     * weight k ≥ 1 and level N, and characters ψ, φ mod N not both trivial (for both trivial see
     * {@link #forEisenstein}), sorted by bound. The Eisenstein series is E_w^{ψ,φ} = c + Σ_n (Σ_{d | n} ψ(n/d)φ(d)
     * d^{w−1}) q^n ∈ M_w(Γ0(uv), ψφ), u, v the conductors of ψ, φ taken primitive (Diamond–Shurman, Thm 4.5.2 for
     * w ≥ 3, §4.6 for w = 2, §4.8 for w = 1; it exists when ψφ(−1) = (−1)^w), a normalised eigenform with
     * a_ℓ = ψ(ℓ) + φ(ℓ)ℓ^{w−1}, or E_w^{φ,ψ} with the roles exchanged ({@link Plan#swapped}). Its constant term c is 0
     * when the first character is nontrivial and w ≥ 2, or when both are nontrivial (ibid.); otherwise depletion at a
     * prime q ≠ p of the level kills it (the factor (1 − ψ(q))(1 − φ(q)q^{w−1}), or 1 − a_q when q | uv, is 0 for ψ
     * trivial; E_1^{ψ,φ} = E_1^{φ,ψ}), and without such a q there is no plan. Steps 1–4 of the class comment then apply
     * on Γ0(M), M = lcm(N, uv, Q²), with the lemma on characters congruent mod 𝔓 (class comment).
     *
     * <p>Route DIRECT (first exponent ≡ 0 mod p − 1, any p) compares a_p(f) with a_p(E) = ψ(p) + φ(p)p^{w−1}
     * (primitive values) and the recursion constants χ(p)p^{k−1} with ψφ(p)p^{w−1} (0 at p | N resp. p | uv): the
     * caller does. Route THETA needs p ≥ 5. The caller has checked the determinant condition χ̄ω^{k−1} = ψ̄φ̄ω^{i+j}
     * in the residue field; its weight part k − 1 ≡ i + j (mod p − 1) is required here.
     *
     * @throws IllegalArgumentException if p is not prime, k < 1, N < 1, ψ, φ are not characters mod N, or
     *                                  k − 1 ≢ i + j (mod p − 1)
     */
    public static List<Plan> forEisenstein(long p, int k, int n, long i, long j, DirichletCharacter psi,
                                           DirichletCharacter phi) {
        checkPrime(p);
        if (k < 1 || n < 1 || psi.modulus() != n || phi.modulus() != n) {
            throw new IllegalArgumentException("weight and level must be positive, the characters mod the level");
        }
        if (!eisensteinDeterminantMatches(p, k, i, j)) {
            throw new IllegalArgumentException("k − 1 ≢ i + j mod p − 1");
        }
        long uv = (long) psi.conductor() * phi.conductor();
        SortedMap<Long, Integer> m = depletedLevel(p, n, uv);
        boolean bad = m.keySet().stream().anyMatch(q -> q != p);
        BigInteger index = SturmBound.index(m);
        String on = " on Γ0(" + SturmBound.value(m) + ")";
        boolean odd = psi.multiply(phi).isOdd();
        List<Plan> out = new ArrayList<>();
        long step = p == 2 ? 1 : p - 1;
        for (boolean swapped : new boolean[] {false, true}) {
            DirichletCharacter first = swapped ? phi : psi;
            DirichletCharacter second = swapped ? psi : phi;
            long a = Math.floorMod(swapped ? j : i, step);
            long b = Math.floorMod(swapped ? i : j, step);
            String name = swapped ? "E^{φ,ψ}" : "E^{ψ,φ}";
            if (a == 0) {
                long bestW = -1;
                long bestPad = Long.MAX_VALUE;
                for (long w = 1; w <= Math.max(k, 3) + 2 * step + 2; w++) {
                    if (Math.floorMod(w - 1 - b, step) != 0 || (w % 2 == 1) != odd
                            || !constantTermVanishes(first, second, w, bad)) {
                        continue;
                    }
                    long pw = pad(p, k, w);
                    if (pw > 0 && pw < bestPad) {
                        bestPad = pw;
                        bestW = w;
                    }
                }
                if (bestW > 0) {
                    out.add(new Plan(Route.DIRECT, p, m, index, bestPad, bound(bestPad, index), 0, 0, bestW, true,
                            "f♭ − " + name + "_" + bestW + "♭" + padText(p, k, bestW, bestPad) + on
                                    + ", a_p and the p-th Hecke recursion compared too", swapped));
                }
            }
            if (p >= 5) {
                long w = Math.floorMod(b - a, p - 1) + 1;
                while (w < 3) {
                    w += p - 1;
                }
                if ((w % 2 == 1) != odd || !constantTermVanishes(first, second, w, bad)) {
                    continue;
                }
                for (long s : new long[] {1, oneTo(1 - a, p)}) {
                    long t = oneTo(s + a, p);
                    long weight = Math.max(k + s * (p + 1), w + t * (p + 1));
                    String text = "θ^" + s + " f♭ − θ^" + t + " " + name + "_" + w + "♭ (weights " + (k + s * (p + 1))
                            + ", " + (w + t * (p + 1)) + ", brought to " + weight + " by E_" + (p - 1) + ")" + on;
                    out.add(new Plan(Route.THETA, p, m, index, weight, bound(weight, index), s, t, w, false, text,
                            swapped));
                }
            }
        }
        return sorted(out);
    }

    /**
     * Whether the constant term of E_w^{first,second} is 0, or is killed by depleting at a prime q ≠ p of the level
     * ({@code bad}); see {@link #forEisenstein(long, int, int, long, long, DirichletCharacter, DirichletCharacter)}.
     */
    private static boolean constantTermVanishes(DirichletCharacter first, DirichletCharacter second, long w,
                                                boolean bad) {
        if (!first.isTrivial() && !second.isTrivial()) {
            return true;
        }
        if (!first.isTrivial() && w >= 2) {
            return true;
        }
        return bad;
    }

    /**
     * The smallest weight W ≥ max(a, b) reachable from both a and b by multiplying with forms ≡ 1 mod p: for p ≥ 5
     * powers of E_{p−1} (W − a, W − b ∈ (p−1)N), for p = 2, 3 products of E_4, E_6 (W − a, W − b ∈ {0, 4, 6, 8, …});
     * −1 when there is none.
     */
    static long pad(long p, long a, long b) {
        long hi = Math.max(a, b);
        if (p >= 5) {
            return Math.floorMod(a - b, p - 1) == 0 ? hi : -1;
        }
        if (Math.floorMod(a - b, 2) != 0) {
            return -1;
        }
        for (long w = hi; ; w += 2) {
            if (reachable(w - a) && reachable(w - b)) {
                return w;
            }
        }
    }

    private static boolean reachable(long d) {
        return d == 0 || (d >= 4 && d % 2 == 0);
    }

    private static String padText(long p, long a, long b, long w) {
        if (a == w && b == w) {
            return " (weight " + w + ")";
        }
        String by = p >= 5 ? "E_" + (p - 1) : "E_4, E_6";
        return " (weights " + a + ", " + b + ", brought to " + w + " by " + by + ")";
    }

    /** The smallest even w ≥ 4 with w ≡ c (mod p − 1); c is in [0, p − 2]. */
    private static long firstEven(long c, long p) {
        if (p <= 3) {
            return 4;
        }
        long w = c;
        while (w < 4 || w % 2 != 0) {
            w += p - 1;
        }
        return w;
    }

    /** x mod (p − 1) represented in [1, p − 1]. */
    private static long oneTo(long x, long p) {
        return Math.floorMod(x - 1, p - 1) + 1;
    }

    private static BigInteger bound(long w, BigInteger index) {
        return BigInteger.valueOf(w).multiply(index).divide(BigInteger.valueOf(12));
    }

    private static List<Plan> sorted(List<Plan> plans) {
        plans.sort(Comparator.comparing(Plan::bound).thenComparing(Plan::route));
        List<Plan> unique = new ArrayList<>();
        for (Plan pl : plans) {
            if (unique.stream().noneMatch(u -> u.route() == pl.route() && u.leftTheta() == pl.leftTheta()
                    && u.rightTheta() == pl.rightTheta() && u.eisensteinWeight() == pl.eisensteinWeight()
                    && u.swapped() == pl.swapped())) {
                unique.add(pl);
            }
        }
        return List.copyOf(unique);
    }

    /** Whether p divides the numerator of B_w/(2w) (and not its denominator), for even w ≤ the cap. */
    static boolean constantTermVanishes(long p, long w) {
        if (w > BERNOULLI_CAP) {
            return false;
        }
        Rational c = bernoulli((int) w).divide(Rational.of(2 * w));
        BigInteger bp = BigInteger.valueOf(p);
        return c.num().mod(bp).signum() == 0 && c.den().mod(bp).signum() != 0;
    }

    /** B_0 … B_k, computed once and extended on demand. */
    private static Rational[] bernoulliTable = {Rational.ONE};

    /**
     * The Bernoulli number B_n (B_1 = −1/2) from Σ_{k=0}^{n} C(n+1, k) B_k = 0 (Ireland–Rosen, Ch. 15 §1; quoted from
     * memory). O(n²) rational operations, shared by all calls; used only for n ≤ {@value #BERNOULLI_CAP}.
     *
     * @throws IllegalArgumentException if n < 0
     */
    static synchronized Rational bernoulli(int n) {
        if (n < 0) {
            throw new IllegalArgumentException("n must be non-negative, was " + n);
        }
        if (n >= bernoulliTable.length) {
            Rational[] b = java.util.Arrays.copyOf(bernoulliTable, n + 1);
            for (int m = bernoulliTable.length; m <= n; m++) {
                Rational sum = Rational.ZERO;
                BigInteger binom = BigInteger.ONE; // C(m+1, k)
                for (int k = 0; k < m; k++) {
                    sum = sum.add(b[k].multiply(Rational.of(binom)));
                    binom = binom.multiply(BigInteger.valueOf(m + 1 - k)).divide(BigInteger.valueOf(k + 1));
                }
                b[m] = sum.divide(Rational.of(m + 1)).negate();
            }
            bernoulliTable = b;
        }
        return bernoulliTable[n];
    }

    private static void checkPrime(long p) {
        if (!io.github.eigengate.theory.Arith.isPrime(p)) {
            throw new IllegalArgumentException("p must be a prime, was " + p);
        }
    }
}
