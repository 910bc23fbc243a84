package io.github.eigengate.check.space;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.github.eigengate.check.Check;
import io.github.eigengate.engine.Datasets;
import io.github.eigengate.engine.Fixture;
import io.github.eigengate.engine.Gate;
import io.github.eigengate.engine.Report;
import io.github.eigengate.engine.Settings;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real data: datasets/primesonly (fixtures-gp/primesonly.gp, PARI/GP 2.15.2) — every newform orbit of 12 spaces
 * S_k^new(Γ0(N)), given as a_1 and a_p for p ≤ 100 only, with their Atkin–Lehner signs (mfatkineigenvalues).
 */
class PrimesOnlyIdentitiesTest {

    @TempDir
    Path dir;

    private static final Fixture FORMS = Fixture.of("datasets/primesonly/forms.csv");
    private static final Fixture SPACES = Fixture.of("datasets/primesonly/spaces.csv");

    private List<String> run(Fixture coefficients, Check... checks) {
        Datasets.write(dir, "forms.csv", FORMS.text(), "spaces.csv", SPACES.text(), "coefficients.csv",
                coefficients.text());
        Report r = new Gate(Settings.defaults(), List.of(checks)).run(List.of(new Gate.Dataset(dir, "data")));
        return Datasets.lines(r);
    }

    private static Check[] identities() {
        return new Check[] {new SpaceTraceProducts(), new SpaceTraceSquares(), new SpaceTracesAtLevel()};
    }

    @Test
    void cleanPrimesOnlyTablesPass() {
        assertEquals(List.of(), run(Fixture.of("datasets/primesonly/coefficients.csv"), identities()));
    }

    @Test
    void aGaloisConjugateAPIsCaughtAndNamed() {
        // S_2^new(Γ0(29)) = one orbit over Q(√2): a_2 = x - 1, a_5 = -1, a_7 = 2*x (gp); the conjugate -2*x of a_7 has
        // the same trace 0 and norm -8, but Tr(a_2 a_7) = Tr(4 - 2*x) = 8 becomes -8; 5*7 still holds (a_5 ∈ Q)
        Fixture f = Fixture.of("datasets/primesonly/coefficients.csv");
        assertEquals("2*x", f.valueOf("lev29_wt2_o1", 7));
        f.plant("lev29_wt2_o1", 7, "-2*x");
        assertEquals(List.of(), run(f, new SpaceTraces()));
        assertEquals(List.of("data/spaces.csv:9: error [space-trace-products] space=N=29 k=2 pq=2*7: expected Tr T_14 = 8, found Σ "
                        + "Tr(a_2 a_7) = -8; Σ_f Tr(a_p a_q) = Tr T_pq fails at pq = 2*7, 3*7, 7*11, 7*13, 7*17 and 14 "
                        + "more of 110 compared: an orbit is missing or listed twice, or an a_p is wrong",
                "data/coefficients.csv:" + f.lineOf("lev29_wt2_o1", 7) + ": error [space-trace-products] "
                        + "form=lev29_wt2_o1 n=7: expected 2*x, found -2*x; likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq "
                        + "fails in space N=29 k=2 at pq = 2*7, 3*7, 7*11, 7*13, 7*17 and 14 more, all involving a_7; "
                        + "a_7 = 2*x in this form makes every identity at 7 hold (and Σ_f Tr(a_7^2) too); the value "
                        + "found is σ(2*x) for the automorphism σ: x ↦ -x of K"),
                run(f, identities()));
    }

