package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/**
 * Characters against definitions outside the code: the Legendre symbol by Euler's criterion (a^{(p−1)/2} mod p),
 * the Kronecker symbol (−4/·) and (5/·), and the conductors those symbols have by the quadratic reciprocity law
 * (Ireland–Rosen §5.2, §5.3: (d/·) is a character of conductor |d| for a fundamental discriminant d).
 */
class DirichletCharacterTest {

    private static DirichletCharacter of(int n, long[] g, long[] a, long[] b) {
        return DirichletCharacter.fromValues(n, g, a, b);
    }

    @Test
    void legendreSymbolModThirteenFromAGenerator() {
        // 2 is a primitive root mod 13 (2^6 = 64 ≡ −1 mod 13), so χ(2) = −1 is (·/13)
        DirichletCharacter chi = of(13, new long[] {2}, new long[] {1}, new long[] {2});
        assertEquals(2, chi.order());
        for (int n = 1; n < 13; n++) {
            int euler = BigInteger.valueOf(n).modPow(BigInteger.valueOf(6), BigInteger.valueOf(13)).intValue();
            assertEquals(euler == 1 ? 0 : 1, chi.exponent(n), "n=" + n);
        }
        assertEquals(13, chi.conductor());
        assertFalse(chi.isOdd()); // 13 ≡ 1 mod 4
    }

    @Test
    void orderSixModThirteen() {
        DirichletCharacter chi = of(13, new long[] {2}, new long[] {1}, new long[] {6});
        assertEquals(6, chi.order());
        assertEquals(1, chi.exponent(2));
        // 2^6 = 64 ≡ −1 mod 13, so χ(−1) = ζ_6^6 = 1: χ is even; 2^4 = 16 ≡ 3, so χ(3) = ζ_6^4
        assertEquals(0, chi.exponent(12));
        assertFalse(chi.isOdd());
        assertEquals(4, chi.exponent(3));
        assertEquals(13, chi.conductor());
    }

    @Test
    void kroneckerMinusFourModTwentyWithRedundantGenerators() {
        // (−4/n): n ≡ 1 mod 4 → 1, n ≡ 3 mod 4 → −1; mod 20 given on 11 (≡ 3 mod 4) and 17 (≡ 1 mod 4), with an
        // unreduced fraction and a redundant third generator 3
        DirichletCharacter chi = of(20, new long[] {11, 17, 3}, new long[] {2, 0, 1}, new long[] {4, 1, 2});
        assertEquals(2, chi.order());
        for (int n = 1; n < 20; n += 2) {
            if (n % 5 == 0) {
                continue;
            }
            assertEquals(n % 4 == 1 ? 0 : 1, chi.exponent(n), "n=" + n);
        }
        assertEquals(4, chi.conductor());
        assertTrue(chi.isOdd());
        assertEquals(DirichletCharacter.fromValues(4, new long[] {3}, new long[] {1}, new long[] {2}), chi.restrictTo(4));
    }

    @Test
    void aTrivialCharacterGivenByValuesEqualsTheTrivialOne() {
        assertEquals(DirichletCharacter.trivial(13), of(13, new long[] {2}, new long[] {0}, new long[] {1}));
        assertEquals(DirichletCharacter.trivial(20), of(20, new long[] {11, 17}, new long[] {2, 3}, new long[] {2, 3}));
        assertEquals("1", of(13, new long[] {2}, new long[] {6}, new long[] {6}).cell());
    }

    @Test
    void inconsistentOrNonGeneratingValuesAreRejected() {
        // 4 = 2^2 mod 13 so χ(4) must be χ(2)^2
        assertThrows(IllegalArgumentException.class,
                () -> of(13, new long[] {2, 4}, new long[] {1, 1}, new long[] {6, 6}));
        // 4 generates only the squares mod 13
        assertThrows(IllegalArgumentException.class, () -> of(13, new long[] {4}, new long[] {1}, new long[] {6}));
        assertThrows(IllegalArgumentException.class, () -> of(20, new long[] {5}, new long[] {1}, new long[] {2}));
    }

