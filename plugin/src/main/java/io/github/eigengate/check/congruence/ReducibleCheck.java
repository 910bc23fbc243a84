package io.github.eigengate.check.congruence;

import io.github.eigengate.arith.DirichletCharacter;
import io.github.eigengate.arith.FiniteField;
import io.github.eigengate.arith.FpPoly;
import io.github.eigengate.check.Certificate;
import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.Subject;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.CharacterCell;
import io.github.eigengate.data.Form;
import io.github.eigengate.data.TableRow;
import io.github.eigengate.theory.congruence.CongruenceBounds;
import io.github.eigengate.theory.congruence.CongruenceBounds.Plan;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Rows of {@code reducible.csv}: the claim that ρ̄_{f,𝔭} is reducible with semisimplification ω^i ⊕ ω^j, i.e.
 * a_ℓ(f) ≡ ℓ^i + ℓ^j mod 𝔭 for every prime ℓ ∤ pN — a congruence between f and the Eisenstein series
 * Σ_n (Σ_{d | n} d^i (n/d)^j) q^n. Decided like {@link CongruenceCheck}, with the bound of
 * {@link CongruenceBounds#forEisenstein}.
 *
 * <p>With characters ψ, φ (columns {@code psi}, {@code phi}): a_ℓ ≡ ψ(ℓ)ℓ^i + φ(ℓ)ℓ^j, a congruence with E_w^{ψ,φ};
 * only primes 𝔭 where χ̄_f ω^{k−1} = ψ̄φ̄ω^{i+j} on (Z/lcm(N, p)Z)^× are admissible (det of both sides), FALSE when
 * none is; certified with the bound of {@link CongruenceBounds#forEisenstein(long, int, int, long, long,
 * io.github.eigengate.arith.DirichletCharacter, io.github.eigengate.arith.DirichletCharacter)}, weight 1 included.
 */
public final class ReducibleCheck implements Check {

    public static final String ID = "reducible";

    private final boolean uncertifiedIsWarning;

    /** @param uncertifiedIsWarning report a claim the data cannot certify as a warning instead of an error */
    public ReducibleCheck(boolean uncertifiedIsWarning) {
        this.uncertifiedIsWarning = uncertifiedIsWarning;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "a_l = l^i + l^j mod a prime above p for all primes l not dividing pN (Eisenstein congruence), "
                + "certified up to a Sturm-type bound";
    }

    @Override
    public Check.Pass start(Catalog catalog) {
        return new PassImpl(catalog, uncertifiedIsWarning);
    }

    private record Claim(TableRow row, Form f, long p, long i, long j, FpPoly prime, Subject subject,
                         List<Plan> plans, String problem) {
    }

    private static final class PassImpl extends ClaimPass {
        private final List<Claim> claims = new ArrayList<>();

        PassImpl(Catalog catalog, boolean uncertifiedIsWarning) {
            super(catalog, uncertifiedIsWarning);
            for (TableRow row : catalog.reducible()) {
                Claim c = parse(row);
                if (c != null) {
                    claims.add(c);
                }
            }
        }