    @Test
    void aWrongAtkinLehnerSignInTheAQIsCaught() {
        // S_4^new(Γ0(13)): o1 rational with w_13 = -1, so a_13 = -w_13·13 = 13 (gp); o2 over Q(√17) with w_13 = +1
        Fixture f = Fixture.of("datasets/primesonly/coefficients.csv");
        assertEquals("13", f.valueOf("lev13_wt4_o1", 13));
        f.plant("lev13_wt4_o1", 13, "-13");
        assertEquals(List.of("data/spaces.csv:13: error [space-trace-products] space=N=13 k=4 pq=2*13: expected Tr T_26 = -78, found "
                        + "Σ Tr(a_2 a_13) = 52; Σ_f Tr(a_p a_q) = Tr T_pq fails at pq = 2*13, 3*13, 5*13, 7*13, 11*13 and "
                        + "19 more of 110 compared: an orbit is missing or listed twice, or an a_p is wrong",
                "data/spaces.csv:13: error [space-traces-at-level] space=N=13 k=4 n=13: expected Tr T_13 = -13, found "
                        + "sum of Tr(a_13) = -39; the declared forms' traces differ from the new-space trace at n = 13 "
                        + "of 1 compared with (n, N) > 1: an orbit is missing or listed twice, or a coefficient (for "
                        + "n = q ‖ N an Atkin–Lehner sign) is wrong",
                "data/coefficients.csv:" + f.lineOf("lev13_wt4_o1", 13) + ": error "
                        + "[space-trace-products] form=lev13_wt4_o1 n=13: expected 13, found -13; likely culprit: Σ_f "
                        + "Tr(a_p a_q) = Tr T_pq fails in space N=13 k=4 at pq = 2*13, 3*13, 5*13, 7*13, 11*13 and 19 "
                        + "more, all involving a_13; a_13 = 13 in this form makes every identity at 13 hold",
                "data/coefficients.csv:" + f.lineOf("lev13_wt4_o1", 13) + ": error "
                        + "[space-traces-at-level] form=lev13_wt4_o1 n=13: expected 13, found -13; likely culprit: a "
                        + "wrong Atkin–Lehner sign at q = 13 ‖ N; with a_13 = 13 (w_13 of the opposite sign, a_q = "
                        + "-w_q q^(k/2-1)) the trace of U_13 on N=13 k=4 is right, and no other single form's sign "
                        + "mends it"),
                run(f, identities()));
    }

    @Test
    void anOrbitListedTwiceIsNamed() {
        // the first form of S_2^new(Γ0(37)) copied under a second id
        StringBuilder copy = new StringBuilder(Fixture.of("datasets/primesonly/coefficients.csv").text());
        for (String line : Fixture.of("datasets/primesonly/coefficients.csv").text().split("\n")) {
            if (line.startsWith("lev37_wt2_o1,")) {
                copy.append('\n').append(line.replace("lev37_wt2_o1,", "again,"));
            }
        }
        String forms = FORMS.text() + "\nagain,37,2,,,37:-1,+1";
        Datasets.write(dir, "forms.csv", forms, "coefficients.csv", copy.toString());
        Report r = new Gate(Settings.defaults(), List.of(new DuplicateOrbits())).run(List.of(new Gate.Dataset(dir,
                "data")));
        assertEquals(List.of("data/forms.csv:24: error [duplicate-orbit] form=again: expected a newform differing from "
                + "lev37_wt2_o1, found the same 26 coefficients as lev37_wt2_o1 (data/forms.csv:15); a duplicated orbit: "
                + "distinct newforms of one space differ at some a_p (multiplicity one), so again repeats lev37_wt2_o1"),
                Datasets.lines(r));
        assertEquals(List.of(), run(Fixture.of("datasets/primesonly/coefficients.csv"), new DuplicateOrbits()));
    }

