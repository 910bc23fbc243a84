package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Forms with a nontrivial character: the dataset datasets/characters (fixtures-gp/characters.gp, PARI/GP 2.15.2:
 * mfeigenbasis(mfinit([N,k,[znstar(N,1),chi]],0)), orders 2, 3, 4, 6, 8, two generators, odd weight, weight 1) passes
 * (RealDatasetsTest); each planted error below fails, naming file, line, form and n.
 */
class CharactersTest {

    static final String COEFFS = "datasets/characters/coefficients.csv";

    @TempDir
    Path dir;

    private List<String> run(Fixture f) throws IOException {
        String forms = Files.readString(Fixture.dataset("characters").resolve("forms.csv"));
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", f.text());
        return Datasets.errors(Datasets.run(dir));
    }

    private static String has(List<String> errors, String prefix) {
        return errors.stream().filter(e -> e.startsWith(prefix)).findFirst()
                .orElseThrow(() -> new AssertionError("no finding " + prefix + "\n" + String.join("\n", errors)));
    }

    @Test
    void wrongCharacterValueInAPrimeSquare() throws IOException {
        // lev13_wt2_chi6_o1: K = Q(ζ6) = Q[x]/(x^2 - x + 1), zeta = x, χ(2) = x (2:2/12). PARI: a_2 = -x - 1,
        // a_4 = x = a_2^2 - χ(2)*2 (a_2^2 = 3x mod x^2 - x + 1). Planted: a_4 written with χ̄(2) = 1 - x instead,
        // a_2^2 - (1 - x)*2 = 5*x - 2.
        Fixture f = Fixture.of(COEFFS);
        String form = "lev13_wt2_chi6_o1";
        assertEquals("-x - 1", f.valueOf(form, 2));
        assertEquals("x", f.valueOf(form, 4));
        f.plant(form, 4, "5*x - 2");
        List<String> errors = run(f);
        String e = has(errors, "data/coefficients.csv:" + f.lineOf(form, 4) + ": error [hecke-relations] form=" + form
                + " n=4: expected x, found 5*x - 2; ");
        assertTrue(e.contains("χ(p) p^(k-1)"), e);
    }

    @Test
    void coefficientReplacedByItsComplexConjugate() throws IOException {
        // lev13_wt2_chi6_o1: a_3 = 2*x - 2 (PARI); χ(3) = zeta^4 = -x (3 = 2^4 mod 13), of order 3, so
        // conj(a_3) = χ̄(3) a_3 = x^2 (2x - 2) = (x - 1)(2x - 2) = -2*x (mod x^2 - x + 1); then
        // χ̄(3)·(-2x)^2 = (x - 1)·4x^2 = 4(x - 1)^2 = -4x has conjugates -4ζ6^{±1}, not real
        Fixture f = Fixture.of(COEFFS);
        String form = "lev13_wt2_chi6_o1";
        assertEquals("2*x - 2", f.valueOf(form, 3));
        f.plant(form, 3, "-2*x");
        List<String> errors = run(f);
        assertTrue(errors.contains("data/coefficients.csv:" + f.lineOf(form, 3) + ": error [ramanujan-bound] form="
                + form + " n=3: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 12], found "
                + "a_p = -2*x, χ(p) = -x, χ̄(p)*a_p^2 with characteristic polynomial x^2 + 4*x + 16; χ̄(p)*a_p^2 is"
                + " not real and >= 0 in every embedding, so conj(a_p) = χ̄(p)*a_p fails at p=3 (is a_p replaced by"
                + " its complex conjugate, or χ(p) wrong?)"), String.join("\n", errors));
    }

