package io.github.eigengate.check.weights;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * local=split for 2 ≤ k ≤ p − 1 needs a companion of weight p + 1 − k and level N (Gross 1990; Coleman–Voloch
 * 1992). Data: weights/forms.csv and coefficients.csv (PARI/GP, weights.gp there): Δ (level 1, k = 12) has
 * τ(13) = -577738 ≡ 8 mod 13, ordinary; a companion would have weight 2 and level 1, and S_2(Γ0(1)) = 0 (Diamond–
 * Shurman §3.9: X_0(1) has genus 0). ρ̄_{Δ,13} is irreducible (13 is not among Δ's exceptional primes 2, 3, 5, 7,
 * 23, 691 — Swinnerton-Dyer 1973, from memory). e21 (level 21, k = 2) at 5 has the companion g21 of weight 4.
 */
class CompanionExistenceTest {

    @TempDir
    Path dir;

    @Test
    void splitWithoutAPossibleCompanionIsAnError() {
        assertEquals(List.of("data/modp-weights.csv:2:4: error [weight-of-form] form=delta p=13: expected nonsplit (no "
                        + "companion can exist), found split; split at 13 with 2 ≤ k ≤ p − 1 needs a companion form of "
                        + "weight p + 1 − k = 2 and level 1 (Gross 1990; Coleman–Voloch 1992), but dim S_2(Γ0(1)) = 0"),
                Scenario.weights("delta,13,,split,,,,").lines(dir));
    }

    @Test
    void splitWhereACompanionSpaceExistsIsNotRejected() {
        assertEquals(List.of(), Scenario.weights("e21,5,,split,2,\"(0,0);(4,0);(2,1)\",,").lines(dir));
    }
}