    @Test
    void aWrongAPWithTheRightTraceFailsProductsAndSquaresAndIsNamed() {
        // S_2^new(Γ0(29)) over Q(√2): a_97 = -6*x - 4 (gp); planted -5*x - 4, same trace -8, not a conjugate:
        // Tr((-5x - 4)^2) = 132 but Tr((-6x - 4)^2) = 176
        Fixture f = Fixture.of("datasets/primesonly/coefficients.csv");
        assertEquals("-6*x - 4", f.valueOf("lev29_wt2_o1", 97));
        f.plant("lev29_wt2_o1", 97, "-5*x - 4");
        assertEquals(List.of(), run(f, new SpaceTraces()));
        // Tr(a_2 a_97) = Tr((x - 1)(-6x - 4)) = -16, with the planted value -12; a_5 = -1 is rational, so 5*97 holds
        assertEquals(List.of("data/spaces.csv:9: error [space-trace-products] space=N=29 k=2 pq=2*97: expected Tr T_194 = -16, found "
                        + "Σ Tr(a_2 a_97) = -12; Σ_f Tr(a_p a_q) = Tr T_pq fails at pq = 2*97, 3*97, 7*97 of 110 "
                        + "compared: an orbit is missing or listed twice, or an a_p is wrong",
                "data/spaces.csv:9: error [space-trace-squares] space=N=29 k=2 p=97: expected Tr T_9409 + 97^1·2 = 176, "
                        + "found Σ Tr(a_97^2) = 132; Σ_f Tr(a_p^2) = Tr T_{p^2} + p^(k-1) dim fails at p = 97 of 24 "
                        + "compared: an orbit is missing or listed twice, or an a_p is wrong",
                "data/coefficients.csv:137: error [space-trace-products] form=lev29_wt2_o1 n=97: expected "
                        + "-6*x - 4, found -5*x - 4; likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq fails in space N=29 k=2 "
                        + "at pq = 2*97, 3*97, 7*97, all involving a_97; a_97 = -6*x - 4 in this form makes every "
                        + "identity at 97 hold (and Σ_f Tr(a_97^2) too)"),
                run(f, identities()));
    }

    @Test
    void aWrongSignThatTheTraceOfUQCannotPlaceIsPlacedByTheProducts() {
        // S_2^new(Γ0(37)): o1 has w_37 = -1, a_37 = 1; o2 has w_37 = +1, a_37 = -1 (gp). With a_37(o1) = -1 the trace
        // of U_37 is -2 instead of 0, and flipping either form mends it; Σ Tr(a_p a_37) = Tr T_37p tells them apart.
        Fixture f = Fixture.of("datasets/primesonly/coefficients.csv");
        assertEquals("1", f.valueOf("lev37_wt2_o1", 37));
        f.plant("lev37_wt2_o1", 37, "-1");
        // o1: a_2 = 0, a_3 = 1; o2: a_2 = -2, a_3 = -3 (gp), so Tr T_111 = 1·1 + (-3)(-1) = 4 and 2*37 still holds
        assertEquals(List.of("data/spaces.csv:11: error [space-trace-products] space=N=37 k=2 pq=3*37: expected Tr T_111 = 4, found "
                        + "Σ Tr(a_3 a_37) = 2; Σ_f Tr(a_p a_q) = Tr T_pq fails at pq = 3*37, 7*37, 11*37, 13*37, 17*37 and "
                        + "17 more of 110 compared: an orbit is missing or listed twice, or an a_p is wrong",
                "data/spaces.csv:11: error [space-traces-at-level] space=N=37 k=2 n=37: expected Tr T_37 = 0, found sum "
                        + "of Tr(a_37) = -2; the declared forms' traces differ from the new-space trace at n = 37 of 1 "
                        + "compared with (n, N) > 1: an orbit is missing or listed twice, or a coefficient (for n = q ‖ N "
                        + "an Atkin–Lehner sign) is wrong",
                "data/coefficients.csv:" + f.lineOf("lev37_wt2_o1", 37) + ": error [space-trace-products] "
                        + "form=lev37_wt2_o1 n=37: expected 1, found -1; likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq fails "
                        + "in space N=37 k=2 at pq = 3*37, 7*37, 11*37, 13*37, 17*37 and 17 more, all involving a_37; "
                        + "a_37 = 1 in this form makes every identity at 37 hold"),
                run(f, identities()));
    }
}
