package io.github.eigengate.check.congruence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Certificate;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Report;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code reducible} check on real data:
 * <ul>
 *   <li>Ramanujan's τ(n) ≡ σ_11(n) mod 691 (from memory; Serre, Sém. Bourbaki 416 (1972)), and τ(n) ≡ n σ_3(n)
 *   mod 7, τ(n) ≡ n σ_1(n) mod 5 (from memory, same source), on reference/tau.csv (OEIS A000594, PARI/GP
 *   {@code ramanujantau}); all three checked for primes ℓ ≤ 1000 with PARI/GP
 *   {@code forprime(l=2,1000,t=ramanujantau(l);if(l!=691&&(t-(1+l^11))%691,print(l)))} and the like (no output),
 *   and {@code ramanujantau(691)%691} = 1.</li>
 *   <li>The level-11 form: a_ℓ ≡ 1 + ℓ mod 5 (Mazur, Publ. IHÉS 47 (1977); from memory) on reference/level11.csv
 *   (OEIS A006571, PARI/GP {@code ellan}); a_5 = 1 (PARI/GP {@code ellap(E,5)}).</li>
 *   <li>The level-23 orbit over Q(x), x² − x − 1: a_ℓ ≡ 1 + ℓ mod the prime (11, x + 3) (x ≡ 8), and not mod
 *   (11, x + 7) (x ≡ 4), where a_2 = −x ≡ 7 ≠ 3 (PARI/GP: {@code factormod(x^2-x-1,11)} and the loop in
 *   congruences/gp/level23.gp's neighbourhood: {@code forprime(l=2,1200,if(l==11||l==23,next);
 *   if((subst(subst(lift(v[l+1]),y,x),x,8)-(1+l))%11,print(l)))}, no output; with 4 it prints 2).</li>
 * </ul>
 */
class ReducibleCheckTest {

    static final String FORMS = "id,level,weight,field\ndelta,1,12,\nf11,11,2,\nlev23,23,2,x^2 - x - 1\n";

    @TempDir
    Path dir;

