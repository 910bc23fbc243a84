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
                DirichletCharacter ratio = psi.multiply(phi).multiply(f.character().conjugate());
                boolean coprime = f.level() % p != 0;
                if (coprime && !CongruenceBounds.eisensteinDeterminantMatches(p, f.weight(), i, j)) {
                    problem = null; // the weights alone already contradict the determinant: reported as false
                } else if (coprime && !ratio.isTrivial() && ratio.order() % p != 0) {
                    characterMismatch.put(row, "ψφ = " + psi.multiply(phi).cell() + ", χ_f = "
                            + f.character().cell());
                } else {
                    problem = "the Sturm-type bound for an Eisenstein series with characters ψ, φ is not implemented"
                            + " (see docs/congruences.md)";
                    withCharacters.put(row, new DirichletCharacter[] {psi, phi});
                    need(f, p, Primes.CAP);
                }
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

        /** Rows with characters whose determinant fits: compared at the primes in the tables, never certified. */
        private final Map<TableRow, DirichletCharacter[]> withCharacters = new HashMap<>();

        /** Rows whose ψφ is not the form's character, with the reason. */
        private final Map<TableRow, String> characterMismatch = new HashMap<>();

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
         * a_ℓ ≡ ψ(ℓ)ℓ^i + φ(ℓ)ℓ^j mod 𝔭 at every prime ℓ ∤ pN in the tables, ψ(ℓ), φ(ℓ) reduced through the form's
         * zeta. Reports and returns true when it fails at every admissible prime above p (the claim is false).
         */
        private boolean compareWithCharacters(Claim c, DirichletCharacter psi, DirichletCharacter phi,
                                              FindingSink out) {
            Form f = c.f;
            long p = c.p;
            Residues.Store s = store(f, p);
            Set<Long> excluded = primesDividing(p, f.level());
            long x = s.complete(excluded);
            long worstAt = 0;
            String worstLeft = "";
            String worstRight = "";
            Residues.PrimeAbove worstPrime = null;
            boolean anyHolds = false;
            for (int k = 0; k < s.primes.size(); k++) {
                Residues.PrimeAbove pr = s.primes.get(k);
                if (c.prime != null && !pr.factor().equals(c.prime)) {
                    continue;
                }
                FiniteField field = pr.field();
                FiniteField.Element z;
                try {
                    z = f.zeta() == null ? null : Residues.reduce(f.zeta(), field);
                } catch (ArithmeticException e) {
                    continue;
                }
                long failAt = 0;
                String left = "";
                String right = "";
                for (int idx = 0; idx < s.ells.length && s.ells[idx] <= x; idx++) {
                    long ell = s.ells[idx];
                    if (excluded.contains(ell)) {
                        continue;
                    }
                    FiniteField.Element want = value(psi, ell, f, z, field)
                            .multiply(field.fromLong(Residues.powMod(ell, Math.floorMod(c.i, p - 1), p)))
                            .add(value(phi, ell, f, z, field)
                                    .multiply(field.fromLong(Residues.powMod(ell, Math.floorMod(c.j, p - 1), p))));
                    FiniteField.Element have = s.residue(k, idx);
                    if (!have.equals(want)) {
                        failAt = ell;
                        left = have.toString();
                        right = want.toString();
                        break;
                    }
                }
                if (failAt == 0) {
                    anyHolds = true;
                    break;
                }
                if (failAt > worstAt) {
                    worstAt = failAt;
                    worstLeft = left;
                    worstRight = right;
                    worstPrime = pr;
                }
            }
            if (anyHolds || worstPrime == null) {
                return false;
            }
            out.error(ID, c.row.at(), c.subject, "a_" + worstAt + "(" + f.id() + ") = ψ(" + worstAt + ")*" + worstAt
                            + "^" + c.i + " + φ(" + worstAt + ")*" + worstAt + "^" + c.j + " = " + worstRight + " mod "
                            + worstPrime, "a_" + worstAt + "(" + f.id() + ") = " + worstLeft,
                    "the congruence fails at l = " + worstAt + ", the first prime l not dividing "
                            + product(excluded) + " where the residues differ");
            return true;
        }

        /** ψ(ℓ) mod 𝔭: ζ^{e·m/r} with m = ord χ_f, r = ord ψ (±1 for r ≤ 2). */
        private static FiniteField.Element value(DirichletCharacter psi, long ell, Form f, FiniteField.Element z,
                                                 FiniteField field) {
            int e = psi.exponent(ell);
            if (e == 0) {
                return field.one();
            }
            if (psi.order() == 2) {
                return field.one().negate();
            }
            FiniteField.Element v = field.one();
            long power = (long) e * (f.character().order() / psi.order());
            for (long t = 0; t < power; t++) {
                v = v.multiply(z);
            }
            return v;
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
            String mismatch = characterMismatch.get(c.row);
            if (mismatch != null) {
                out.error(ID, c.row.at(), c.subject, "ψφ = χ_f", mismatch,
                        "the claim is false: ρ̄_f^ss ≅ ψω^i ⊕ φω^j gives det ρ̄_f = ψφω^(i+j), while det ρ̄_f = (χ_f mod"
                                + " 𝔭)ω^(k-1); p ∤ N and p ∤ ord(ψφχ̄_f), so ψφ ≠ χ_f stays different mod 𝔭");
                return;
            }
            DirichletCharacter[] chars = withCharacters.get(c.row);
            if (chars != null) {
                claimText = "a_l(" + f.id() + ") = ψ(l)*l^" + c.i + " + φ(l)*l^" + c.j + " mod a prime above " + p
                        + " (ψ = " + chars[0].cell() + ", φ = " + chars[1].cell() + ")";
            }
            if (chars != null && (reportIndexProblem(out, ID, c.row, c.subject, p, f)
                    || compareWithCharacters(c, chars[0], chars[1], out))) {
                return;
            }
            if (c.problem != null) {
                notCertified(out, ID, c.row, c.subject, "a certifiable congruence", claimText,
                        "not certified: " + c.problem);
                return;
            }
            if (!CongruenceBounds.eisensteinDeterminantMatches(p, f.weight(), c.i, c.j)) {
                out.error(ID, c.row.at(), c.subject, "k - 1 = i + j mod " + (p - 1),
                        "k=" + f.weight() + ", i=" + c.i + ", j=" + c.j,
                        "the claim is false: det of the mod-p representation of " + f.id() + " is omega^"
                                + (f.weight() - 1) + ", not omega^(i+j), so a_l differs from l^i + l^j at a positive "
                                + "density of primes (Chebotarev, Brauer–Nesbitt)");
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