        private Claim parse(TableRow row) {
            String label = "reducible=" + row.get("form") + " p=" + row.get("p");
            Form f = formCell(row, "form", label);
            long p = primeCell(row, label);
            Long i = integerCell(row, "i", label, null);
            Long j = integerCell(row, "j", label, null);
            if (f == null || p < 0 || i == null || j == null) {
                return null;
            }
            FpPoly prime = primeFactorCell(row, "prime", label, f, p);
            if (prime == BAD) {
                return null;
            }
            DirichletCharacter psi = characterCell(row, "psi", label, f);
            DirichletCharacter phi = characterCell(row, "phi", label, f);
            if (psi == null || phi == null) {
                return null;
            }
            Subject subject = new Subject("reducible", f.id(), "p=" + p + " i=" + i + " j=" + j);
            List<Plan> plans = List.of();
            String problem = null;
            boolean withCharacter = !f.character().isTrivial() || !psi.isTrivial() || !phi.isTrivial();
            if (withCharacter) {
                boolean weightsMatch = CongruenceBounds.eisensteinDeterminantMatches(p, f.weight(), i, j);
                if (weightsMatch) {
                    // with ψ = φ = 1 (χ_f ≡ 1 mod 𝔭 once the determinant holds) the series G_w of the trivial case
                    plans = !psi.isTrivial() || !phi.isTrivial()
                            ? CongruenceBounds.forEisenstein(p, f.weight(), f.level(), i, j, psi, phi)
                            : f.weight() >= 2 ? CongruenceBounds.forEisenstein(p, f.weight(), f.level(), i, j)
                            : List.of();
                }
                if (weightsMatch && plans.isEmpty()) {
                    problem = "no Sturm-type bound is implemented for this case (p = " + p + ", i = " + i + ", j = " + j
                            + (psi.isTrivial() && phi.isTrivial() ? ", ψ = φ = 1, weight " + f.weight() : "")
                            + "): route DIRECT needs an exponent = 0 mod p - 1 and an Eisenstein series whose constant"
                            + " term vanishes, θ needs p >= 5; see docs/congruences.md";
                } else if (!weightsMatch && f.level() % p == 0) {
                    problem = "k - 1 = " + (f.weight() - 1) + " and i + j = " + (i + j) + " differ mod " + (p - 1)
                            + ", so the determinants can agree only through the characters' p-parts (p | N); no "
                            + "Sturm-type bound is implemented for that (see docs/congruences.md)";
                }
                withCharacters.put(row, new DirichletCharacter[] {psi, phi});
                need(f, p, plans.isEmpty() ? Primes.CAP : asLong(plans.get(plans.size() - 1).bound()));
                return new Claim(row, f, p, i, j, prime, subject, plans, problem);
            } else if (f.weight() < 2) {
                problem = "weight 1 is not supported: the bound needs k >= 2";
            } else if (CongruenceBounds.eisensteinDeterminantMatches(p, f.weight(), i, j)) {
                plans = CongruenceBounds.forEisenstein(p, f.weight(), f.level(), i, j);
                if (plans.isEmpty()) {
                    problem = "no Sturm-type bound is implemented for this case (p = " + p + ", level " + f.level()
                            + ", i = " + i + ", j = " + j + "): for p = 2, 3 one exponent must be = 0 mod p - 1 and "
                            + "the level must have a prime other than p; see docs/congruences.md";
                }
            }
            if (!plans.isEmpty()) {
                need(f, p, asLong(plans.get(plans.size() - 1).bound()));
            }
            return new Claim(row, f, p, i, j, prime, subject, plans, problem);
        }

        /** Rows with characters ψ, φ (not all of χ_f, ψ, φ trivial). */
        private final Map<TableRow, DirichletCharacter[]> withCharacters = new HashMap<>();

        /**
         * A {@code psi}/{@code phi} cell: a character mod the form's level N in the character-cell syntax (empty =
         * trivial); the Eisenstein series E(ψ, φ) has level cond ψ · cond φ, which must divide N. Null after
         * reporting.
         */
        private DirichletCharacter characterCell(TableRow row, String column, String label, Form f) {
            CharacterCell.Parsed parsed = CharacterCell.parse(row.get(column), f.level());
            if (!parsed.ok()) {
                cellError(row, column, label, CharacterCell.EXPECTED + " (a character mod N = " + f.level() + ")",
                        row.get(column), parsed.problem());
                return null;
            }
            DirichletCharacter c = parsed.character();
            if (!c.isTrivial() && c.order() > 2 && (f.character().order() % c.order() != 0)) {
                cellError(row, column, label, "a character whose order divides that of χ_f ("
                                + f.character().order() + "), so its values lie in the form's field",
                        row.get(column), "its order is " + c.order());
                return null;
            }
            return c;
        }

