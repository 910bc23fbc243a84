package io.github.eigengate.check.congruence;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.FiniteField;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.TableRow;
import io.github.eigengate.theory.Arith;
import io.github.eigengate.theory.congruence.CongruenceBounds;
import io.github.eigengate.theory.congruence.CongruenceBounds.Plan;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Rows of {@code congruences.csv}: the claim that a_ℓ(f) ≡ ℓ^j · a_ℓ(g) modulo a prime above p for every prime
 * ℓ ∤ p N_f N_g. Decided from the tables: FALSE at the first ℓ where the residues differ (under every admissible
 * choice of primes above p and identification of residue fields), or when k_f ≢ k_g + 2j mod (p − 1); CERTIFIED when
 * it holds for every ℓ up to the Sturm-type bound of {@link CongruenceBounds#forForms}; NOT CERTIFIED when the tables
 * stop before that bound. See docs/congruences.md.
 *
 * <p>With characters (det ρ̄_f = (χ_f mod 𝔭)ω^{k_f−1}): only identifications of the residue fields under which
 * χ̄_f ω^{k_f−1} = χ̄_g ω^{k_g−1+2j} on (Z/lcm(N_f, N_g, p)Z)^× are admissible; FALSE when none is. Certified as
 * without characters (the lemma of {@link CongruenceBounds} keeps Γ0(M) for different characters congruent mod 𝔭),
 * weight 1 included; NOT CERTIFIED, with the reason, when p | N_f N_g and the weights fail k_f ≡ k_g + 2j mod p − 1
 * (the characters' p-parts make up the determinant, and no E_{p−1}-padding joins the weights), or when
 * lcm(N_f, N_g) is above the characters' modulus cap (docs/congruences.md).
 */
public final class CongruenceCheck implements Check {

    public static final String ID = "congruence";

    private final boolean uncertifiedIsWarning;

    /** @param uncertifiedIsWarning report a claim the data cannot certify as a warning instead of an error */
    public CongruenceCheck(boolean uncertifiedIsWarning) {
        this.uncertifiedIsWarning = uncertifiedIsWarning;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_l(f) = l^j a_l(g) mod a prime above p for all primes l not dividing pN_fN_g, certified up to a "
                + "Sturm-type bound";
    }

    @Override
    public Check.Pass start(Catalog catalog) {
        return new PassImpl(catalog, uncertifiedIsWarning);
    }

    /** {@code compareFirst}: a claim that cannot be certified is still compared, so that a false one is named. */
    private record Claim(TableRow row, Form f, Form g, long p, long j, FpPoly primeF, FpPoly primeG,
                         Subject subject, List<Plan> plans, String problem, boolean compareFirst) {
    }

    private static final class PassImpl extends ClaimPass {
        private final List<Claim> claims = new ArrayList<>();

        PassImpl(Catalog catalog, boolean uncertifiedIsWarning) {
            super(catalog, uncertifiedIsWarning);
            for (TableRow row : catalog.congruences()) {
                Claim c = parse(row);
                if (c != null) {
                    claims.add(c);
                }
            }
        }

        private Claim parse(TableRow row) {
            String label = "congruence=" + row.get("form") + "~" + row.get("other") + " p=" + row.get("p");
            Form f = formCell(row, "form", label);
            Form g = formCell(row, "other", label);
            long p = primeCell(row, label);
            Long j = integerCell(row, "twist", label, 0L);
            if (f == null || g == null || p < 0 || j == null) {
                return null;
            }
            FpPoly pf = primeFactorCell(row, "prime", label, f, p);
            FpPoly pg = primeFactorCell(row, "other_prime", label, g, p);
            if (pf == BAD || pg == BAD) {
                return null;
            }
            Subject subject = new Subject("congruence", f.id() + "~" + g.id(), "p=" + p + (j != 0 ? " j=" + j : ""));
            List<Plan> plans = List.of();
            String problem = null;
            boolean compareFirst = false;
            boolean withCharacter = !f.character().isTrivial() || !g.character().isTrivial();
            boolean weightsMatch = CongruenceBounds.determinantsMatch(p, f.weight(), g.weight(), j);
            if (withCharacter && lcm(f, g) > DirichletCharacter.MAX_MODULUS) {
                problem = "lcm(N_f, N_g) is above " + DirichletCharacter.MAX_MODULUS
                        + ", where characters are not compared";
            } else if (weightsMatch) {
                plans = CongruenceBounds.forForms(p, f.weight(), depletionLevel(f, p), g.weight(),
                        depletionLevel(g, p), j);
                if (plans.isEmpty()) {
                    problem = "no Sturm-type bound is implemented for p = 3 with an odd twist (θ needs p >= 5 here)";
                }
            } else if (withCharacter && (f.level() % p == 0 || g.level() % p == 0)) {
                problem = "k_f = " + f.weight() + " and k_g + 2j = " + (g.weight() + 2 * j) + " differ mod " + (p - 1)
                        + ", so the determinants can agree only through the characters' p-parts (p | N); no "
                        + "Sturm-type bound is implemented for that (it needs forms of level divisible by p moved "
                        + "to level prime to p; see docs/congruences.md)";
                compareFirst = true;
            }
            Claim c = new Claim(row, f, g, p, j, pf, pg, subject, plans, problem, compareFirst);
            long limit = compareFirst ? Primes.CAP : plans.isEmpty() ? 0 : asLong(plans.get(plans.size() - 1).bound());
            if (limit > 0) {
                need(f, p, limit);
                need(g, p, limit);
            }
            return c;
        }

        private static long lcm(Form f, Form g) {
            return (long) f.level() / gcd(f.level(), g.level()) * g.level();
        }

        /**
         * The level to deplete from: N, times q for each q ≠ p with q² | N whose a_q need not vanish (the q-part of
         * cond χ equals that of N, Li 1975, Thm 3(iii)); then h − a_q h|V_q has level Nq.
         */
        private static int depletionLevel(Form h, long p) {
            long n = h.level();
            for (long[] qe : Arith.factor(h.level())) {
                long q = qe[0];
                if (q != p && qe[1] >= 2 && h.character().conductorPart((int) q)
                        == Arith.powExact(q, (int) qe[1])) {
                    n *= q;
                }
            }
            return (int) Math.min(n, Integer.MAX_VALUE);
        }

        private static long gcd(long a, long b) {
            return b == 0 ? a : gcd(b, a % b);
        }

        @Override
        void evaluate(FindingSink out) {
            for (Claim c : claims) {
                out.examined(ID, c.subject);
                evaluate(c, out);
            }
        }

        private void evaluate(Claim c, FindingSink out) {
            Form f = c.f;
            Form g = c.g;
            long p = c.p;
            String claimText = "a_l(" + f.id() + ") = l^" + c.j + "*a_l(" + g.id() + ") mod a prime above " + p;
            if (c.problem != null && !c.compareFirst) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText,
                        "not certified: " + c.problem);
                return;
            }
            if (!c.compareFirst && !CongruenceBounds.determinantsMatch(p, f.weight(), g.weight(), c.j)) {
                out.error(ID, c.row.at(), c.subject, "k_f = k_g + 2j mod " + (p - 1),
                        "k_f=" + f.weight() + ", k_g=" + g.weight() + ", j=" + c.j,
                        "the congruence is false: det of the mod-p representation of " + f.id() + " is omega^"
                                + (f.weight() - 1) + " but that of " + g.id() + " twisted by omega^" + c.j
                                + " is omega^" + (g.weight() - 1 + 2 * c.j)
                                + ", so traces differ at a positive density of primes (Chebotarev, Brauer–Nesbitt)");
                return;
            }
            if (reportIndexProblem(out, ID, c.row, c.subject, p, f, g)) {
                return;
            }
            Residues.Store sf = store(f, p);
            Residues.Store sg = store(g, p);
            BigInteger smallest = c.compareFirst ? BigInteger.valueOf(Primes.CAP) : c.plans.get(0).bound();
            if (reportNotIntegral(out, ID, c.row, c.subject, p, smallest, sf, sg)) {
                return;
            }
            Set<Long> excluded = primesDividing(p, f.level(), g.level());
            long x = Math.min(sf.complete(excluded), sg.complete(excluded));
            long top = c.compareFirst ? x : Math.min(x, asLong(c.plans.get(c.plans.size() - 1).bound()));
            List<Match> matches = new ArrayList<>();
            for (int kf = 0; kf < sf.primes.size(); kf++) {
                if (c.primeF != null && !sf.primes.get(kf).factor().equals(c.primeF)) {
                    continue;
                }
                for (int kg = 0; kg < sg.primes.size(); kg++) {
                    if (c.primeG != null && !sg.primes.get(kg).factor().equals(c.primeG)) {
                        continue;
                    }
                    matches.addAll(compare(sf, kf, sg, kg, c.j, top, excluded));
                }
            }
            if (matches.isEmpty()) {
                out.error(ID, c.row.at(), c.subject, "an identification of residue fields with (χ_f mod 𝔭)ω^(k_f-1)"
                                + " = (χ_g mod 𝔭)ω^(k_g-1+2j)", "none at the primes above " + p,
                        "the congruence is false: under every choice of primes above " + p + " the determinants "
                                + "differ, det ρ̄_f = (χ_f mod 𝔭)ω^(k_f-1) against det(ρ̄_g ⊗ ω^j) = (χ_g mod 𝔭)ω^(k_g-1+2j)"
                                + " on the units mod " + (f.level() % p == 0 || g.level() % p == 0 ? lcm(f, g)
                                : lcm(f, g) * p) + " (Chebotarev, Brauer–Nesbitt)");
                return;
            }
            Match best = null;
            Plan plan = null;
            for (Match m : matches) {
                if (m.failAt != 0) {
                    continue;
                }
                for (Plan pl : c.plans) {
                    if (pl.comparesAtP() && !m.agreeAtP(sf, sg, p)) {
                        continue;
                    }
                    if (plan == null || pl.bound().compareTo(plan.bound()) < 0) {
                        plan = pl;
                        best = m;
                    }
                    break;
                }
                if (best == null) {
                    best = m;
                }
            }
            boolean searched = (c.primeF == null && !f.rational()) || (c.primeG == null && !g.rational());
            if (best == null) {
                Match worst = matches.get(0);
                for (Match m : matches) {
                    if (m.failAt > worst.failAt) {
                        worst = m;
                    }
                }
                out.error(ID, c.row.at(), c.subject, "a_" + worst.failAt + "(" + f.id() + ") = " + worst.failAt + "^"
                                + c.j + "*a_" + worst.failAt + "(" + g.id() + ") = " + worst.right + " mod "
                                + worst.primes(),
                        "a_" + worst.failAt + "(" + f.id() + ") = " + worst.left,
                        "the congruence fails at l = " + worst.failAt + ", the first prime l not dividing "
                                + product(excluded) + " where the residues differ"
                                + (matches.size() > 1 ? " (under the identification of residue fields that holds "
                                + "longest; all " + matches.size() + " identifications fail)" : "")
                                + alternative(sf, sg, c.primeF, c.primeG, c.j, top, excluded));
                return;
            }
            if (c.compareFirst) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText + " (it holds for "
                        + "every l <= " + top + " in the tables, mod " + best.primes() + ")", "not certified: "
                        + c.problem);
                return;
            }
            if (searched) {
                out.note(ID, c.row.at(), c.subject, "found the primes " + best.primes()
                        + (best.identification.isEmpty() ? "" : " with " + best.identification)
                        + " under which the congruence holds for every l <= " + top + " in the tables");
            }
            if (plan == null) {
                Plan need = c.plans.get(0);
                notCertified(out, ID, c.row, c.subject, "a_" + p + "(" + f.id() + ") = a_" + p + "(" + g.id()
                                + ") mod " + best.primes(), "a_p missing or different",
                        "not certified: the only bound available for p = " + p + " (" + need.derivation()
                                + ") also compares a_p, which the tables do not give or which differ");
                return;
            }
            Match chosen = best;
            Plan used = plan;
            conclude(out, ID, c.row, c.subject, claimText, plan, x, excluded, () -> new Certificate(
                    c.j != 0 ? certificateName("congruence", f.id(), g.id(), "p" + p, "j" + c.j)
                            : certificateName("congruence", f.id(), g.id(), "p" + p),
                    certificate(c, chosen, used, x, excluded)));
        }

        private String certificate(Claim c, Match m, Plan plan, long x, Set<Long> excluded) {
            StringBuilder b = new StringBuilder();
            b.append("Eigengate congruence certificate\n\n");
            b.append("claim: a_l(").append(c.f.id()).append(") = l^").append(c.j).append(" * a_l(").append(c.g.id())
                    .append(") mod a prime above ").append(c.p).append(", for every prime l not dividing ")
                    .append(product(excluded)).append('\n');
            b.append("form: ").append(describe(c.f)).append('\n');
            b.append("other: ").append(describe(c.g)).append('\n');
            b.append("p: ").append(c.p).append('\n');
            b.append("twist j: ").append(c.j).append('\n');
            b.append("prime of ").append(c.f.id()).append(": ").append(m.pf).append('\n');
            b.append("prime of ").append(c.g.id()).append(": ").append(m.pg).append('\n');
            if (!m.identification.isEmpty()) {
                b.append("identification: ").append(m.identification).append('\n');
            }
            b.append(certificateTail(c.row, c.p, plan, x, excluded, ""));
            return b.toString();
        }

        /** One choice of primes and identification, and how far the congruence held. */
        private static final class Match {
            final Residues.PrimeAbove pf;
            final Residues.PrimeAbove pg;
            final int kf;
            final int kg;
            final FiniteField.Element alpha;
            final FiniteField.Element beta;
            final String identification;
            long failAt;
            String left = "";
            String right = "";

            Match(Residues.PrimeAbove pf, int kf, Residues.PrimeAbove pg, int kg, FiniteField.Element alpha,
                  FiniteField.Element beta, String identification) {
                this.pf = pf;
                this.pg = pg;
                this.kf = kf;
                this.kg = kg;
                this.alpha = alpha;
                this.beta = beta;
                this.identification = identification;
            }

            String primes() {
                return pf + " and " + pg;
            }

            /**
             * a_p(f) ≡ a_p(g), and the p-th recursion constants χ(p)p^{k−1} (0 when p | N) agree too, so that every
             * a_{p^e} agrees (only weight 1 at p ∤ N has a constant that is not ≡ 0).
             */
            boolean agreeAtP(Residues.Store sf, Residues.Store sg, long p) {
                FiniteField.Element a = sf.atP[kf];
                FiniteField.Element b = sg.atP[kg];
                if (a == null || b == null) {
                    return false;
                }
                FiniteField big = alpha.field();
                return big.evaluate(a.value(), alpha).equals(big.evaluate(b.value(), beta))
                        && recursionConstant(sf.form, pf, alpha, p).equals(recursionConstant(sg.form, pg, beta, p));
            }

            private static FiniteField.Element recursionConstant(Form h, Residues.PrimeAbove pr,
                                                                 FiniteField.Element embed, long p) {
                FiniteField big = embed.field();
                if (h.weight() >= 2 || h.level() % p == 0) {
                    return big.zero();
                }
                FiniteField.Element v = Residues.characterValue(h.character(), p, h.character().order(),
                        Residues.zeta(h, pr.field()), pr.field());
                return big.evaluate(v.value(), embed);
            }
        }

        /** Every identification of the residue fields at (pf, pg), each compared for ℓ ≤ top. */
        private static List<Match> compare(Residues.Store sf, int kf, Residues.Store sg, int kg, long j, long top,
                                           Set<Long> excluded) {
            Residues.PrimeAbove pf = sf.primes.get(kf);
            Residues.PrimeAbove pg = sg.primes.get(kg);
            int df = pf.field().degree();
            int dg = pg.field().degree();
            int l = df / gcd(df, dg) * dg;
            long p = sf.p;
            FiniteField big = l == df ? pf.field() : l == dg ? pg.field()
                    : FiniteField.of(Residues.irreducible(p, l));
            FiniteField.Element alpha = big == pf.field() ? big.generator() : big.roots(pf.factor()).get(0);
            List<Match> out = new ArrayList<>();
            long jr = Math.floorMod(j, p - 1);
            for (FiniteField.Element beta : big.roots(pg.factor())) {
                String ident = l == 1 ? "" : "the residue fields identified inside F_" + p + "[x]/(" + big.modulus()
                        + ") by x_" + sf.form.id() + " -> " + alpha + ", x_" + sg.form.id() + " -> " + beta;
                Match m = new Match(pf, kf, pg, kg, alpha, beta, ident);
                if (!determinantsAgree(sf, pf, alpha, sg, pg, beta, j)) {
                    continue; // there det ρ̄_f ≠ det(ρ̄_g ⊗ ω^j): the claim cannot hold at these primes
                }
                int n = Math.min(sf.ells.length, sg.ells.length);
                boolean fast = l == 1 && sf.linear(kf) && sg.linear(kg);
                for (int idx = 0; idx < n; idx++) {
                    long ell = sf.ells[idx];
                    if (ell > top) {
                        break;
                    }
                    if (excluded.contains(ell)) {
                        continue;
                    }
                    long twist = Residues.powMod(ell, jr, p);
                    if (fast) {
                        long a = sf.flat[kf][idx];
                        long b = sg.flat[kg][idx] * twist % p;
                        if (a != b) {
                            m.failAt = ell;
                            m.left = Long.toString(a);
                            m.right = Long.toString(b);
                            break;
                        }
                        continue;
                    }
                    FiniteField.Element a = sf.residue(kf, idx);
                    FiniteField.Element left = big.evaluate(a.value(), alpha);
                    FiniteField.Element right = big.evaluate(sg.residue(kg, idx).value(), beta)
                            .multiply(big.fromLong(twist));
                    if (!left.equals(right)) {
                        m.failAt = ell;
                        m.left = l == 1 ? a.toString() : left + " in F_" + p + "[x]/(" + big.modulus() + ")";
                        m.right = l == 1 ? right.toString() : right + " in F_" + p + "[x]/(" + big.modulus() + ")";
                        break;
                    }
                }
                out.add(m);
            }
            return out;
        }

        /**
         * Whether (χ_f mod 𝔭_f)(u)·u^{k_f−1} = (χ_g mod 𝔭_g)(u)·u^{k_g−1+2j} under the identification, for u running
         * over generators of (Z/LZ)^×, L = lcm(N_f, N_g, p) (when p ∤ N_f N_g they are ≡ 1 mod p and only the
         * characters are compared: the weights are compared apart). Trivially true for two trivial characters.
         */
        private static boolean determinantsAgree(Residues.Store sf, Residues.PrimeAbove pf, FiniteField.Element alpha,
                                                 Residues.Store sg, Residues.PrimeAbove pg, FiniteField.Element beta,
                                                 long j) {
            Form f = sf.form;
            Form g = sg.form;
            if (f.character().isTrivial() && g.character().isTrivial()) {
                return true;
            }
            long p = sf.p;
            FiniteField big = alpha.field();
            try {
                FiniteField.Element zf = Residues.zeta(f, pf.field());
                FiniteField.Element zg = Residues.zeta(g, pg.field());
                int n = (int) lcm(f, g);
                for (long u : Residues.determinantGenerators(n, p)) {
                    long ub = Math.floorMod(u, p);
                    FiniteField.Element left = big.evaluate(Residues.characterValue(f.character(), u,
                            f.character().order(), zf, pf.field()).value(), alpha)
                            .multiply(big.fromLong(Residues.powMod(ub, f.weight() - 1, p)));
                    FiniteField.Element right = big.evaluate(Residues.characterValue(g.character(), u,
                            g.character().order(), zg, pg.field()).value(), beta)
                            .multiply(big.fromLong(Residues.powMod(ub,
                                    Math.floorMod(g.weight() - 1 + 2 * j, p - 1), p)));
                    if (!left.equals(right)) {
                        return false;
                    }
                }
                return true;
            } catch (ArithmeticException e) {
                return false;
            }
        }

        /**
         * Diagnosis of a false claim: "; it holds … with twist j = …" when another twist j mod p − 1 (with the
         * declared primes) makes the residues agree for every tabulated ℓ ≤ top, or "; it holds … modulo …" when
         * other primes above p (with the declared twist) do; "" when neither.
         */
        private static String alternative(Residues.Store sf, Residues.Store sg, FpPoly primeF, FpPoly primeG,
                                          long twist, long top, Set<Long> excluded) {
            long jr = Math.floorMod(twist, sf.p - 1);
            long p = sf.p;
            for (long j = 0; j < p - 1 && p <= 1000; j++) {
                if (j == jr) {
                    continue;
                }
                for (int kf = 0; kf < sf.primes.size(); kf++) {
                    if (primeF != null && !sf.primes.get(kf).factor().equals(primeF)) {
                        continue;
                    }
                    for (int kg = 0; kg < sg.primes.size(); kg++) {
                        if (primeG != null && !sg.primes.get(kg).factor().equals(primeG)) {
                            continue;
                        }
                        for (Match m : compare(sf, kf, sg, kg, j, top, excluded)) {
                            if (m.failAt == 0) {
                                return "; it holds for every tabulated l <= " + top + " with twist j = " + j
                                        + " instead (mod " + m.primes() + ")";
                            }
                        }
                    }
                }
            }
            if (primeF == null && primeG == null) {
                return "";
            }
            for (int kf = 0; kf < sf.primes.size(); kf++) {
                for (int kg = 0; kg < sg.primes.size(); kg++) {
                    for (Match m : compare(sf, kf, sg, kg, jr, top, excluded)) {
                        if (m.failAt == 0) {
                            return "; it holds for every tabulated l <= " + top + " modulo " + m.primes()
                                    + " instead";
                        }
                    }
                }
            }
            return "";
        }

        private static int gcd(int a, int b) {
            return b == 0 ? a : gcd(b, a % b);
        }
    }
}