    @Test
    void ramanujanMod691IsCertifiedWithBoundOne() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"),
                "reducible.csv", "form,p,i,j\ndelta,691,0,11\ndelta,7,1,4\ndelta,5,1,2\n");
        assertEquals(List.of("data/reducible.csv:2: note [reducible] reducible=delta p=691 i=0 j=11: certified: "
                        + "a_l(delta) = l^0 + l^11 mod a prime above 691 for every prime l not dividing 691, having "
                        + "checked every l <= B = 1 (f♭ − G_12♭ (weight 12) on Γ0(1), a_p ≡ 1 compared too (p divides "
                        + "the constant term of G_12); Sturm, LNM 1240, Thm 1)",
                "data/reducible.csv:3: note [reducible] reducible=delta p=7 i=1 j=4: certified: a_l(delta) = l^1 + "
                        + "l^4 mod a prime above 7 for every prime l not dividing 7, having checked every l <= B = 1 "
                        + "(θ^1 f♭ − θ^2 G_4♭ (weights 20, 20, brought to 20 by E_6) on Γ0(1); Sturm, LNM 1240, Thm 1)",
                "data/reducible.csv:4: note [reducible] reducible=delta p=5 i=1 j=2: certified: a_l(delta) = l^1 + "
                        + "l^2 mod a prime above 5 for every prime l not dividing 5, having checked every l <= B = 1 "
                        + "(θ^1 f♭ − θ^2 G_6♭ (weights 18, 18, brought to 18 by E_4) on Γ0(1); Sturm, LNM 1240, "
                        + "Thm 1)"),
                Datasets.lines(r));
        assertEquals(List.of("reducible-delta-p691-i0-j11.txt", "reducible-delta-p7-i1-j4.txt",
                "reducible-delta-p5-i1-j2.txt"), r.certificates().stream().map(Certificate::name).toList());
        String text = r.certificates().get(0).text();
        assertTrue(text.contains("Eisenstein series: G_12\nlevel M: 1, index [SL2(Z):Gamma0(M)] = 1\nweight W: 12\n"
                + "bound B = floor(W*index/12): 1\nchecked: a_l for every prime l <= 1 not dividing 691, and a_691\n"),
                text);
    }

    @Test
    void aPlantedTauValueIsCaughtBelowTheLargerBound() {
        // τ(13) + 1: the check compares up to the largest bound it considers (58 for route θ), so the change shows
        Fixture tau = Fixture.of("reference/tau.csv").plant("delta", 13, "-577737");
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", tau.text(),
                "reducible.csv", "form,p,i,j\ndelta,691,0,11\n");
        // τ(13) = −577738 (PARI/GP: ramanujantau(13)); 1 + 13^11 ≡ 629 and −577737 ≡ 630 mod 691 (PARI/GP:
        // (1+13^11)%691, (ramanujantau(13)+1)%691)
        assertEquals(List.of("data/reducible.csv:2: error [reducible] reducible=delta p=691 i=0 j=11: expected "
                + "a_13(delta) = 13^0 + 13^11 = 629 mod (691, x), found a_13(delta) = 630; the congruence fails at "
                + "l = 13, the first prime l not dividing 691 where the residues differ"), Datasets.lines(r));
    }

    @Test
    void mazurLevel11Mod5() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/level11.csv"),
                "reducible.csv", "form,p,i,j\nf11,5,0,1\nf11,7,0,1\nf11,5,0,3\n");
        assertEquals(List.of("data/reducible.csv:2: note [reducible] reducible=f11 p=5 i=0 j=1: certified: "
                        + "a_l(f11) = l^0 + l^1 mod a prime above 5 for every prime l not dividing 55, having checked "
                        + "every l <= B = 66 (f♭ − G_6♭ (weights 2, 6, brought to 6 by E_4) on Γ0(121), a_p ≡ 1 "
                        + "compared too; Sturm, LNM 1240, Thm 1)",
                "data/reducible.csv:3: error [reducible] reducible=f11 p=7 i=0 j=1: expected a_2(f11) = 2^0 + 2^1 = 3 "
                        + "mod (7, x), found a_2(f11) = 5; the congruence fails at l = 2, the first prime l not "
                        + "dividing 77 where the residues differ",
                "data/reducible.csv:4: error [reducible] reducible=f11 p=5 i=0 j=3: expected k - 1 = i + j mod 4, "
                        + "found k=2, i=0, j=3; the claim is false: det of the mod-p representation of f11 is omega^1, "
                        + "not omega^(i+j), so a_l differs from l^i + l^j at a positive density of primes (Chebotarev, "
                        + "Brauer–Nesbitt)"), Datasets.lines(r));
    }

    @Test
    void mazurWithTooLittleData() {
        Report r = Runs.run(dir, "forms.csv", FORMS,
                "coefficients.csv", Runs.rows("reference/level11.csv", "f11", n -> n <= 40),
                "reducible.csv", "form,p,i,j\nf11,5,0,1\n");
        assertEquals(List.of("data/reducible.csv:2: error [reducible] reducible=f11 p=5 i=0 j=1: expected a_l for "
                + "every prime l <= B = 66, found the tables stop at l = 40; not certified: the congruence holds for "
                + "every l <= 40 in the tables, but Sturm's bound needs l <= 66 (f♭ − G_6♭ (weights 2, 6, brought to "
                + "6 by E_4) on Γ0(121), a_p ≡ 1 compared too; Sturm, LNM 1240, Thm 1)"), Datasets.lines(r));
    }

    @Test
    void mazurWithoutA5CannotUseTheSmallBound() {
        // without a_5 route DIRECT (B = 66) is unavailable; route θ needs B = 132 and the data reach 1000
        Report r = Runs.run(dir, "forms.csv", FORMS,
                "coefficients.csv", Runs.rows("reference/level11.csv", "f11", n -> n != 5),
                "reducible.csv", "form,p,i,j\nf11,5,0,1\n");
        assertEquals(List.of("data/reducible.csv:2: note [reducible] reducible=f11 p=5 i=0 j=1: certified: "
                + "a_l(f11) = l^0 + l^1 mod a prime above 5 for every prime l not dividing 55, having checked every "
                + "l <= B = 132 (θ^1 f♭ − θ^1 G_6♭ (weights 8, 12, brought to 12 by E_4) on Γ0(121); Sturm, LNM "
                + "1240, Thm 1)"), Datasets.lines(r));
    }

    @Test
    void level23FindsThePrimeAbove11() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("congruences/level23.csv"),
                "reducible.csv", "form,p,i,j,prime\nlev23,11,0,1,\nlev23,11,0,1,x+7\nlev23,11,0,1,x + 3\n");
        String certified = "note [reducible] reducible=lev23 p=11 i=0 j=1: certified: a_l(lev23) = l^0 + l^1 mod a "
                + "prime above 11 for every prime l not dividing 253, having checked every l <= B = 552 (f♭ − G_12♭ "
                + "(weights 2, 12, brought to 12 by E_10) on Γ0(529), a_p ≡ 1 compared too; Sturm, LNM 1240, Thm 1)";
        assertEquals(List.of("data/reducible.csv:2: note [reducible] reducible=lev23 p=11 i=0 j=1: found the prime "
                        + "(11, x + 3) under which the congruence holds for every l <= 1104 in the tables",
                "data/reducible.csv:2: " + certified,
                "data/reducible.csv:3: error [reducible] reducible=lev23 p=11 i=0 j=1: expected a_2(lev23) = 2^0 + 2^1 "
                        + "= 3 mod (11, x + 7), found a_2(lev23) = 7; the congruence fails at l = 2, the first prime l "
                        + "not dividing 253 where the residues differ",
                "data/reducible.csv:4: " + certified), Datasets.lines(r));
        assertEquals(List.of("reducible-lev23-p11-i0-j1.txt", "reducible-lev23-p11-i0-j1-2.txt"),
                r.certificates().stream().map(Certificate::name).toList());
        assertTrue(r.certificates().get(0).text().contains("prime: (11, x + 3)\n"));
    }

    @Test
    void unsupportedSmallPrimeAtLevelOneAndMalformedExponents() {
        Report r = Runs.run(dir, "forms.csv", FORMS, "coefficients.csv", Runs.all("reference/tau.csv"),
                "reducible.csv", "form,p,i,j\ndelta,2,0,1\ndelta,5,one,2\n");
        assertEquals(List.of("data/reducible.csv:2: error [reducible] reducible=delta p=2 i=0 j=1: expected a certifiable "
                        + "congruence, found a_l(delta) = l^0 + l^1 mod a prime above 2; not certified: no "
                        + "Sturm-type bound is implemented for this case (p = 2, level 1, i = 0, j = 1): for p = 2, 3 one exponent must be "
                        + "= 0 mod p - 1 and the level must have a prime other than p; see docs/congruences.md",
                "data/reducible.csv:3:3: error [table-format] reducible=delta p=5: expected an integer in "
                        + "[-10^12, 10^12], found one; 'i' must be a decimal integer"),
                Datasets.lines(r));
    }
}