        /**
         * A claim with characters: at each admissible prime 𝔭 above p (det: χ̄_f(u)u^{k−1} = ψ̄(u)φ̄(u)u^{i+j} on
         * generators u of (Z/lcm(N, p)Z)^×), a_ℓ ≡ ψ(ℓ)ℓ^i + φ(ℓ)ℓ^j mod 𝔭 for every prime ℓ ∤ pN up to the largest
         * bound (the tables' end when no bound applies); ψ(ℓ), φ(ℓ) reduced through the form's zeta. FALSE when no
         * prime is admissible or it fails at every admissible one; else certified by the best plan whose a_p test
         * (route DIRECT) passes, or not certified with the reason.
         */
        private void evaluateWithCharacters(Claim c, DirichletCharacter psi, DirichletCharacter phi, String claimText,
                                            FindingSink out) {
            Form f = c.f;
            long p = c.p;
            Residues.Store s = store(f, p);
            BigInteger smallest = c.plans.isEmpty() ? BigInteger.valueOf(Primes.CAP) : c.plans.get(0).bound();
            if (reportNotIntegral(out, ID, c.row, c.subject, p, smallest, s)) {
                return;
            }
            Set<Long> excluded = primesDividing(p, f.level());
            long x = s.complete(excluded);
            long top = c.plans.isEmpty() ? x : Math.min(x, asLong(c.plans.get(c.plans.size() - 1).bound()));
            long ei = Math.floorMod(c.i, p - 1);
            long ej = Math.floorMod(c.j, p - 1);
            int order = f.character().order();
            long worstAt = -1;
            String worstLeft = "";
            String worstRight = "";
            Residues.PrimeAbove worstPrime = null;
            Residues.PrimeAbove holds = null;
            Residues.PrimeAbove chosen = null;
            Plan plan = null;
            for (int k = 0; k < s.primes.size(); k++) {
                Residues.PrimeAbove pr = s.primes.get(k);
                if (c.prime != null && !pr.factor().equals(c.prime)) {
                    continue;
                }
                FiniteField field = pr.field();
                FiniteField.Element z;
                try {
                    z = Residues.zeta(f, field);
                } catch (ArithmeticException e) {
                    continue;
                }
                if (!determinantAgrees(c, psi, phi, z, field)) {
                    continue;
                }
                long failAt = 0;
                String left = "";
                String right = "";
                for (int idx = 0; idx < s.ells.length && s.ells[idx] <= top; idx++) {
                    long ell = s.ells[idx];
                    if (excluded.contains(ell)) {
                        continue;
                    }
                    FiniteField.Element want = Residues.characterValue(psi, ell, order, z, field)
                            .multiply(field.fromLong(Residues.powMod(ell, ei, p)))
                            .add(Residues.characterValue(phi, ell, order, z, field)
                                    .multiply(field.fromLong(Residues.powMod(ell, ej, p))));
                    FiniteField.Element have = s.residue(k, idx);
                    if (!have.equals(want)) {
                        failAt = ell;
                        left = have.toString();
                        right = want.toString();
                        break;
                    }
                }
                if (failAt != 0) {
                    if (failAt > worstAt) {
                        worstAt = failAt;
                        worstLeft = left;
                        worstRight = right;
                        worstPrime = pr;
                    }
                    continue;
                }
                if (holds == null) {
                    holds = pr;
                }
                for (Plan pl : c.plans) {
                    if (pl.comparesAtP() && !agreesAtP(c, pl, psi, phi, s, k, z, field)) {
                        continue;
                    }
                    if (plan == null || pl.bound().compareTo(plan.bound()) < 0) {
                        plan = pl;
                        chosen = pr;
                    }
                    break;
                }
            }
            if (holds == null && worstPrime == null) {
                out.error(ID, c.row.at(), c.subject, "a prime above " + p + " with (χ_f mod 𝔭)ω^(k-1) = (ψφ mod 𝔭)"
                                + "ω^(i+j)", "none (χ_f = " + f.character().cell() + ", ψφ = " + psi.multiply(phi).cell()
                                + ")",
                        "the claim is false: ρ̄_f^ss ≅ ψω^i ⊕ φω^j gives det ρ̄_f = ψφω^(i+j), while det ρ̄_f = (χ_f mod"
                                + " 𝔭)ω^(k-1), and the two differ on the units mod " + (f.level() % p == 0 ? f.level()
                                : f.level() * p) + " at every prime above " + p + " (Chebotarev, Brauer–Nesbitt)");
                return;
            }
            if (holds == null) {
                out.error(ID, c.row.at(), c.subject, "a_" + worstAt + "(" + f.id() + ") = ψ(" + worstAt + ")*"
                                + worstAt + "^" + c.i + " + φ(" + worstAt + ")*" + worstAt + "^" + c.j + " = "
                                + worstRight + " mod " + worstPrime, "a_" + worstAt + "(" + f.id() + ") = " + worstLeft,
                        "the congruence fails at l = " + worstAt + ", the first prime l not dividing "
                                + product(excluded) + " where the residues differ");
                return;
            }
            if (c.prime == null && !f.rational()) {
                out.note(ID, c.row.at(), c.subject, "found the prime " + (chosen != null ? chosen : holds)
                        + " under which the congruence holds for every l <= " + top + " in the tables");
            }
            if (c.problem != null) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText + " (it holds for every "
                        + "l <= " + top + " in the tables)", "not certified: " + c.problem);
                return;
            }
            if (plan == null) {
                notCertified(out, ID, c.row, c.subject, "a_" + p + "(" + f.id() + ") = a_" + p + "(E) mod " + holds
                                + ", and the same p-th Hecke recursion", "a_p missing or different",
                        "not certified: the only bound available for p = " + p + " (" + c.plans.get(0).derivation()
                                + ") also compares a_p, which the tables do not give or which differs");
                return;
            }
            Residues.PrimeAbove at = chosen;
            Plan used = plan;
            conclude(out, ID, c.row, c.subject, claimText, plan, x, excluded, () -> new Certificate(
                    certificateName("reducible", f.id(), "p" + p, "i" + c.i, "j" + c.j),
                    certificate(c, at, used, x, excluded, psi, phi)));
        }

        /** χ̄_f(u)u^{k−1} = ψ̄(u)φ̄(u)u^{i+j} mod 𝔭 for generators u of (Z/lcm(N, p)Z)^× (≡ 1 mod p when p ∤ N). */
        private static boolean determinantAgrees(Claim c, DirichletCharacter psi, DirichletCharacter phi,
                                                 FiniteField.Element z, FiniteField field) {
            Form f = c.f;
            long p = c.p;
            int order = f.character().order();
            for (long u : Residues.determinantGenerators(f.level(), p)) {
                long ub = Math.floorMod(u, p);
                FiniteField.Element left = Residues.characterValue(f.character(), u, order, z, field)
                        .multiply(field.fromLong(Residues.powMod(ub, f.weight() - 1, p)));
                FiniteField.Element right = Residues.characterValue(psi, u, order, z, field)
                        .multiply(Residues.characterValue(phi, u, order, z, field))
                        .multiply(field.fromLong(Residues.powMod(ub, Math.floorMod(c.i + c.j, p - 1), p)));
                if (!left.equals(right)) {
                    return false;
                }
            }
            return true;
        }

        /**
         * Route DIRECT: a_p(f) ≡ a_p(E) = ψ₀(p) + φ₀(p)p^{w−1} (primitive values; roles exchanged when swapped) and the
         * recursion constants χ_f(p)p^{k−1} (0 at p | N) ≡ ψ₀(p)φ₀(p)p^{w−1}, so that every a_{p^e} agrees.
         */
        private static boolean agreesAtP(Claim c, Plan pl, DirichletCharacter psi, DirichletCharacter phi,
                                         Residues.Store s, int k, FiniteField.Element z, FiniteField field) {
            FiniteField.Element ap = s.atP[k];
            if (ap == null) {
                return false;
            }
            Form f = c.f;
            long p = c.p;
            int order = f.character().order();
            DirichletCharacter first = pl.swapped() ? phi : psi;
            DirichletCharacter second = pl.swapped() ? psi : phi;
            FiniteField.Element a = Residues.characterValue(first.restrictTo(first.conductor()), p, order, z, field);
            FiniteField.Element b = Residues.characterValue(second.restrictTo(second.conductor()), p, order, z, field);
            boolean weightOne = pl.eisensteinWeight() == 1;
            FiniteField.Element apE = weightOne ? a.add(b) : a;
            FiniteField.Element cE = weightOne ? a.multiply(b) : field.zero();
            FiniteField.Element cF = f.weight() == 1 && f.level() % p != 0
                    ? Residues.characterValue(f.character(), p, order, z, field) : field.zero();
            return ap.equals(apE) && cF.equals(cE);
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
            long p = c.p;
            String claimText = "a_l(" + f.id() + ") = l^" + c.i + " + l^" + c.j + " mod a prime above " + p;
            DirichletCharacter[] chars = withCharacters.get(c.row);
            if (chars != null) {
                claimText = "a_l(" + f.id() + ") = ψ(l)*l^" + c.i + " + φ(l)*l^" + c.j + " mod a prime above " + p
                        + " (ψ = " + chars[0].cell() + ", φ = " + chars[1].cell() + ")";
                if (c.problem == null && c.plans.isEmpty()) {
                    reportWeightMismatch(c, out);
                } else if (!reportIndexProblem(out, ID, c.row, c.subject, p, f)) {
                    evaluateWithCharacters(c, chars[0], chars[1], claimText, out);
                }
                return;
            }
            if (c.problem != null) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText,
                        "not certified: " + c.problem);
                return;
            }
            if (!CongruenceBounds.eisensteinDeterminantMatches(p, f.weight(), c.i, c.j)) {
                reportWeightMismatch(c, out);
                return;
            }
            if (reportIndexProblem(out, ID, c.row, c.subject, p, f)) {
                return;
            }
            Residues.Store s = store(f, p);
            if (reportNotIntegral(out, ID, c.row, c.subject, p, c.plans.get(0).bound(), s)) {
                return;
            }
            Set<Long> excluded = primesDividing(p, f.level());
            long x = s.complete(excluded);
            long top = Math.min(x, asLong(c.plans.get(c.plans.size() - 1).bound()));
            long ei = Math.floorMod(c.i, p - 1);
            long ej = Math.floorMod(c.j, p - 1);

            int bestK = -1;
            Plan plan = null;
            int worstK = -1;
            long worstAt = 0;
            String worstLeft = "";
            String worstRight = "";
            for (int k = 0; k < s.primes.size(); k++) {
                Residues.PrimeAbove pr = s.primes.get(k);
                if (c.prime != null && !pr.factor().equals(c.prime)) {
                    continue;
                }
                FiniteField field = pr.field();
                long failAt = 0;
                String left = "";
                String right = "";
                for (int idx = 0; idx < s.ells.length && s.ells[idx] <= top; idx++) {
                    long ell = s.ells[idx];
                    if (excluded.contains(ell)) {
                        continue;
                    }
                    long want = (Residues.powMod(ell, ei, p) + Residues.powMod(ell, ej, p)) % p;
                    boolean same = s.linear(k) ? s.flat[k][idx] == want
                            : s.residue(k, idx).equals(field.fromLong(want));
                    if (!same) {
                        failAt = ell;
                        left = s.residue(k, idx).toString();
                        right = Long.toString(want);
                        break;
                    }
                }
                if (failAt != 0) {
                    if (failAt > worstAt) {
                        worstAt = failAt;
                        worstK = k;
                        worstLeft = left;
                        worstRight = right;
                    }
                    continue;
                }
                FiniteField.Element ap = s.atP[k];
                for (Plan pl : c.plans) {
                    if (pl.comparesAtP() && (ap == null || !ap.equals(field.one()))) {
                        continue;
                    }
                    if (plan == null || pl.bound().compareTo(plan.bound()) < 0) {
                        plan = pl;
                        bestK = k;
                    }
                    break;
                }
                if (bestK < 0) {
                    bestK = k;
                }
            }
            if (bestK < 0) {
                out.error(ID, c.row.at(), c.subject, "a_" + worstAt + "(" + f.id() + ") = " + worstAt + "^" + c.i
                                + " + "
                                + worstAt + "^" + c.j + " = " + worstRight + " mod " + s.primes.get(worstK),
                        "a_" + worstAt + "(" + f.id() + ") = " + worstLeft,
                        "the congruence fails at l = " + worstAt + ", the first prime l not dividing "
                                + product(excluded) + " where the residues differ"
                                + (c.prime == null && s.primes.size() > 1 ? " (at the prime above " + p
                                + " where it holds longest; it fails at every prime above " + p + ")" : ""));
                return;
            }
            Residues.PrimeAbove chosen = s.primes.get(bestK);
            if (c.prime == null && !f.rational()) {
                out.note(ID, c.row.at(), c.subject, "found the prime " + chosen + " under which the congruence holds "
                        + "for every l <= " + top + " in the tables");
            }
            if (plan == null) {
                notCertified(out, ID, c.row, c.subject, "a_" + p + "(" + f.id() + ") = 1 mod " + chosen,
                        "a_p missing or different", "not certified: the only bound available for p = " + p + " ("
                                + c.plans.get(0).derivation() + ") also compares a_p, which the tables do not give "
                                + "or which differs");
                return;
            }
            Plan used = plan;
            conclude(out, ID, c.row, c.subject, claimText, plan, x, excluded, () -> new Certificate(
                    certificateName("reducible", f.id(), "p" + p, "i" + c.i, "j" + c.j),
                    certificate(c, chosen, used, x, excluded)));
        }

        private void reportWeightMismatch(Claim c, FindingSink out) {
            Form f = c.f;
            out.error(ID, c.row.at(), c.subject, "k - 1 = i + j mod " + (c.p - 1),
                    "k=" + f.weight() + ", i=" + c.i + ", j=" + c.j,
                    "the claim is false: det of the mod-p representation of " + f.id() + " is "
                            + (f.character().isTrivial() ? "" : "(χ_f mod 𝔭)") + "omega^" + (f.weight() - 1)
                            + ", not " + (withCharacters.containsKey(c.row) ? "(ψφ mod 𝔭)" : "") + "omega^(i+j)"
                            + (f.character().isTrivial() && !withCharacters.containsKey(c.row) ? ""
                            : " (p does not divide N, so the characters are unramified at p and the powers of omega"
                            + " must agree)") + ", so a_l differs from "
                            + (withCharacters.containsKey(c.row) ? "the claim" : "l^i + l^j")
                            + " at a positive density of primes (Chebotarev, Brauer–Nesbitt)");
        }

        private String certificate(Claim c, Residues.PrimeAbove prime, Plan plan, long x, Set<Long> excluded,
                                   DirichletCharacter psi, DirichletCharacter phi) {
            String eis = "Eisenstein series: " + (plan.swapped() ? "E_" + plan.eisensteinWeight() + "^{phi,psi}"
                    : "E_" + plan.eisensteinWeight() + "^{psi,phi}") + " with psi = " + psi.cell() + ", phi = "
                    + phi.cell() + " (taken primitive)\n";
            StringBuilder b = new StringBuilder();
            b.append("Eigengate reducibility certificate\n\n");
            b.append("claim: a_l(").append(c.f.id()).append(") = psi(l)*l^").append(c.i).append(" + phi(l)*l^")
                    .append(c.j).append(" mod a prime above ").append(c.p).append(", for every prime l not dividing ")
                    .append(product(excluded)).append('\n');
            b.append("form: ").append(describe(c.f)).append(", character ").append(c.f.character().cell()).append('\n');
            b.append("p: ").append(c.p).append('\n');
            b.append("exponents i, j: ").append(c.i).append(", ").append(c.j).append('\n');
            b.append("prime: ").append(prime).append('\n');
            b.append(certificateTail(c.row, c.p, plan, x, excluded, eis));
            return b.toString();
        }

        private String certificate(Claim c, Residues.PrimeAbove prime, Plan plan, long x, Set<Long> excluded) {
            StringBuilder b = new StringBuilder();
            b.append("Eigengate reducibility certificate\n\n");
            b.append("claim: a_l(").append(c.f.id()).append(") = l^").append(c.i).append(" + l^").append(c.j)
                    .append(" mod a prime above ").append(c.p).append(", for every prime l not dividing ")
                    .append(product(excluded)).append('\n');
            b.append("form: ").append(describe(c.f)).append('\n');
            b.append("p: ").append(c.p).append('\n');
            b.append("exponents i, j: ").append(c.i).append(", ").append(c.j).append('\n');
            b.append("prime: ").append(prime).append('\n');
            b.append(certificateTail(c.row, c.p, plan, x, excluded,
                    "Eisenstein series: G_" + plan.eisensteinWeight() + "\n"));
            return b.toString();
        }
    }
}
