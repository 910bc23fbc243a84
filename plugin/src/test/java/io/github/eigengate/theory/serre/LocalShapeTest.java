package io.github.eigengate.theory.serre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Construction, canonical form and text round trip of local shapes. Facts used: ω₂ has order p² − 1 and
 * ω₂^{p+1} = ω (Serre 1987, §2.1), so ω₂^n has level 1 iff (p + 1) | n, and ω₂^n ⊕ ω₂^{pn} does not
 * change when n is replaced by pn.
 */
class LocalShapeTest {

    @Test
    void irreducibleCanonicalForm() {
        // p = 7: 3 and 7·3 = 21 describe the same representation; the lesser residue is kept
        assertEquals(LocalShape.irreducible(7, 3), LocalShape.irreducible(7, 21));
        assertEquals(3, LocalShape.irreducible(7, 21).n());
        assertEquals(3, LocalShape.irreducible(7, 3 + 48).n());
        assertEquals(3, LocalShape.irreducible(7, 3 - 48).n());
        assertEquals(1, LocalShape.irreducible(7, 7).n());
        assertEquals(LocalShape.irreducible(7, 3).hashCode(), LocalShape.irreducible(7, 21).hashCode());
        assertNotEquals(LocalShape.irreducible(7, 3), LocalShape.irreducible(11, 3));
    }

    @Test
    void irreducibleRejectsLevelOne() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(7, 16));
        assertTrue(e.getMessage().contains("n ≡ 0 mod p + 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(7, 0));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(7, 48));
    }

    @Test
    void reducibleCanonicalForm() {
        LocalShape split = LocalShape.reducible(7, LocalShape.Kind.SPLIT, 5, 2);
        assertEquals(LocalShape.reducible(7, LocalShape.Kind.SPLIT, 2, 5), split);
        assertEquals(2, split.a());
        assertEquals(5, split.b());
        LocalShape nonsplit = LocalShape.reducible(7, LocalShape.Kind.NONSPLIT, 5, 2);
        assertEquals(5, nonsplit.a());
        assertEquals(2, nonsplit.b());
        assertNotEquals(LocalShape.reducible(7, LocalShape.Kind.NONSPLIT, 2, 5), nonsplit);
        assertEquals(LocalShape.reducible(7, LocalShape.Kind.NONSPLIT, -1, 8), LocalShape.reducible(7, LocalShape.Kind.NONSPLIT, 5, 2));
        assertThrows(IllegalStateException.class, nonsplit::n);
        assertThrows(IllegalStateException.class, () -> LocalShape.irreducible(7, 1).a());
        assertThrows(IllegalStateException.class, () -> LocalShape.irreducible(7, 1).b());
    }

    @Test
    void tresNeedsDifferenceOne() {
        assertEquals(3, LocalShape.reducible(7, LocalShape.Kind.TRES, 3, 2).a());
        assertEquals(LocalShape.reducible(7, LocalShape.Kind.TRES, 0, 5), LocalShape.reducible(7, LocalShape.Kind.TRES, 6, 5));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LocalShape.reducible(7, LocalShape.Kind.TRES, 2, 3));
        assertTrue(e.getMessage().contains("a − b ≡ 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LocalShape.reducible(7, LocalShape.Kind.IRREDUCIBLE, 1, 0));
        assertThrows(NullPointerException.class, () -> LocalShape.reducible(7, null, 1, 0));
    }

    @Test
    void rejectsSmallAndCompositePrimes() {
        for (int p : new int[] {2, 3}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(p, 1));
            assertEquals("p = 2 and p = 3 are not supported: the recipes used here assume p ≥ 5", e.getMessage());
            assertThrows(IllegalArgumentException.class, () -> LocalShape.reducible(p, LocalShape.Kind.SPLIT, 0, 0));
        }
        for (int p : new int[] {-5, 0, 1, 4, 9, 25, 49}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(p, 1));
            assertEquals("p = " + p + " is not a prime", e.getMessage());
        }
        assertThrows(IllegalArgumentException.class, () -> LocalShape.irreducible(46349, 1));
    }

    @Test
    void parseTableColumns() {
        assertEquals(LocalShape.irreducible(5, 7), LocalShape.parse(5, "irreducible", " 7 "));
        assertEquals(LocalShape.reducible(5, LocalShape.Kind.SPLIT, 1, 3), LocalShape.parse(5, "Split", "3; 1"));
        assertEquals(LocalShape.reducible(5, LocalShape.Kind.NONSPLIT, 1, 2), LocalShape.parse(5, "nonsplit", "1;2"));
        assertEquals(LocalShape.reducible(5, LocalShape.Kind.TRES, 1, 0), LocalShape.parse(5, "tres", "1;0"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "ordinary", "1;0"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "irreducible", "1;2"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "split", "1"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "split", "1;2;3"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "split", "1;x"));
        assertTrue(e.getMessage().contains("exponent b"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse(5, "tres", "2;0"));
    }

    /** Every shape for a few p prints and parses back to itself; kind word and exponents too. */
    @Test
    void textRoundTrip() {
        for (int p : new int[] {5, 7, 13}) {
            for (LocalShape rho : SerreWeightsConsistencyTest.allShapes(p)) {
                assertEquals(rho, LocalShape.parse(rho.toString()));
                assertEquals(rho, LocalShape.parse(p, rho.kind().word(), rho.exponents()));
            }
        }
        assertEquals("p=7 tres 3;2", LocalShape.reducible(7, LocalShape.Kind.TRES, 3, 2).toString());
        assertEquals("p=5 irreducible 7", LocalShape.irreducible(5, 7).toString());
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse("p=5 split"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse("q=5 split 1;0"));
        assertThrows(IllegalArgumentException.class, () -> LocalShape.parse("p=x split 1;0"));
    }

    /** Twisting by ω^j: ω = ω₂^{p+1}, so n moves by j(p + 1); (a, b) by (j, j). */
    @Test
    void twisting() {
        assertEquals(LocalShape.irreducible(5, 1 + 6), LocalShape.irreducible(5, 1).twist(1));
        assertEquals(LocalShape.reducible(5, LocalShape.Kind.TRES, 2, 1), LocalShape.reducible(5, LocalShape.Kind.TRES, 1, 0).twist(1));
        assertEquals(LocalShape.reducible(5, LocalShape.Kind.NONSPLIT, 0, 3), LocalShape.reducible(5, LocalShape.Kind.NONSPLIT, 1, 0).twist(-1));
        LocalShape rho = LocalShape.irreducible(11, 37);
        assertEquals(rho, rho.twist(10));
    }
}
