package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Tests of {@link SerreWeights#fromForm} and {@link SerreWeights#weightOfForm}. */
class FromFormTest {

    private static final LocalShape.Kind[] ORDINARY = {
        LocalShape.Kind.SPLIT, LocalShape.Kind.NONSPLIT, LocalShape.Kind.TRES};

    /**
     * Consistency: σ = Sym^{k−2} belongs to W(ρ̄_f) for every form of weight 2 ≤ k ≤ p + 1 and every
     * allowed local kind (a form of weight k gives a crystalline lift with Hodge–Tate weights {0, k − 1},
     * BDJ 2010, §3).
     */
    @Test
    void weightOfFormLiesInBdjSet() {
        int checked = 0;
        for (int p : SerreWeightsConsistencyTest.primes()) {
            for (int k = 2; k <= p + 1; k++) {
                Weight sigma = SerreWeights.weightOfForm(p, k);
                assertEquals(new Weight(k - 2, 0), sigma);
                assertTrue(SerreWeights.bdj(SerreWeights.fromForm(p, k, true, null)).contains(sigma));
                checked++;
                for (LocalShape.Kind kind : ORDINARY) {
                    if (kind == LocalShape.Kind.TRES && k != p + 1) {
                        continue;
                    }
                    LocalShape rho = SerreWeights.fromForm(p, k, false, kind);
                    assertTrue(SerreWeights.bdj(rho).contains(sigma), () -> rho + " weight " + sigma);
                    checked++;
                }
            }
        }
        assertTrue(checked > 1000);
    }

    /**
     * k(ρ̄_f) = k for 2 ≤ k ≤ p; for k = p + 1 it is p + 1 if ρ̄_f is très ramifié and 2 otherwise
     * (Serre 1987, §2, applied to the shapes of Edixhoven 1992, Thms 2.5–2.6; the statement as in
     * Edixhoven 1992, §4, from memory).
     */
    @Test
    void serreWeightOfSmallWeightForms() {
        for (int p : SerreWeightsConsistencyTest.primes()) {
            for (int k = 2; k <= p + 1; k++) {
                int expected = k == p + 1 ? 2 : k;
                assertEquals(expected, SerreWeights.serreK(SerreWeights.fromForm(p, k, true, null)));
                assertEquals(expected, SerreWeights.serreK(SerreWeights.fromForm(p, k, false, LocalShape.Kind.SPLIT)));
                assertEquals(expected, SerreWeights.serreK(SerreWeights.fromForm(p, k, false, LocalShape.Kind.NONSPLIT)));
            }
            assertEquals(p + 1, SerreWeights.serreK(SerreWeights.fromForm(p, p + 1, false, LocalShape.Kind.TRES)));
        }
    }

    /** Fontaine and Deligne shapes as stated in Edixhoven 1992, Thms 2.5–2.6. */
    @Test
    void shapesOfForms() {
        assertEquals(LocalShape.irreducible(7, 3), SerreWeights.fromForm(7, 4, true, null));
        // k = p + 1 supersingular: ω₂^p ⊕ ω₂^{p²} = ω₂^p ⊕ ω₂, canonical exponent 1
        assertEquals(1, SerreWeights.fromForm(7, 8, true, LocalShape.Kind.SPLIT).n());
        LocalShape ord = SerreWeights.fromForm(7, 4, false, LocalShape.Kind.NONSPLIT);
        assertEquals(3, ord.a());
        assertEquals(0, ord.b());
        // ordinary weight p + 1: ω^p = ω
        assertEquals(LocalShape.reducible(7, LocalShape.Kind.TRES, 1, 0),
                SerreWeights.fromForm(7, 8, false, LocalShape.Kind.TRES));
    }

    @Test
    void rejectsImpossibleForms() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SerreWeights.fromForm(7, 2, false, LocalShape.Kind.TRES));
        assertTrue(e.getMessage().contains("très ramifié"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.fromForm(7, 4, false, LocalShape.Kind.TRES));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.fromForm(7, 4, false, null));
        assertThrows(IllegalArgumentException.class,
                () -> SerreWeights.fromForm(7, 4, false, LocalShape.Kind.IRREDUCIBLE));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.fromForm(7, 1, true, null));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.fromForm(7, 9, true, null));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.weightOfForm(7, 9));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.weightOfForm(7, 1));
        IllegalArgumentException small = assertThrows(IllegalArgumentException.class,
                () -> SerreWeights.fromForm(3, 2, true, null));
        assertEquals("p = 2 and p = 3 are not supported: the recipes used here assume p ≥ 5", small.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.weightOfForm(2, 2));
        assertThrows(IllegalArgumentException.class, () -> SerreWeights.weightOfForm(9, 2));
    }

    private record Row(String form, int k, int p, int apModP) {
    }

    private static List<Row> fixture() throws IOException {
        List<Row> rows = new ArrayList<>();
        try (InputStream in = FromFormTest.class.getResourceAsStream("ap-mod-p.csv");
                BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            boolean header = true;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                String[] f = line.split(",");
                rows.add(new Row(f[0], Integer.parseInt(f[1]), Integer.parseInt(f[2]), Integer.parseInt(f[3])));
            }
        }
        return rows;
    }

    /**
     * Two actual eigenforms, a_p mod p from PARI/GP (commands in the fixture header): the newform of
     * X_0(11) (weight 2) and Δ (weight 12). The gp values say which primes are supersingular; the test
     * then checks that every kind allowed for the form gives k(ρ̄) = k (Serre 1987, §2; here k ≤ p
     * except Δ at p = 11) and W(ρ̄) ∋ Sym^{k−2}, and that the supersingular X_0(11) primes have
     * W = {Sym^0, Sym^{p−1}} (BDJ, derived).
     */
    @Test
    void formsFromGpFixture() throws IOException {
        List<Row> rows = fixture();
        assertEquals(27, rows.size());
        List<Integer> supersingular = new ArrayList<>();
        for (Row row : rows) {
            boolean ss = row.apModP() == 0;
            if (ss) {
                supersingular.add(row.p());
                LocalShape rho = SerreWeights.fromForm(row.p(), row.k(), true, null);
                assertEquals(Set.of(new Weight(0, 0), new Weight(row.p() - 1, 0)), SerreWeights.bdj(rho));
                assertEquals(2, SerreWeights.serreK(rho));
                continue;
            }
            for (LocalShape.Kind kind : ORDINARY) {
                if (kind == LocalShape.Kind.TRES && row.k() != row.p() + 1) {
                    continue;
                }
                LocalShape rho = SerreWeights.fromForm(row.p(), row.k(), false, kind);
                assertTrue(SerreWeights.bdj(rho).contains(SerreWeights.weightOfForm(row.p(), row.k())));
                int expected = row.k() <= row.p() ? row.k() : kind == LocalShape.Kind.TRES ? row.p() + 1 : 2;
                assertEquals(expected, SerreWeights.serreK(rho), rho::toString);
            }
        }
        // gp: ellap(E,19) = ellap(E,29) = 0 for X_0(11); Δ is ordinary at every 11 ≤ p ≤ 59
        assertEquals(List.of(19, 29), supersingular);
    }
}