    @Test
    void ramanujanViolationInOnePairOfEmbeddingsOnly() throws IOException {
        // lev13_wt3_chi4_o1, K = Q[x]/(x^4 + 2x^2 - 20x + 26) = Q(i, √10), a CM field. a_2 is multiplied by the
        // totally real unit r = 3 + √10, which keeps conj(a_2) = χ̄(2) a_2 but makes |a_2|^2 = 25.65 > 16 in one pair
        // of embeddings and 0.35 in the other (gp: Q = y^4 + 2*y^2 - 20*y + 26; s = nfroots(Q, x^2 - 10);
        // r = Mod(3 + lift(s[2]), Q) = 1/7*y^3 - 1/7*y^2 - 4/7*y + 5/7; lift(r * a_2) = 2/21*y^3 + 5/21*y^2 - 5/7*y
        // + 17/21; |.|^2 over polroots(Q) = 0.3509, 0.3509, 25.649, 25.649)
        Fixture f = Fixture.of(COEFFS);
        String form = "lev13_wt3_chi4_o1";
        assertEquals("-4/21*x^3 - 10/21*x^2 - 11/7*x + 29/21", f.valueOf(form, 2));
        f.plant(form, 2, "2/21*x^3 + 5/21*x^2 - 5/7*x + 17/21");
        List<String> errors = run(f);
        String e = has(errors, "data/coefficients.csv:" + f.lineOf(form, 2) + ": error [ramanujan-bound] form="
                + form + " n=2: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 16], found a_p = "
                + "2/21*x^3 + 5/21*x^2 - 5/7*x + 17/21, χ(p) = ");
        assertTrue(e.endsWith("; Deligne's bound |a_p| <= 2 p^((k-1)/2) fails in some complex embedding at p=2"), e);
    }

    /** Each malformed character or zeta cell is a table-format error with file, line, column and what was expected. */
    @Test
    void malformedCharacterCells() {
        String forms = String.join("\n",
                "id,level,weight,character,field,zeta",
                "notgen,13,2,4:1/6,x^2 - x + 1,x",             // 4 = 2^2 generates only the squares mod 13
                "inconsistent,13,2,2:1/6;4:1/6,x^2 - x + 1,x", // χ(4) must be χ(2)^2
                "order,13,2,2:1/5,x^2 - x + 1,x",              // 2 has order 12 mod 13: ζ5^12 ≠ 1
                "nozeta,13,2,2:2/12,x^2 - x + 1,",
                "smallzeta,13,2,2:2/12,x^2 - x + 1,x - 1",     // x - 1 = ζ6^2 has order 3
                "notroot,13,2,2:2/12,x^2 - x + 1,x + 1",
                "zetaquad,7,3,3:1/2,,-1",
                "ratfield,13,2,2:2/12,,",
                "parity,7,2,3:1/2,,",                          // χ = (−7/·) is odd, the weight even
                "nonunit,21,2,3:1/2;2:1/6,x^2 - x + 1,x",
                "trivialodd,11,3,,,",
                "");
        List<String> errors = Datasets.errors(Datasets.run(Datasets.write(dir, "forms.csv", forms)));
        assertEquals(List.of(
                "data/forms.csv:2:4: error [table-format] form=notgen: expected empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^×, found 4:1/6; the generators do not generate (Z/13Z)^×: they reach 6 of its 12 elements",
                "data/forms.csv:3:4: error [table-format] form=inconsistent: expected empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/6;4:1/6; the values are not those of a character: two products of the generators equal 4 mod 13 but get different values",
                "data/forms.csv:4:4: error [table-format] form=order: expected empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/5; χ(2) = exp(2πi·1/5) has order 5, which does not divide the order 12 of 2 mod 13",
                "data/forms.csv:5:6: error [table-format] form=nozeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found an empty cell; the cell is empty: a character of order 6 > 2 needs zeta, which fixes how Q(χ) lies in the field (χ(g) = zeta^(a·m/b) for g:a/b)",
                "data/forms.csv:6:6: error [table-format] form=smallzeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found x - 1; Φ_6(zeta) = -2*x + 2 ≠ 0: zeta is not a root of unity of order 6 (it is a root of unity of smaller order)",
                "data/forms.csv:7:6: error [table-format] form=notroot: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found x + 1; Φ_6(zeta) = 2*x ≠ 0: zeta is not a root of unity of order 6",
                "data/forms.csv:8:6: error [table-format] form=zetaquad: expected an empty cell (χ has order 2, its values are ±1), found -1; zeta is given only for a character of order m > 2, where it fixes how Q(χ) lies in the coefficient field",
                "data/forms.csv:9:6: error [table-format] form=ratfield: expected a field containing Q(χ) = Q(ζ_6), found an empty cell; the coefficients are rational (no field), but Q has no root of unity of order 6: χ of order 6 needs a coefficient field containing its values, and zeta in it",
                "data/forms.csv:10:3: error [table-format] form=parity: expected an odd weight, found 2; S_k(N, χ) = 0: χ(−1) = −1 but (−1)^k = 1, and −I acts on S_k(N, χ) as χ(−1)(−1)^k",
                "data/forms.csv:11:4: error [table-format] form=nonunit: expected empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^×, found 3:1/2;2:1/6; 3 is not a unit g with 1 < g < 21",
                "data/forms.csv:12:3: error [table-format] form=trivialodd: expected an even weight, found 3; with the trivial character there are no forms of odd weight (−I ∈ Γ0(N) acts as (−1)^k)"), errors);
    }

