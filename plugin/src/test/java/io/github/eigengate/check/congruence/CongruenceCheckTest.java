package io.github.eigengate.check.congruence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Report;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code congruence} check on real data, each value from outside the project:
 * <ul>
 *   <li>congruences/level11-58.csv: a_ℓ of the weight-2 newforms of levels 11 and 58 (PARI/GP {@code ellap}, command in
 *   the file header and in congruences/gp/level11-58.gp). Both curves have a rational point of order 5, so
 *   a_ℓ ≡ 1 + ℓ ≡ each other mod 5 for ℓ ∤ 5·N; PARI/GP finds no ℓ ≤ 115000 where they differ mod 5, a_5 = 1 for
 *   both, and the first ℓ ∤ 7·11·58 where they differ mod 7 is ℓ = 13 (a_13 = 4 and −1 ≡ 6):
 *   {@code forprime(l=2,1000,if(l==7||l==11||l==2||l==29,next);if((ellap(E11,l)-ellap(E58,l))%7,print(l);break))}.</li>
 *   <li>reference/tau.csv (τ(n), n ≤ 1000, OEIS A000594, PARI/GP {@code ramanujantau}) and reference/level11.csv
 *   (level 11, n ≤ 1000, OEIS A006571, PARI/GP {@code ellan}): τ(ℓ) ≡ ℓ·a_ℓ(f11) mod 5 (both ρ̄ are
 *   ω ⊗ (1 ⊕ ω); checked for ℓ ≤ 1000 with PARI/GP
 *   {@code forprime(l=2,1000,if(l!=5&&l!=11&&(ramanujantau(l)-l*ellap(E,l))%5,print(l)))},
 *   no output) and τ(n) ≡ a_n(f11) mod 11 (Δ = η^24 ≡ η²(z)η²(11z) mod 11 since η^11(z) ≡ η(11z); from memory, and
 *   checked the same way for ℓ ≤ 1000, also τ(11) ≡ 1 = a_11).</li>
 *   <li>congruences/level23.csv: the orbit of level 23 over Q(x), x² − x − 1 (PARI/GP {@code mfcoefs}).</li>
 * </ul>
 */
class CongruenceCheckTest {

    static final String FORMS = "id,level,weight,field\ndelta,1,12,\nf11,11,2,\nf58,58,2,\nlev23,23,2,x^2 - x - 1\n";

    @TempDir
    Path dir;