    @Test
    void cellRoundTripsAndGaloisOrbits() {
        // mod 21 = 3·7: 8 ≡ (2, 1) and 10 ≡ (1, 3) generate (3 is a primitive root mod 7); χ trivial mod 3
        DirichletCharacter chi = of(21, new long[] {8, 10}, new long[] {0, 1}, new long[] {1, 6});
        assertEquals(6, chi.order());
        assertEquals(7, chi.conductor());
        // 2 and 5 do generate (Z/21)^× too, but 5^2 ≡ 4 = 2^2, so χ(2) = ζ_6, χ(5) = 1 is no character
        assertThrows(IllegalArgumentException.class,
                () -> of(21, new long[] {2, 5}, new long[] {1, 0}, new long[] {6, 1}));
        String[] parts = chi.cell().split(";");
        long[] g = new long[parts.length];
        long[] a = new long[parts.length];
        long[] b = new long[parts.length];
        for (int i = 0; i < parts.length; i++) {
            String[] ga = parts[i].split("[:/]");
            g[i] = Long.parseLong(ga[0]);
            a[i] = Long.parseLong(ga[1]);
            b[i] = Long.parseLong(ga[2]);
        }
        assertEquals(chi, of(21, g, a, b));
        assertTrue(chi.isGaloisConjugate(chi.pow(5)));
        assertTrue(chi.isGaloisConjugate(chi.conjugate()));
        assertFalse(chi.isGaloisConjugate(chi.pow(2)));
        assertEquals(2, chi.orbitSize());
        assertEquals(7, chi.conductorPart(7));
        assertEquals(1, chi.conductorPart(3));
    }

    @Test
    void primeToPartAndConductorOfKroneckerFive() {
        // (5/·) mod 40 times (−4/·) is (−20/·): conductor 20; its prime-to-2 part is (5/·) mod 5
        DirichletCharacter minus4 = DirichletCharacter.fromValues(4, new long[] {3}, new long[] {1}, new long[] {2})
                .lift(40);
        DirichletCharacter five = DirichletCharacter.fromValues(5, new long[] {2}, new long[] {1}, new long[] {2})
                .lift(40);
        DirichletCharacter d = minus4.multiply(five);
        assertEquals(20, d.conductor());
        assertEquals(4, d.conductorPart(2));
        assertEquals(five.restrictTo(5), d.primeToPart(2));
        for (int n = 1; n < 40; n += 2) {
            if (n % 5 != 0) {
                int legendre5 = (n % 5 == 1 || n % 5 == 4) ? 0 : 1;
                int m4 = n % 4 == 1 ? 0 : 1;
                assertEquals((legendre5 + m4) % 2, d.exponent(n), "n=" + n);
            }
        }
    }

    @Test
    void conductorsOfPrimePowerCharacters() {
        // mod 9: 2 is a primitive root; χ(2) = ζ_6 has order 6 = φ(9), primitive; χ(2) = ζ_2 factors through mod 3
        assertEquals(9, of(9, new long[] {2}, new long[] {1}, new long[] {6}).conductor());
        assertEquals(3, of(9, new long[] {2}, new long[] {1}, new long[] {2}).conductor());
        // mod 16: (Z/16)^× = ⟨−1⟩ × ⟨5⟩; χ(−1) = 1, χ(5) = i has conductor 16; χ(5) = −1 conductor 8
        assertEquals(16, of(16, new long[] {15, 5}, new long[] {0, 1}, new long[] {1, 4}).conductor());
        assertEquals(8, of(16, new long[] {15, 5}, new long[] {0, 1}, new long[] {1, 2}).conductor());
        assertEquals(1, DirichletCharacter.trivial(1).conductor());
    }
}