    /**
     * Li's trichotomy at p | N on PARI/GP forms: lev9_wt4_chi3_o1 (cond χ = 9 = N: |a_3|^2 = 27, PARI a_3 = -3*x);
     * lev10_wt3_chi4_o1 (2 ‖ 10, cond χ = 5: a_2^2 = χ'(2)*2 = 2*x with PARI a_2 = -x - 1; planted x - 1, whose
     * square -2*x is χ̄'(2)*2); lev20_wt3_chi4_o1 (4 | 20, cond χ = 5: a_2 = 0).
     */
    @Test
    void primesDividingTheLevelWithACharacter() throws IOException {
        Fixture f = Fixture.of(COEFFS);
        assertEquals("-3*x", f.valueOf("lev9_wt4_chi3_o1", 3));
        assertEquals("-x - 1", f.valueOf("lev10_wt3_chi4_o1", 2));
        assertEquals("0", f.valueOf("lev20_wt3_chi4_o1", 2));
        f.plant("lev9_wt4_chi3_o1", 3, "-3*x + 1").plant("lev10_wt3_chi4_o1", 2, "x - 1")
                .plant("lev20_wt3_chi4_o1", 2, "1");
        List<String> errors = run(f).stream().filter(e -> e.contains("[level-primes]")).toList();
        assertEquals(List.of(
                "data/coefficients.csv:" + f.lineOf("lev9_wt4_chi3_o1", 3) + ": error [level-primes] form=lev9_wt4_chi3_o1 n=3: expected |a_p|^2 = p^(k-1) = 27 in every embedding, found -3*x + 1, a_p + p^(k-1)/a_p with characteristic polynomial x^4 + 1333/314*x^3 - 99615/628*x^2 - 106439/314*x + 4301203/628; |a_p| = p^((k-1)/2) when the p-part of cond(χ) is that of N (p=3, N=9, cond(χ)=9; Li 1975, Thm 3(iii))",
                "data/coefficients.csv:" + f.lineOf("lev10_wt3_chi4_o1", 2) + ": error [level-primes] form=lev10_wt3_chi4_o1 n=2: expected a_p^2 = χ'(p)*p^(k-2) = 2*x, found a_p^2 = -2*x; a_p^2 = χ'(p) p^(k-2), χ' the prime-to-p part of χ, when p exactly divides N but not cond(χ) (p=2, N=10, cond(χ)=5; Li 1975, Thm 3(i))",
                "data/coefficients.csv:" + f.lineOf("lev20_wt3_chi4_o1", 2) + ": error [level-primes] form=lev20_wt3_chi4_o1 n=2: expected 0, found 1; a_p = 0 when p^2 divides N and the p-part of cond(χ) is smaller than that of N (p=2, N=20, cond(χ)=5; Li 1975, Thm 3(ii))"), errors);
    }