    @Test
    void differentLevelsCertifiedWithTheDepletedSturmBound() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level11-58.csv"),
                "congruences.csv", "form,other,p\nf11,f58,5\n");
        assertEquals(List.of("data/congruences.csv:2: note [congruence] congruence=f11~f58 p=5: certified: "
                + "a_l(f11) = l^0*a_l(f58) mod a prime above 5 for every prime l not dividing 3190, having checked "
                + "every l <= B = 114840 (f♭ − g♭ (weight 2) on Γ0(407044), a_p compared too; Sturm, LNM 1240, "
                + "Thm 1)"), Datasets.lines(r));
        assertEquals(1, r.certificates().size());
        Certificate c = r.certificates().get(0);
        assertEquals("congruence-f11-f58-p5.txt", c.name());
        String text = c.text();
        assertTrue(text.contains("form: f11 (level 11, weight 2, field Q)\nother: f58 (level 58, weight 2, field Q)\n"
                + "p: 5\ntwist j: 0\nprime of f11: (5, x)\nprime of f58: (5, x)\n"), text);
        assertTrue(text.contains("route: DIRECT\nlevel M: 407044, index [SL2(Z):Gamma0(M)] = 689040\nweight W: 2\n"
                + "bound B = floor(W*index/12): 114840\nchecked: a_l for every prime l <= 114840 not dividing 3190, "
                + "and a_5\n"), text);
        assertTrue(text.contains("sha256 " + ClaimPass.sha256(dir.resolve("forms.csv")) + "  forms.csv\n"), text);
        assertTrue(text.contains("sha256 " + ClaimPass.sha256(dir.resolve("coefficients.csv"))
                + "  coefficients.csv\n"), text);
        assertEquals(64, ClaimPass.sha256(dir.resolve("forms.csv")).length());
    }

    @Test
    void differentLevelsFalseAtTheFirstPrime() {
        Report r = Runs.run(dir, "forms.csv", FORMS,
                "coefficients.csv", Runs.rows("congruences/level11-58.csv", "f11", n -> n < 200),
                "coefficients-58.csv", Runs.rows("congruences/level11-58.csv", "f58", n -> n < 200),
                "congruences.csv", "form,other,p\nf11,f58,7\n");
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=f11~f58 p=7: expected "
                + "a_13(f11) = 13^0*a_13(f58) = 6 mod (7, x) and (7, x), found a_13(f11) = 4; the congruence fails at "
                + "l = 13, the first prime l not dividing 4466 where the residues differ"), Datasets.lines(r));
        assertEquals(List.of(), r.certificates());
    }

    @Test
    void differentLevelsWithTooLittleDataAreNotCertified() {
        String forms = FORMS;
        String f11 = Runs.rows("congruences/level11-58.csv", "f11", n -> n <= 1000);
        String f58 = Runs.rows("congruences/level11-58.csv", "f58", n -> n <= 1000);
        String line = "data/congruences.csv:2: %s [congruence] congruence=f11~f58 p=5: expected a_l for every prime "
                + "l <= B = 114840, found the tables stop at l = 997; not certified: the congruence holds for every "
                + "l <= 997 in the tables, but Sturm's bound needs l <= 114840 (f♭ − g♭ (weight 2) on Γ0(407044), a_p "
                + "compared too; Sturm, LNM 1240, Thm 1)";
        Report r = Runs.run(dir, "forms.csv", forms, "coefficients.csv", f11, "coefficients-58.csv", f58,
                "congruences.csv", "form,other,p\nf11,f58,5\n");
        assertEquals(List.of(String.format(line, "error")), Datasets.lines(r));
        Report warn = Runs.run(dir, true, "forms.csv", forms);
        assertEquals(List.of(String.format(line, "warning")), Datasets.lines(warn));
        assertEquals(0, warn.errors());
    }

    @Test
    void differentWeightsUpToATwistCertified() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist\ndelta,f11,5,1\ndelta,f11,11,\n");
        assertEquals(List.of("data/congruences.csv:2: note [congruence] congruence=delta~f11 p=5 j=1: certified: "
                        + "a_l(delta) = l^1*a_l(f11) mod a prime above 5 for every prime l not dividing 55, having "
                        + "checked every l <= B = 198 (θ^1 f♭ − θ^2 g♭ (weights 18, 14, brought to 18 by E_4) on "
                        + "Γ0(121); Sturm, LNM 1240, Thm 1)",
                "data/congruences.csv:3: note [congruence] congruence=delta~f11 p=11: certified: a_l(delta) = "
                        + "l^0*a_l(f11) mod a prime above 11 for every prime l not dividing 11, having checked every "
                        + "l <= B = 12 (f♭ − g♭ (weights 12, 2, brought to 12 by E_10) on Γ0(11), a_p compared too; "
                        + "Sturm, LNM 1240, Thm 1)"), Datasets.lines(r));
        assertEquals(List.of("congruence-delta-f11-p5-j1.txt", "congruence-delta-f11-p11.txt"),
                r.certificates().stream().map(Certificate::name).toList());
        String text = r.certificates().get(0).text();
        assertTrue(text.contains("twist j: 1\n"), text);
        assertTrue(text.contains("route: THETA\nlevel M: 121, index [SL2(Z):Gamma0(M)] = 132\nweight W: 18\n"
                + "bound B = floor(W*index/12): 198\nchecked: a_l for every prime l <= 198 not dividing 55\n"), text);
    }

    @Test
    void differentWeightsFalseTwistAndFalseDeterminant() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist\ndelta,f11,5,3\ndelta,f11,5,0\n");
        // τ(2) = −24 ≡ 1 and 2^3·a_2 = 8·(−2) = −16 ≡ 4 mod 5 (values of the fixtures)
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=delta~f11 p=5 j=3: expected "
                        + "a_2(delta) = 2^3*a_2(f11) = 4 mod (5, x) and (5, x), found a_2(delta) = 1; the congruence "
                        + "fails at l = 2, the first prime l not dividing 55 where the residues differ"
                        // τ(l) ≡ l(1 + l) ≡ l·a_l(f11) mod 5, so twist 1 holds (diagnosis)
                        + "; it holds for every tabulated l <= 286 with twist j = 1 instead (mod (5, x) and (5, x))",
                "data/congruences.csv:3: error [congruence] congruence=delta~f11 p=5: expected k_f = k_g + 2j mod 4, "
                        + "found k_f=12, k_g=2, j=0; the congruence is false: det of the mod-p representation of delta "
                        + "is omega^11 but that of f11 twisted by omega^0 is omega^1, so traces differ at a positive "
                        + "density of primes (Chebotarev, Brauer–Nesbitt)"), Datasets.lines(r));
    }

    @Test
    void differentWeightsWithTooLittleData() {
        Report r = Runs.run(dir, "forms.csv", FORMS,
                "coefficients.csv", Runs.rows("reference/tau.csv", "delta", n -> n <= 150),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist\ndelta,f11,5,1\n");
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=delta~f11 p=5 j=1: expected a_l "
                + "for every prime l <= B = 198, found the tables stop at l = 150; not certified: the congruence holds "
                + "for every l <= 150 in the tables, but Sturm's bound needs l <= 198 (θ^1 f♭ − θ^2 g♭ (weights 18, "
                + "14, brought to 18 by E_4) on Γ0(121); Sturm, LNM 1240, Thm 1)"), Datasets.lines(r));
    }

    @Test
    void aMissingPrimeStopsTheData() {
        // τ(7) removed: the tables are complete only up to 6
        Report r = Runs.run(dir, "forms.csv", FORMS,
                "coefficients.csv", Runs.rows("reference/tau.csv", "delta", n -> n != 7),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist\ndelta,f11,5,1\n");
        assertTrue(Datasets.lines(r).get(0).contains("found the tables stop at l = 6;"), Datasets.lines(r).get(0));
    }

    @Test
    void residueFieldsOfDegreeTwoAreIdentifiedBySearch() {
        // 2 is inert in Q(x), x^2 − x − 1 ≡ x^2 + x + 1 mod 2: residue field F_4, two identifications (x -> x is the
        // one under which a_2 agrees). M = 23², m = 552, W = 2 (p = 2, DIRECT): B = 92.
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "congruences.csv", "form,other,p\nlev23,lev23,2\n");
        assertEquals(List.of("data/congruences.csv:2: note [congruence] congruence=lev23~lev23 p=2: found the primes "
                        + "(2, x^2 + x + 1) and (2, x^2 + x + 1) with the residue fields identified inside "
                        + "F_2[x]/(x^2 + x + 1) by x_lev23 -> x, x_lev23 -> x under which the congruence holds for "
                        + "every l <= 92 in the tables",
                "data/congruences.csv:2: note [congruence] congruence=lev23~lev23 p=2: certified: a_l(lev23) = "
                        + "l^0*a_l(lev23) mod a prime above 2 for every prime l not dividing 46, having checked every "
                        + "l <= B = 92 (f♭ − g♭ (weight 2) on Γ0(529), a_p compared too; Sturm, LNM 1240, Thm 1)"),
                Datasets.lines(r));
        assertTrue(r.certificates().get(0).text().contains("identification: the residue fields identified inside "
                + "F_2[x]/(x^2 + x + 1) by x_lev23 -> x, x_lev23 -> x\n"));
    }

    @Test
    void theSearchFindsTheFrobeniusIdentification() {
        // lev23c is the same orbit written with the conjugate root 1 − x (congruences/level23-conjugate.csv, PARI/GP
        // command in its header). Mod 2 (residue field F_4) only x -> x + 1 matches a_2: −x against x − 1 ≡ x + 1.
        // Mod 11, x ≡ 8 at (11, x + 3) is 1 − x ≡ 4 at (11, x + 7) for lev23c; at (11, x + 3) for both,
        // a_2(lev23) = −x ≡ 3 against a_2(lev23c) = x − 1 ≡ 7 at x ≡ 8 (PARI/GP: factormod(x^2-x-1,11)).
        String forms = FORMS + "lev23c,23,2,x^2 - x - 1\n";
        Report r = Runs.run(dir, "forms.csv", forms, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "coefficients-c.csv", Runs.all("congruences/level23-conjugate.csv"),
                "congruences.csv", "form,other,p,twist,prime,other_prime\nlev23,lev23c,2,,,\n"
                        + "lev23,lev23c,11,,x + 3,x + 7\nlev23,lev23c,11,,x + 3,x + 3\n");
        assertEquals(List.of("data/congruences.csv:2: note [congruence] congruence=lev23~lev23c p=2: found the primes "
                        + "(2, x^2 + x + 1) and (2, x^2 + x + 1) with the residue fields identified inside "
                        + "F_2[x]/(x^2 + x + 1) by x_lev23 -> x, x_lev23c -> x + 1 under which the congruence holds for "
                        + "every l <= 92 in the tables",
                "data/congruences.csv:2: note [congruence] congruence=lev23~lev23c p=2: certified: a_l(lev23) = "
                        + "l^0*a_l(lev23c) mod a prime above 2 for every prime l not dividing 46, having checked every "
                        + "l <= B = 92 (f♭ − g♭ (weight 2) on Γ0(529), a_p compared too; Sturm, LNM 1240, Thm 1)",
                "data/congruences.csv:3: note [congruence] congruence=lev23~lev23c p=11: certified: a_l(lev23) = "
                        + "l^0*a_l(lev23c) mod a prime above 11 for every prime l not dividing 253, having checked "
                        + "every l <= B = 92 (f♭ − g♭ (weight 2) on Γ0(529), a_p compared too; Sturm, LNM 1240, "
                        + "Thm 1)",
                "data/congruences.csv:4: error [congruence] congruence=lev23~lev23c p=11: expected a_2(lev23) = "
                        + "2^0*a_2(lev23c) = 7 mod (11, x + 3) and (11, x + 3), found a_2(lev23) = 3; the congruence "
                        + "fails at l = 2, the first prime l not dividing 253 where the residues differ; it holds for every tabulated l <= 97 modulo "
                        + "(11, x + 3) and (11, x + 7) instead"),
                Datasets.lines(r));
    }

    @Test
    void aRationalFormAgainstADegreeTwoResidueField() {
        // lev23 mod 11 splits: x ≡ 8 at (11, x + 3), x ≡ 4 at (11, x + 7). f11 mod 11 against lev23: a_2(f11) = −2,
        // a_2(lev23) = −x ≡ 3 or 7: no identification works, and the one that holds longest fails first at l = 2
        // (both fail there).
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist,prime,other_prime\nlev23,f11,11,0,x + 3,x\n");
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=lev23~f11 p=11: expected "
                + "a_2(lev23) = 2^0*a_2(f11) = 9 mod (11, x + 3) and (11, x), found a_2(lev23) = 3; the congruence "
                + "fails at l = 2, the first prime l not dividing 253 where the residues differ"), Datasets.lines(r));
    }

    @Test
    void aRationalFormEmbeddedInTheResidueFieldF4() {
        // mod 2, lev23 has residue field F_4 and f11 has F_2: a_l(lev23) = u + v x must have v even and u ≡ a_l(f11).
        // PARI/GP (the loop of congruences/gp/level23.gp with E = ellinit([0,-1,1,-10,-20])):
        //   forprime(l=2,1200,if(l==2||l==11||l==23,next);a=lift(v[l+1]);if(polcoef(a,1,y)%2||(polcoef(a,0,y)
        //   -ellap(E,l))%2,print(l);break))  prints 5 (a_5(lev23) = -2y, a_5(f11) = 1).
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p\nlev23,f11,2\n");
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=lev23~f11 p=2: expected "
                + "a_5(lev23) = 5^0*a_5(f11) = 1 in F_2[x]/(x^2 + x + 1) mod (2, x^2 + x + 1) and (2, x), found "
                + "a_5(lev23) = 0 in F_2[x]/(x^2 + x + 1); the congruence fails at l = 5, the first prime l not "
                + "dividing 506 where the residues differ"), Datasets.lines(r));
    }

    @Test
    void malformedCellsAreTableFormatFindings() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "congruences.csv", "form,other,p,twist,prime,other_prime\n"
                        + "none,f11,4,x,,\n"
                        + "f11,f58,5,,x+1,\n"
                        + "lev23,f11,11,,x^2+1,\n"
                        + "lev23,f11,2147483659,,,\n");
        assertEquals(List.of(
                "data/congruences.csv:2:1: error [table-format] congruence=none~f11 p=4: expected a form id from "
                        + "forms.csv, found none; no form with this id is declared; the row is skipped",
                "data/congruences.csv:2:3: error [table-format] congruence=none~f11 p=4: expected a prime p with 2 <= "
                        + "p < 2^31, found 4; 4 is not prime",
                "data/congruences.csv:2:4: error [table-format] congruence=none~f11 p=4: expected an integer in "
                        + "[-10^12, 10^12], found x; 'twist' must be a decimal integer",
                "data/congruences.csv:3:5: error [table-format] congruence=f11~f58 p=5: expected a monic irreducible "
                        + "factor of x mod 5: x, found x+1; x + 1 mod 5 is not one of these factors of the field "
                        + "polynomial of f11",
                "data/congruences.csv:4:5: error [table-format] congruence=lev23~f11 p=11: expected a monic "
                        + "irreducible factor of x^2 + 10*x + 10 mod 11: x + 3 or x + 7, found x^2+1; x^2 + 1 mod 11 "
                        + "is not one of these factors of the field polynomial of lev23",
                "data/congruences.csv:5:3: error [table-format] congruence=lev23~f11 p=2147483659: expected a prime p "
                        + "with 2 <= p < 2^31, found 2147483659; 'p' must be a decimal prime below 2^31"),
                Datasets.lines(r));
    }

    @Test
    void anIndexDivisibleByPIsAnErrorNotACrash() {
        // Z[x]/(x^2 + 3) has index 2 in the ring of integers of Q(sqrt(-3)) (Dedekind's criterion at 2), so the
        // factors of x^2 + 3 mod 2 do not name the primes above 2. No coefficient is needed to see this.
        Report r = Runs.run(dir, "forms.csv", "id,level,weight,field\ng,7,2,x^2 + 3\nf11,11,2,\n",
                "congruences.csv", "form,other,p\ng,f11,2\n");
        List<String> lines = Datasets.lines(r);
        assertEquals(1, lines.size());
        assertTrue(lines.get(0).startsWith("data/congruences.csv:2: error [congruence] congruence=g~f11 p=2: expected "
                + "primes above 2 named by factors of x^2 + 3 mod 2, found an index divisible by 2; not supported: 2 "
                + "divides the index"), lines.get(0));
    }

    @Test
    void registeredInTheDefaultGate() {
        // the full gate (every check); only the lines of the two congruence checks are asserted
        Datasets.write(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"),
                "coefficients-11.csv", Runs.all("reference/level11.csv"),
                "congruences.csv", "form,other,p,twist\ndelta,f11,5,3\n", "reducible.csv", "form,p,i,j\nf11,7,0,1\n");
        Report r = Datasets.run(dir);
        assertTrue(r.checks().containsAll(List.of(CongruenceCheck.ID, ReducibleCheck.ID)), r.checks().toString());
        assertEquals(List.of("data/congruences.csv:2: error [congruence] congruence=delta~f11 p=5 j=3: expected "
                        + "a_2(delta) = 2^3*a_2(f11) = 4 mod (5, x) and (5, x), found a_2(delta) = 1; the congruence "
                        + "fails at l = 2, the first prime l not dividing 55 where the residues differ"
                        // τ(l) ≡ l(1 + l) ≡ l·a_l(f11) mod 5, so twist 1 holds (diagnosis)
                        + "; it holds for every tabulated l <= 286 with twist j = 1 instead (mod (5, x) and (5, x))",
                "data/reducible.csv:2: error [reducible] reducible=f11 p=7 i=0 j=1: expected a_2(f11) = 2^0 + 2^1 = 3 "
                        + "mod (7, x), found a_2(f11) = 5; the congruence fails at l = 2, the first prime l not "
                        + "dividing 77 where the residues differ"),
                Datasets.lines(r).stream().filter(l -> l.contains("[congruence]") || l.contains("[reducible]"))
                        .toList());
    }

    @Test
    void noClaimsNoFindings() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"));
        assertEquals(List.of(), Datasets.lines(r));
    }
}
