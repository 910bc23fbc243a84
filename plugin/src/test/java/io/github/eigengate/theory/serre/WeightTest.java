package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * Parsing, formatting and twisting of Serre weights. The ranges 0 ≤ r ≤ p − 1, 0 ≤ s ≤ p − 2 are those
 * of BDJ 2010, §2 (σ_{a,b} = det^a ⊗ Sym^{b−1} with 0 ≤ a ≤ p − 2, 1 ≤ b ≤ p).
 */
class WeightTest {

    @Test
    void parseAndFormatSet() {
        assertEquals(Set.of(), Weight.parseSet("", 5));
        assertEquals(Set.of(), Weight.parseSet("  \t ", 5));
        Set<Weight> w = Weight.parseSet(" ( 4 , 1 ) ; (0,0);(0,3) ", 5);
        assertEquals(Set.of(new Weight(0, 0), new Weight(0, 3), new Weight(4, 1)), w);
        assertEquals("(0,0);(0,3);(4,1)", Weight.formatSet(w));
        assertEquals("", Weight.formatSet(List.of()));
        assertEquals("(1,2)", Weight.formatSet(List.of(new Weight(1, 2), new Weight(1, 2))));
        assertEquals(new Weight(3, 2), Weight.parse(" (3,2) ", 5));
        assertEquals("(3,2)", new Weight(3, 2).toString());
    }

    /** Random subsets for several p: formatSet ∘ parseSet and parseSet ∘ formatSet are identities. */
    @Test
    void roundTripOnRandomSets() {
        Random random = new Random(20260101L);
        for (int p : new int[] {5, 7, 11, 59}) {
            for (int trial = 0; trial < 200; trial++) {
                List<Weight> items = new ArrayList<>();
                for (int i = random.nextInt(6); i > 0; i--) {
                    items.add(new Weight(random.nextInt(p), random.nextInt(p - 1)));
                }
                Set<Weight> set = new TreeSet<>(items);
                List<Weight> shuffled = new ArrayList<>(set);
                Collections.shuffle(shuffled, random);
                String text = Weight.formatSet(shuffled);
                assertEquals(set, Weight.parseSet(text, p));
                assertEquals(text, Weight.formatSet(Weight.parseSet(text, p)));
            }
        }
    }

    @Test
    void errorsNameTheColumn() {
        assertMessage("(1,2);(1,2)", 5, "column 7: duplicate weight (1,2)");
        assertMessage("(1,2);", 5, "column 7: expected '(' but the text ended");
        assertMessage("(5,0)", 5, "column 2: r = 5 is out of range 0..4 for p = 5");
        assertMessage("(0, 4)", 5, "column 5: s = 4 is out of range 0..3 for p = 5");
        assertMessage("(-1,0)", 5, "column 2: r = -1 is out of range 0..4 for p = 5");
        assertMessage("(1;2)", 5, "column 3: expected ',' but found ';'");
        assertMessage("(1,2)(0,0)", 5, "column 6: expected ';' between weights but found '('");
        assertMessage("(x,2)", 5, "column 2: expected an integer but found 'x'");
        assertMessage("(1 2,0)", 5, "column 4: expected ',' but found '2'");
        assertMessage("(12345678901,0)", 5, "column 2: integer 12345678901 is out of range");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Weight.parse("(1,2) x", 5));
        assertTrue(e.getMessage().contains("column 7"), e.getMessage());
        IllegalArgumentException small = assertThrows(IllegalArgumentException.class, () -> Weight.parseSet("", 2));
        assertEquals("p = 2 and p = 3 are not supported: the recipes used here assume p ≥ 5", small.getMessage());
        assertThrows(NullPointerException.class, () -> Weight.parseSet(null, 5));
    }

    /** Random strings over the alphabet of the syntax: either a valid set or an IllegalArgumentException with a column. */
    @Test
    void randomTextEitherParsesOrNamesAColumn() {
        Random random = new Random(7L);
        String alphabet = "(),;0123456789- x";
        int parsed = 0;
        for (int trial = 0; trial < 5000; trial++) {
            StringBuilder sb = new StringBuilder();
            for (int i = random.nextInt(14); i > 0; i--) {
                sb.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            String text = trial % 3 == 0 ? "(" + sb : sb.toString();
            try {
                Set<Weight> w = Weight.parseSet(text, 7);
                assertEquals(w, Weight.parseSet(Weight.formatSet(w), 7));
                parsed++;
            } catch (IllegalArgumentException e) {
                assertTrue(e.getMessage().startsWith("weight set \"" + text + "\", column "), e.getMessage());
            }
        }
        assertTrue(parsed > 0);
    }

    private static void assertMessage(String text, int p, String expectedTail) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Weight.parseSet(text, p));
        assertEquals("weight set \"" + text + "\", " + expectedTail, e.getMessage());
    }

    @Test
    void constructionAndRanges() {
        assertThrows(IllegalArgumentException.class, () -> new Weight(-1, 0));
        assertThrows(IllegalArgumentException.class, () -> new Weight(0, -1));
        assertThrows(IllegalArgumentException.class, () -> Weight.of(5, 0, 5));
        assertThrows(IllegalArgumentException.class, () -> Weight.of(0, 4, 5));
        assertEquals(new Weight(4, 3), Weight.of(4, 3, 5));
        assertTrue(new Weight(4, 3).isWeightFor(5));
        assertEquals(5, new Weight(4, 3).dimension());
    }

    /** det has order p − 1 on GL2(F_p), so det^s is read modulo p − 1. */
    @Test
    void twisting() {
        assertEquals(new Weight(2, 0), new Weight(2, 3).twist(1, 5));
        assertEquals(new Weight(2, 3), new Weight(2, 0).twist(-1, 5));
        assertEquals(new Weight(2, 0), new Weight(2, 0).twist(4, 5));
        assertEquals(new Weight(2, 3), new Weight(2, 0).twist(Integer.MAX_VALUE, 5)); // 2^31 − 1 ≡ 3 mod 4
        assertThrows(IllegalArgumentException.class, () -> new Weight(5, 0).twist(1, 5));
        assertEquals(Set.of(new Weight(0, 1), new Weight(4, 0)),
                SerreWeights.twist(Set.of(new Weight(0, 0), new Weight(4, 3)), 1, 5));
    }
}