    /**
     * Congruences between forms with a character (PARI/GP data of datasets/characters): lev13_wt2_chi6_o1 with
     * itself mod 7 at one prime above 7 is certified (one character, p ∤ 13·6, M = 13², B = ⌊2·182/12⌋ = 30); at the
     * two different primes (7, x + 4) and (7, x + 2) above 7 (the roots 3 and 5 of x^2 - x + 1 mod 7, so ζ6 reduces
     * to 3 and to 5) the characters reduce differently and the claim is false; lev13 and lev21 mod 5 have characters
     * of order 6 with conductors 13 and 21, which stay different mod every prime above 5 (5 ∤ 6), so that claim is
     * false from the determinant alone. A real congruence between weights 2 and 8 with the same character: lev13_wt8_chi6_o1 (the orbit
     * of degree 14 of S_8(13, χ)) ≡ lev13_wt2_chi6_o1 mod (7, x + 2) and (7, x + 4), where both zetas reduce to 3
     * (PARI/GP 2.15.2, with fixtures-gp/lib.gp and lib-characters.gp read, B = 150: f = ch_form(13,2,[2],1);
     * g = ch_form(13,8,[2],1); factormod(g[4], 7) has the factors x + 2 (ζ_g ≡ 3) and x + 4 (ζ_g ≡ 5); every prime
     * l <= 150, l ≠ 7, 13, has Mod(subst(f[5][l],'x,3),7) == Mod(subst(g[5][l],'x,-2),7)). It is certified (B = ⌊8·182/12⌋
     * = 121); at (7, x + 4) for g the zetas differ (3 vs 5), so the claim is false.
     */
    @Test
    void congruencesWithACharacter() throws IOException {
        Path src = Fixture.dataset("characters");
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv",
                Files.readString(src.resolve("coefficients.csv")), "congruences.csv", String.join("\n",
                        "form,other,p,twist,prime,other_prime",
                        "lev13_wt2_chi6_o1,lev13_wt2_chi6_o1,7,0,x + 4,x + 4",
                        "lev13_wt2_chi6_o1,lev13_wt2_chi6_o1,7,0,x + 4,x + 2",
                        "lev13_wt2_chi6_o1,lev21_wt2_chi6_o1,5,0,,",
                        "lev13_wt2_chi6_o1,lev13_wt8_chi6_o1,7,0,x + 4,x + 2",
                        "lev13_wt2_chi6_o1,lev13_wt8_chi6_o1,7,0,x + 4,x + 4", ""));
        List<String> lines = Datasets.lines(Datasets.run(dir)).stream().filter(l -> l.contains("[congruence]"))
                .toList();
        assertEquals(List.of(
                "data/congruences.csv:2: note [congruence] congruence=lev13_wt2_chi6_o1~lev13_wt2_chi6_o1 p=7: certified: a_l(lev13_wt2_chi6_o1) = l^0*a_l(lev13_wt2_chi6_o1) mod a prime above 7 for every prime l not dividing 91, having checked every l <= B = 30 (f♭ − g♭ (weight 2) on Γ0(169), a_p compared too; Sturm, LNM 1240, Thm 1)",
                "data/congruences.csv:3: error [congruence] congruence=lev13_wt2_chi6_o1~lev13_wt2_chi6_o1 p=7: expected an identification of residue fields with (χ_f mod 𝔭)ω^(k_f-1) = (χ_g mod 𝔭)ω^(k_g-1+2j), found none at the primes above 7; the congruence is false: under every choice of primes above 7 the determinants differ, det ρ̄_f = (χ_f mod 𝔭)ω^(k_f-1) against det(ρ̄_g ⊗ ω^j) = (χ_g mod 𝔭)ω^(k_g-1+2j) on the units mod 91 (Chebotarev, Brauer–Nesbitt)",
                "data/congruences.csv:4: error [congruence] congruence=lev13_wt2_chi6_o1~lev21_wt2_chi6_o1 p=5: expected an identification of residue fields with (χ_f mod 𝔭)ω^(k_f-1) = (χ_g mod 𝔭)ω^(k_g-1+2j), found none at the primes above 5; the congruence is false: under every choice of primes above 5 the determinants differ, det ρ̄_f = (χ_f mod 𝔭)ω^(k_f-1) against det(ρ̄_g ⊗ ω^j) = (χ_g mod 𝔭)ω^(k_g-1+2j) on the units mod 1365 (Chebotarev, Brauer–Nesbitt)",
                "data/congruences.csv:5: note [congruence] congruence=lev13_wt2_chi6_o1~lev13_wt8_chi6_o1 p=7: certified: a_l(lev13_wt2_chi6_o1) = l^0*a_l(lev13_wt8_chi6_o1) mod a prime above 7 for every prime l not dividing 91, having checked every l <= B = 121 (f♭ − g♭ (weights 2, 8, brought to 8 by E_6) on Γ0(169), a_p compared too; Sturm, LNM 1240, Thm 1)",
                "data/congruences.csv:6: error [congruence] congruence=lev13_wt2_chi6_o1~lev13_wt8_chi6_o1 p=7: expected an identification of residue fields with (χ_f mod 𝔭)ω^(k_f-1) = (χ_g mod 𝔭)ω^(k_g-1+2j), found none at the primes above 7; the congruence is false: under every choice of primes above 7 the determinants differ, det ρ̄_f = (χ_f mod 𝔭)ω^(k_f-1) against det(ρ̄_g ⊗ ω^j) = (χ_g mod 𝔭)ω^(k_g-1+2j) on the units mod 91 (Chebotarev, Brauer–Nesbitt)"), lines);
    }

    /**
     * Eisenstein rows with characters ψ, φ (columns psi, phi) for lev13_wt2_chi6_o1 (χ = 2:2/12 of order 6) mod 7:
     * ψφ = 1 ≠ χ is false (7 ∤ 13·6); ψ = χ, φ = 1 meets the determinant but fails at ℓ = 2 (PARI a_2 = -x - 1 ≡ 3
     * mod (7, x + 4), while χ(2) + 2 = x + 2 ≡ 5); k − 1 = 1 ≢ i + j = 0 mod 6 is false; a malformed ψ and one of order 4 are table-format errors.
     */
    @Test
    void eisensteinRowsWithCharacters() throws IOException {
        Path src = Fixture.dataset("characters");
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv",
                Files.readString(src.resolve("coefficients.csv")), "reducible.csv", String.join("\n",
                        "form,p,i,j,prime,psi,phi",
                        "lev13_wt2_chi6_o1,7,0,1,x + 4,,",
                        "lev13_wt2_chi6_o1,7,0,1,x + 4,2:2/12,",
                        "lev13_wt2_chi6_o1,7,0,0,x + 4,2:2/12,",
                        "lev13_wt2_chi6_o1,7,0,1,x + 4,4:1/6,",
                        "lev13_wt2_chi6_o1,7,0,1,x + 4,2:1/4,", ""));
        List<String> lines = Datasets.lines(Datasets.run(dir)).stream()
                .filter(l -> l.contains("[reducible]") || l.contains("reducible.csv")).toList();
        assertEquals(List.of(
                "data/reducible.csv:2: error [reducible] reducible=lev13_wt2_chi6_o1 p=7 i=0 j=1: expected a prime above 7 with (χ_f mod 𝔭)ω^(k-1) = (ψφ mod 𝔭)ω^(i+j), found none (χ_f = 2:1/6, ψφ = 1); the claim is false: ρ̄_f^ss ≅ ψω^i ⊕ φω^j gives det ρ̄_f = ψφω^(i+j), while det ρ̄_f = (χ_f mod 𝔭)ω^(k-1), and the two differ on the units mod 91 at every prime above 7 (Chebotarev, Brauer–Nesbitt)",
                "data/reducible.csv:3: error [reducible] reducible=lev13_wt2_chi6_o1 p=7 i=0 j=1: expected a_2(lev13_wt2_chi6_o1) = ψ(2)*2^0 + φ(2)*2^1 = 5 mod (7, x + 4), found a_2(lev13_wt2_chi6_o1) = 3; the congruence fails at l = 2, the first prime l not dividing 91 where the residues differ",
                "data/reducible.csv:4: error [reducible] reducible=lev13_wt2_chi6_o1 p=7 i=0 j=0: expected k - 1 = i + j mod 6, found k=2, i=0, j=0; the claim is false: det of the mod-p representation of lev13_wt2_chi6_o1 is (χ_f mod 𝔭)omega^1, not (ψφ mod 𝔭)omega^(i+j) (p does not divide N, so the characters are unramified at p and the powers of omega must agree), so a_l differs from the claim at a positive density of primes (Chebotarev, Brauer–Nesbitt)",
                "data/reducible.csv:5:6: error [table-format] reducible=lev13_wt2_chi6_o1 p=7: expected empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^× (a character mod N = 13), found 4:1/6; the generators do not generate (Z/13Z)^×: they reach 6 of its 12 elements",
                "data/reducible.csv:6:6: error [table-format] reducible=lev13_wt2_chi6_o1 p=7: expected a character whose order divides that of χ_f (6), so its values lie in the form's field, found 2:1/4; its order is 4"), lines);
    }

    /**
     * Serre weights of forms with a character at p ∤ N: the character is unramified at p, so ρ̄|I_p is the same as
     * with the trivial character and k(ρ̄) follows the same recipe (Serre 1987, §2; Edixhoven 1992, Thm 2.5, 2.6).
     * lev7_wt3_chi2_o1 has a_5 = 0 (PARI; 5 is inert in Q(√−7)): ρ̄|I_5 ≅ ω₂^2 ⊕ ω₂^10, k(ρ̄) = 1 + 2 = 3, so the
     * claim 5 fails; lev13_wt2_chi6_o1 has a_7 = 0 (supersingular, k(ρ̄) = 2) and is ordinary at 5 (k(ρ̄) = 2).
     */
    @Test
    void serreWeightsOfFormsWithACharacter() throws IOException {
        assertEquals(List.of(), weightFindings(String.join("\n", "form,p,prime,local,serre_weight",
                "lev7_wt3_chi2_o1,5,,,3",
                "lev13_wt2_chi6_o1,7,x + 4,,2",
                "lev13_wt2_chi6_o1,5,x^2 + 4*x + 1,nonsplit,2", "")));
        assertEquals(List.of("data/modp-weights.csv:2:3: error [serre-weight] form=lev7_wt3_chi2_o1 p=5: expected 3, found 5; Serre's weight of ρ̄ with ρ̄|I_5 ≅ ω₂^2 ⊕ ω₂^10 [a_5 ≡ 0 mod 5: supersingular (Fontaine)] (Serre 1987, §2)"),
                weightFindings("form,p,serre_weight\nlev7_wt3_chi2_o1,5,5\n"));
    }

    private List<String> weightFindings(String table) throws IOException {
        Path src = Fixture.dataset("characters");
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv",
                Files.readString(src.resolve("coefficients.csv")), "modp-weights.csv", table);
        return Datasets.lines(Datasets.run(dir)).stream().filter(l -> l.contains("modp-weights")).toList();
    }

    /**
     * Dihedral weight-1 forms are Eisenstein mod 3 with characters: the S3-representation of lev23_wt1_chi2_o1 reduces
     * mod 3 to 1 ⊕ χ, a_ℓ ≡ 1 + χ(ℓ) (PARI/GP: f23 = mfcoefs(mfeigenbasis(mfinit([23,1,[znstar(23,1),[11]]],0))[1],
     * 150); [l | l <- primes(35), l != 3 && l != 23 && (f23[l+1] - 1 - kronecker(-23, l)) % 3] is empty). The row
     * is certified: f♭ − E_1^{1,χ}♭ of weight 1 on Γ0(23²) gives B = ⌊552/12⌋ = 46 (Diamond–Shurman §4.8 for
     * E_1^{ψ,φ}), and at p = 3 the tables give a_3 = -1 (PARI f23[4]) ≡ 1 + χ(3) = 2, with the same recursion
     * constant χ(3) = 1 on both sides; the same claim mod 5 for
     * lev31_wt1_chi2_o1 fails first at ℓ = 2 (a_2 = -1, 1 + χ(2) = 2; same gp command with 31 and 5); ψφ = 1 ≠ χ is
     * false from the determinant alone.
     */
    @Test
    void weightOneEisensteinRowsWithCharacters() throws IOException {
        Path src = Fixture.dataset("characters");
        Datasets.write(dir, "forms.csv", Files.readString(src.resolve("forms.csv")), "coefficients.csv",
                Files.readString(src.resolve("coefficients.csv")), "reducible.csv", String.join("\n",
                        "form,p,i,j,prime,psi,phi",
                        "lev23_wt1_chi2_o1,3,0,0,,,5:11/22",
                        "lev31_wt1_chi2_o1,5,0,0,,,3:15/30",
                        "lev23_wt1_chi2_o1,3,0,0,,,", ""));
        List<String> lines = Datasets.lines(Datasets.run(dir)).stream().filter(l -> l.contains("reducible.csv"))
                .toList();
        assertEquals(List.of(
                "data/reducible.csv:2: note [reducible] reducible=lev23_wt1_chi2_o1 p=3 i=0 j=0: certified: a_l(lev23_wt1_chi2_o1) = ψ(l)*l^0 + φ(l)*l^0 mod a prime above 3 (ψ = 1, φ = 5:1/2) for every prime l not dividing 69, having checked every l <= B = 46 (f♭ − E^{ψ,φ}_1♭ (weight 1) on Γ0(529), a_p and the p-th Hecke recursion compared too; Sturm, LNM 1240, Thm 1)",
                "data/reducible.csv:3: error [reducible] reducible=lev31_wt1_chi2_o1 p=5 i=0 j=0: expected a_2(lev31_wt1_chi2_o1) = ψ(2)*2^0 + φ(2)*2^0 = 2 mod (5, x), found a_2(lev31_wt1_chi2_o1) = 4; the congruence fails at l = 2, the first prime l not dividing 155 where the residues differ",
                "data/reducible.csv:4: error [reducible] reducible=lev23_wt1_chi2_o1 p=3 i=0 j=0: expected a prime above 3 with (χ_f mod 𝔭)ω^(k-1) = (ψφ mod 𝔭)ω^(i+j), found none (χ_f = 5:1/2, ψφ = 1); the claim is false: ρ̄_f^ss ≅ ψω^i ⊕ φω^j gives det ρ̄_f = ψφω^(i+j), while det ρ̄_f = (χ_f mod 𝔭)ω^(k-1), and the two differ on the units mod 69 at every prime above 3 (Chebotarev, Brauer–Nesbitt)"), lines);
    }

    /**
     * A rational form with a quadratic character: lev7_wt3_chi2_o1 (the CM form of S_3(7, (−7/·)), PARI a_3 = 0, 3
     * inert in Q(√−7), χ(3) = −1). Then χ̄(3)a_3² = −a_3² must be ≥ 0, so a_3 = 0: a planted a_3 = 1 fails.
     */
    @Test
    void inertPrimeOfACmFormWithRationalCoefficients() throws IOException {
        Fixture f = Fixture.of(COEFFS);
        String form = "lev7_wt3_chi2_o1";
        assertEquals("0", f.valueOf(form, 3));
        f.plant(form, 3, "1");
        List<String> errors = run(f).stream().filter(e -> e.contains("[ramanujan-bound]")).toList();
        assertEquals(List.of("data/coefficients.csv:" + f.lineOf(form, 3) + ": error [ramanujan-bound] form=lev7_wt3_chi2_o1 n=3: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 36], found a_p = 1, χ(p) = -1, χ̄(p)*a_p^2 = -1; χ̄(p)*a_p^2 is not real and >= 0 in every embedding, so conj(a_p) = χ̄(p)*a_p fails at p=3 (is a_p replaced by its complex conjugate, or χ(p) wrong?)"), errors);
    }
}
