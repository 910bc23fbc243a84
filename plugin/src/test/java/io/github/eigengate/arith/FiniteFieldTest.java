package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class FiniteFieldTest {
    private static FiniteField field(long p, String g) {
        return FiniteField.of(FpPoly.parse(g, p));
    }

    /** Fixture: PARI/GP {@code polrootsmod(h,[g,p])}; script at the top of finite-field-roots.csv. */
    @Test
    void rootsAgreeWithPari() {
        int rows = 0;
        for (String[] row : Fixtures.rows("finite-field-roots.csv")) {
            long p = Long.parseLong(row[1]);
            FiniteField k = field(p, row[2]);
            List<FiniteField.Element> expected = new ArrayList<>();
            if (!row[3].isEmpty()) {
                for (String r : row[3].split(",")) {
                    expected.add(k.element(FpPoly.parse(r, p)));
                }
            }
            FpPoly h = FpPoly.parse(row[0], p);
            List<FiniteField.Element> got = k.roots(h);
            assertEquals(expected, got, String.join(";", row));
            for (FiniteField.Element r : got) {
                assertTrue(k.evaluate(h, r).isZero());
            }
            rows++;
        }
        assertEquals(17, rows);
    }

    /** Fixture: PARI/GP arithmetic with {@code Mod(Mod(a,p),g)}; script at the top of finite-field-arith.csv. */
    @Test
    void arithmeticAgreesWithPari() {
        for (String[] row : Fixtures.rows("finite-field-arith.csv")) {
            long p = Long.parseLong(row[0]);
            FiniteField k = field(p, row[1]);
            FiniteField.Element a = k.element(FpPoly.parse(row[2], p));
            FiniteField.Element b = k.element(FpPoly.parse(row[3], p));
            String ctx = String.join(";", row);
            assertEquals(k.element(FpPoly.parse(row[4], p)), a.multiply(b), ctx);
            assertEquals(k.element(FpPoly.parse(row[5], p)), a.multiply(b.inverse()), ctx);
            assertEquals(k.element(FpPoly.parse(row[6], p)), a.pow(BigInteger.valueOf(1000)), ctx);
            assertEquals(k.element(FpPoly.parse(row[7], p)), a.pow(BigInteger.valueOf(-7)), ctx);
        }
    }

    @Test
    void fieldAxioms() {
        Random rnd = new Random(77L);
        List<FiniteField> fields = List.of(
                FiniteField.primeField(2),
                FiniteField.primeField(3),
                FiniteField.primeField(101),
                field(2, "x^5 + x^2 + 1"),
                field(3, "x^4 + 2*x^3 + 2"),
                field(101, "x + 7"));
        for (FiniteField k : fields) {
            FieldAxioms.check(k, () -> random(k, rnd), 200);
            // Fermat: a^q = a
            for (int t = 0; t < 20; t++) {
                FiniteField.Element a = random(k, rnd);
                assertEquals(a, a.pow(k.order()));
            }
        }
    }

    @Test
    void basics() {
        FiniteField f32 = field(2, "x^5 + x^2 + 1");
        assertEquals(2, f32.prime());
        assertEquals(5, f32.degree());
        assertEquals(BigInteger.valueOf(32), f32.order());
        assertEquals("F_2[x]/(x^5 + x^2 + 1)", f32.name());
        assertEquals("F_7", FiniteField.primeField(7).name());
        assertEquals("x", f32.generator().toString());
        assertEquals(f32.one(), f32.generator().pow(BigInteger.valueOf(31)));
        assertEquals(f32.fromLong(1), f32.fromLong(-1));
        assertEquals(f32.zero(), f32.fromLong(6));
        FiniteField f7 = field(7, "x + 3");
        assertEquals(f7.fromLong(4), f7.generator());
        assertEquals(f7.fromLong(2), f7.fromInteger(BigInteger.valueOf(-5)));
        assertThrows(IllegalArgumentException.class, () -> field(3, "x^4 + 1"));
        assertThrows(IllegalArgumentException.class, () -> field(3, "2x^2 + 1"));
        assertThrows(IllegalArgumentException.class, () -> f32.add(f32.one(), FiniteField.primeField(2).one()));
        IllegalArgumentException e =
                assertThrows(IllegalArgumentException.class, () -> f32.multiply(f32.one(), field(2, "x^5 + x^3 + 1").one()));
        assertTrue(e.getMessage().contains("x^5 + x^2 + 1") && e.getMessage().contains("x^5 + x^3 + 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> f32.element(FpPoly.x(3)));
        assertThrows(IllegalArgumentException.class, () -> f32.roots(FpPoly.zero(2)));
        assertThrows(ArithmeticException.class, () -> f32.zero().pow(BigInteger.valueOf(-1)));
        assertEquals(f32.one(), f32.zero().pow(BigInteger.ZERO));
        assertEquals(f32.zero(), f32.zero().pow(BigInteger.TEN));
        assertEquals(field(2, "x^5 + x^2 + 1"), f32);
    }

    /** Embeddings between two models of F_{3^4}: images of the generator are the roots of its modulus. */
    @Test
    void embeddingsBetweenModelsOfTheSameField() {
        FiniteField a = field(3, "x^4 + 2*x^3 + 2");
        FiniteField b = field(3, "x^4 + x + 2");
        List<FiniteField.Element> images = b.roots(a.modulus());
        assertEquals(4, images.size());
        Random rnd = new Random(3L);
        for (FiniteField.Element img : images) {
            // the map h(x) -> h(img) is a ring homomorphism a -> b
            for (int t = 0; t < 20; t++) {
                FiniteField.Element u = random(a, rnd);
                FiniteField.Element v = random(a, rnd);
                FiniteField.Element mu = b.evaluate(u.multiply(v).value(), img);
                assertEquals(b.evaluate(u.value(), img).multiply(b.evaluate(v.value(), img)), mu);
            }
        }
    }

    static FiniteField.Element random(FiniteField k, Random rnd) {
        long[] c = new long[k.degree()];
        for (int i = 0; i < c.length; i++) {
            c[i] = Math.floorMod(rnd.nextLong(), k.prime());
        }
        return k.element(FpPoly.of(k.prime(), c));
    }
}
