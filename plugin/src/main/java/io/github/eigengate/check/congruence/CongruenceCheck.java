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
 * <p>With characters (det ρ̄_f = (χ_f mod 𝔭)ω^{k_f−1}): certified only for one common character χ with
 * p ∤ N_f N_g · ord χ, under identifications of the residue fields that send ζ_f to ζ_g; FALSE when no identification
 * does; NOT CERTIFIED, with the reason, for different characters or p | N_f N_g · ord χ (docs/checks.md).
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

    private record Claim(TableRow row, Form f, Form g, long p, long j, FpPoly primeF, FpPoly primeG,
                         Subject subject, List<Plan> plans, String problem) {
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
            boolean withCharacter = !f.character().isTrivial() || !g.character().isTrivial();
            if (f.weight() < 2 || g.weight() < 2) {
                problem = "weight 1 is not supported: the bound needs k >= 2 on both sides";
            } else if (withCharacter && (problem = characterProblem(f, g, p)) != null) {
                plans = List.of();
            } else if (CongruenceBounds.determinantsMatch(p, f.weight(), g.weight(), j)) {
                plans = CongruenceBounds.forForms(p, f.weight(), depletionLevel(f, p), g.weight(),
                        depletionLevel(g, p), j);
                if (plans.isEmpty()) {
                    problem = "no Sturm-type bound is implemented for p = 3 with an odd twist (θ needs p >= 5 here)";
                }
            }
            Claim c = new Claim(row, f, g, p, j, pf, pg, subject, plans, problem);
            if (!plans.isEmpty()) {
                long limit = asLong(plans.get(plans.size() - 1).bound());
                need(f, p, limit);
                need(g, p, limit);
            }
            return c;
        }

        /**
         * Why a claim between forms with characters cannot be certified, or null when it can: the Sturm-type bound
         * is applied to θ^s f♭ − θ^t g♭ in M_W(Γ0(M), χ), which needs one character χ on both sides (χ_f = χ_g
         * after lifting to lcm(N_f, N_g)), p ∤ N_f N_g, and p ∤ ord χ (so that reduction mod 𝔓 is injective on the
         * values and the identification of residue fields decides which embedding makes ζ_f = ζ_g).
         */
        private static String characterProblem(Form f, Form g, long p) {
            if (f.level() % p == 0 || g.level() % p == 0) {
                return "forms with a nontrivial character and p | N are not certified (the character's p-part mixes"
                        + " with ω; see docs/congruences.md)";
            }
            int lcm = (int) (f.level() / gcd(f.level(), g.level()) * (long) g.level());
            if ((long) f.level() / gcd(f.level(), g.level()) * g.level()
                    > DirichletCharacter.MAX_MODULUS) {
                return "lcm(N_f, N_g) is above " + DirichletCharacter.MAX_MODULUS
                        + ", where characters are not compared";
            }
            if (!f.character().lift(lcm).equals(g.character().lift(lcm))) {
                return "the characters of the two forms differ (" + f.character().cell() + " mod " + f.level()
                        + ", " + g.character().cell() + " mod " + g.level() + "): the Sturm-type bound is"
                        + " implemented for one common character only";
            }
            if (f.character().order() % p == 0) {
                return "p divides the order of the character; the bound is implemented for p prime to it";
            }
            return null;
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
            if (c.problem != null) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText,
                        "not certified: " + c.problem);
                return;
            }
            if (!CongruenceBounds.determinantsMatch(p, f.weight(), g.weight(), c.j)) {
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
            if (reportNotIntegral(out, ID, c.row, c.subject, p, c.plans.get(0).bound(), sf, sg)) {
                return;
            }
            Set<Long> excluded = primesDividing(p, f.level(), g.level());
            long x = Math.min(sf.complete(excluded), sg.complete(excluded));
            long top = Math.min(x, asLong(c.plans.get(c.plans.size() - 1).bound()));
            long jr = Math.floorMod(c.j, p - 1);

            List<Match> matches = new ArrayList<>();
            for (int kf = 0; kf < sf.primes.size(); kf++) {
                if (c.primeF != null && !sf.primes.get(kf).factor().equals(c.primeF)) {
                    continue;
                }
                for (int kg = 0; kg < sg.primes.size(); kg++) {
                    if (c.primeG != null && !sg.primes.get(kg).factor().equals(c.primeG)) {
                        continue;
                    }
                    matches.addAll(compare(sf, kf, sg, kg, jr, top, excluded));
                }
            }
            if (matches.isEmpty()) {
                out.error(ID, c.row.at(), c.subject, "an identification of residue fields with zeta_" + f.id()
                                + " = zeta_" + g.id(), "none at the primes above " + p,
                        "the congruence is false: under every choice of primes above " + p + " the reductions of χ_f"
                                + " and χ_g differ, so det ρ̄_f = (χ_f mod 𝔭)ω^(k_f-1) is not det(ρ̄_g ⊗ ω^j) = (χ_g mod "
                                + "𝔭)ω^(k_g-1+2j) (Chebotarev, Brauer–Nesbitt)");
                return;
            }
            Match best = null;
            Plan plan = null;
            for (Match m : matches) {
                if (m.failAt != 0) {
                    continue;
                }
                for (Plan pl : c.plans) {
                    if (pl.comparesAtP() && !m.agreeAtP(sf, sg)) {
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
                                + alternative(sf, sg, c.primeF, c.primeG, jr, top, excluded));
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

            boolean agreeAtP(Residues.Store sf, Residues.Store sg) {
                FiniteField.Element a = sf.atP[kf];
                FiniteField.Element b = sg.atP[kg];
                if (a == null || b == null) {
                    return false;
                }
                FiniteField big = alpha.field();
                return big.evaluate(a.value(), alpha).equals(big.evaluate(b.value(), beta));
            }
        }

        /** Every identification of the residue fields at (pf, pg), each compared for ℓ ≤ top. */
        private static List<Match> compare(Residues.Store sf, int kf, Residues.Store sg, int kg, long jr, long top,
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
            for (FiniteField.Element beta : big.roots(pg.factor())) {
                String ident = l == 1 ? "" : "the residue fields identified inside F_" + p + "[x]/(" + big.modulus()
                        + ") by x_" + sf.form.id() + " -> " + alpha + ", x_" + sg.form.id() + " -> " + beta;
                Match m = new Match(pf, kf, pg, kg, alpha, beta, ident);
                if (!zetasAgree(sf, pf, alpha, sg, pg, beta, big)) {
                    continue; // another embedding: there χ_f ≠ χ_g, so det ρ̄_f ≠ det ρ̄_g ⊗ ω^{2j}
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

        /** Whether the identification maps ζ_f mod 𝔭_f to ζ_g mod 𝔭_g (trivially so without a zeta). */
        private static boolean zetasAgree(Residues.Store sf, Residues.PrimeAbove pf, FiniteField.Element alpha,
                                          Residues.Store sg, Residues.PrimeAbove pg, FiniteField.Element beta,
                                          FiniteField big) {
            if (sf.form.zeta() == null || sg.form.zeta() == null) {
                return true;
            }
            try {
                FiniteField.Element zf = Residues.reduce(sf.form.zeta(), pf.field());
                FiniteField.Element zg = Residues.reduce(sg.form.zeta(), pg.field());
                return big.evaluate(zf.value(), alpha).equals(big.evaluate(zg.value(), beta));
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
                                          long jr, long top, Set<Long> excluded) {
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
