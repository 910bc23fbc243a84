package io.github.eigengate.arith;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Check values computed with PARI/GP 2.15 ({@code gp -q}); the exact command is given beside each
 * value.
 */
class NumberFieldTest {
    private static QPoly p(String s) {
        return QPoly.parse(s);
    }

    private static Rational q(String s) {
        return Rational.parse(s);
    }

    @Test
    void quadraticGoldenRatioField() {
        NumberField k = NumberField.of(p("x^2 - x - 1"));
        NumberField.Element a = k.element(p("3/2*x - 5"));
        // gp: f=x^2-x-1; a=Mod(3/2*x-5,f); charpoly(a) -> x^2 + 17/2*x + 61/4
        assertEquals(p("x^2 + 17/2*x + 61/4"), a.charPoly());
        // gp: norm(a) -> 61/4 ; trace(a) -> -17/2
        assertEquals(q("61/4"), a.norm());
        assertEquals(q("-17/2"), a.trace());
        // gp: lift(1/a) -> -6/61*x - 14/61
        assertEquals(k.element(p("-6/61*x - 14/61")), a.inverse());
        // gp: minpoly(a) -> 4*x^2 + 34*x + 61 (gp normalises to primitive integer; monic is x^2 + 17/2 x + 61/4)
        assertEquals(p("4*x^2 + 34*x + 61").monic(), a.minPoly());
        assertFalse(a.isAlgebraicInteger());
        assertTrue(k.generator().isAlgebraicInteger());
        assertEquals(k.one(), k.generator().pow(2).subtract(k.generator()));
        assertEquals("3/2*x - 5", a.toString());
        assertEquals("Q[x]/(x^2 - x - 1)", k.name());
    }

    @Test
    void pureCubicField() {
        NumberField k = NumberField.of(p("x^3 - 2"));
        NumberField.Element a = k.element(p("x^2 + x + 1"));
        // gp: f=x^3-2; a=Mod(x^2+x+1,f); charpoly(a) -> x^3 - 3*x^2 - 3*x - 1
        assertEquals(p("x^3 - 3*x^2 - 3*x - 1"), a.charPoly());
        // gp: norm(a) -> 1 ; trace(a) -> 3 ; lift(1/a) -> x - 1
        assertEquals(Rational.ONE, a.norm());
        assertEquals(q("3"), a.trace());
        assertEquals(k.element(p("x - 1")), a.inverse());
        assertEquals(k.element(p("x - 1")), a.pow(-1));
        assertEquals(k.fromRational(q("2")), k.generator().pow(3));
        assertEquals(k.element(p("x^5")), k.element(p("2x^2")));
        assertEquals(k.element(List.of(q("0"), q("0"), q("2"))), k.generator().pow(5));
    }

    @Test
    void degreeEightCyclotomicField() {
        // gp: polcyclo(15) -> x^8 - x^7 + x^5 - x^4 + x^3 - x + 1
        NumberField k = NumberField.of(p("x^8 - x^7 + x^5 - x^4 + x^3 - x + 1"));
        NumberField.Element a = k.element(p("x^3 - 2*x + 1/3"));
        // gp: f=polcyclo(15); a=Mod(x^3-2*x+1/3,f); charpoly(a)
        assertEquals(
                p("x^8 + 4/3*x^7 + 25/9*x^6 + 466/27*x^5 + 244/81*x^4 - 24314/243*x^3 - 56870/729*x^2"
                        + " + 275044/2187*x + 796111/6561"),
                a.charPoly());
        // gp: norm(a) -> 796111/6561 ; trace(a) -> -4/3
        assertEquals(q("796111/6561"), a.norm());
        assertEquals(q("-4/3"), a.trace());
        // gp: lift(1/a)
        assertEquals(
                k.element(p("445095/796111*x^7 - 413559/796111*x^6 - 112752/796111*x^5 + 441018/796111*x^4"
                        + " - 501210/796111*x^3 + 361773/796111*x^2 - 146484/796111*x - 525885/796111")),
                a.inverse());
        // x is a primitive 15th root of unity
        assertEquals(k.one(), k.generator().pow(15));
        assertFalse(k.generator().pow(5).equals(k.one()));
        assertEquals(k.generator().pow(-1), k.generator().pow(14));
    }

    @Test
    void nonIntegralDefiningPolynomial() {
        NumberField k = NumberField.of(p("x^3 + 1/2*x + 1/3"));
        NumberField.Element a = k.element(p("x^2 - 7"));
        // gp: f=x^3+1/2*x+1/3; a=Mod(x^2-7,f); charpoly(a) -> x^3 + 22*x^2 + 645/4*x + 14171/36
        assertEquals(p("x^3 + 22*x^2 + 645/4*x + 14171/36"), a.charPoly());
        // gp: norm(a) -> -14171/36 ; trace(a) -> -22 ; lift(1/a) -> -270/14171*x^2 + 12/14171*x - 2025/14171
        assertEquals(q("-14171/36"), a.norm());
        assertEquals(q("-22"), a.trace());
        assertEquals(k.element(p("-270/14171*x^2 + 12/14171*x - 2025/14171")), a.inverse());
        assertFalse(k.generator().isAlgebraicInteger());
    }

    @Test
    void reducibleAlgebraMinPolyAndZeroDivisors() {
        // gp: f=x^4-10*x^2+1; a=Mod(x^2-5,f); charpoly(a) -> x^4 - 48*x^2 + 576 ; minpoly(a) -> x^2 - 24
        NumberField k = NumberField.of(p("x^4 - 10*x^2 + 1"));
        NumberField.Element a = k.element(p("x^2 - 5"));
        assertEquals(p("x^4 - 48*x^2 + 576"), a.charPoly());
        assertEquals(p("x^2 - 24"), a.minPoly());
        // Q[x]/(x^2 - 1) is not a field: x - 1 has norm 0
        NumberField split = NumberField.of(p("x^2 - 1"));
        NumberField.Element z = split.element(p("x - 1"));
        assertEquals(Rational.ZERO, z.norm());
        assertThrows(ArithmeticException.class, z::inverse);
    }

    @Test
    void degreeOneField() {
        NumberField k = NumberField.of(p("x"));
        assertEquals(1, k.degree());
        assertEquals(k.zero(), k.generator());
        NumberField.Element a = k.fromRational(q("-5/7"));
        assertEquals(q("-5/7"), a.norm());
        assertEquals(q("-5/7"), a.trace());
        assertEquals(p("x + 5/7"), a.charPoly());
        assertTrue(a.isRational());
        assertEquals(k.fromRational(q("-7/5")), a.inverse());
        NumberField k2 = NumberField.of(p("x - 3"));
        assertEquals(k2.fromRational(q("3")), k2.generator());
        assertEquals(k2.fromRational(q("9")), k2.element(p("x^2")));
    }

    @Test
    void elementConstructionAndErrors() {
        NumberField k = NumberField.of(p("x^2 + 1"));
        assertThrows(IllegalArgumentException.class, () -> k.element(List.of(q("1"))));
        assertThrows(IllegalArgumentException.class, () -> NumberField.of(p("2x^2 + 1")));
        assertThrows(IllegalArgumentException.class, () -> NumberField.of(p("1")));
        assertThrows(IllegalArgumentException.class, () -> NumberField.of(QPoly.ZERO));
        NumberField other = NumberField.of(p("x^2 - 5"));
        IllegalArgumentException e =
                assertThrows(IllegalArgumentException.class, () -> k.add(k.one(), other.generator()));
        assertTrue(e.getMessage().contains("x^2 + 1") && e.getMessage().contains("x^2 - 5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> k.generator().multiply(other.generator()));
        assertEquals(k.generator(), NumberField.of(p("x^2 + 1")).generator());
        assertEquals(List.of(q("1/2"), q("-3")), k.element(p("-3x + 1/2")).coordinates());
        assertEquals(p("-3x + 1/2"), k.element(p("-3x + 1/2")).asPolynomial());
        assertEquals(BigInteger.TWO, k.element(p("-3x + 1/2")).commonDenominator());
        assertTrue(k.isZero(k.element(p("x^2 + 1"))));
        assertTrue(k.fromInteger(BigInteger.TEN).isRational());
        assertFalse(k.generator().isRational());
    }

    @Test
    void degreeTwentyWithLargeCoefficients() {
        // gp: polisirreducible(x^20-3*x+1) -> 1
        NumberField k = NumberField.of(p("x^20 - 3*x + 1"));
        List<Rational> c = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            c.add(Rational.of(BigInteger.TWO.pow(40).add(BigInteger.valueOf(i).pow(7)), BigInteger.valueOf(3 + i)));
        }
        NumberField.Element a = k.element(c);
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> {
            // gp: f=x^20-3*x+1; a=Mod(sum(i=0,19,(2^40+i^7)/(3+i)*x^i),f); trace(a) -> 671954456638505/66
            assertEquals(q("671954456638505/66"), a.trace());
            // gp: ... norm(a)
            assertEquals(
                    q("6293178946586219204319754753639952740914313601931435048794188028478759703281548223135319213804088092"
                            + "06982383661223899171134506141125065590860717342034266976960286117715688853806123751512551725927"
                            + "631176466883334347775879971236173186548889607444527079498751235008844313453725229210861273184499"
                            + "725252638689903420441177270423344466144146450453567627189726019401180614952835479388211/"
                            + "11495156245367714268666590262103684227564425815779358588822751641325563394902175204832903517849865"
                            + "871757538242663477147179417600000000000000000000"),
                    a.norm());
            // gp: ... polcoef(charpoly(a),10)
            assertEquals(
                    q("310202694644481721001214431730829757416788772996828283640507279357600987482134768699980681240074468"
                            + "5934391097819905081600971287923750794418796947886852986209238007480436209920901582641702853541/"
                            + "52975792870109335593165113763940297160564310918468863168348160000000000"),
                    a.charPoly().coefficient(10));
            NumberField.Element b = a;
            for (int i = 0; i < 20; i++) {
                b = b.multiply(a).add(k.generator());
            }
            assertEquals(b.multiply(a), a.multiply(b));
            assertEquals(k.one(), a.multiply(a.inverse()));
        });
    }

    /** Fixture: PARI/GP charpoly/norm/trace/inverse/power of Mod(a,f); script at the top of number-field-random.csv. */
    @Test
    void randomElementsAgreeWithPari() {
        int rows = 0;
        for (String[] row : Fixtures.rows("number-field-random.csv")) {
            NumberField k = NumberField.of(p(row[0]));
            NumberField.Element a = k.element(p(row[1]));
            String ctx = String.join(";", row);
            assertEquals(p(row[2]), a.charPoly(), ctx);
            assertEquals(q(row[3]), a.norm(), ctx);
            assertEquals(q(row[4]), a.trace(), ctx);
            assertEquals(k.element(p(row[5])), a.inverse(), ctx);
            assertEquals(k.element(p(row[6])), a.pow(5), ctx);
            assertEquals(k.element(p(row[5])).pow(5), a.pow(-5), ctx);
            rows++;
        }
        assertEquals(36, rows);
    }

    @Test
    void multiplicativityOnRandomElements() {
        Random rnd = new Random(31337L);
        NumberField k = NumberField.of(p("x^5 - x + 1/2"));
        for (int r = 0; r < 30; r++) {
            NumberField.Element a = random(k, rnd);
            NumberField.Element b = random(k, rnd);
            assertEquals(a.norm().multiply(b.norm()), a.multiply(b).norm());
            assertEquals(a.trace().add(b.trace()), a.add(b).trace());
            // Cayley–Hamilton
            QPoly cp = a.charPoly();
            NumberField.Element acc = k.zero();
            for (int i = cp.degree(); i >= 0; i--) {
                acc = acc.multiply(a).add(k.fromRational(cp.coefficient(i)));
            }
            assertTrue(acc.isZero());
        }
    }

    @Test
    void fieldAxioms() {
        Random rnd = new Random(11L);
        for (String f : new String[] {"x", "x^2 - x - 1", "x^3 + 1/2*x + 1/3", "x^8 - x^7 + x^5 - x^4 + x^3 - x + 1"}) {
            NumberField k = NumberField.of(p(f));
            FieldAxioms.check(k, () -> random(k, rnd), 40);
        }
    }

    static NumberField.Element random(NumberField k, Random rnd) {
        List<Rational> c = new ArrayList<>();
        for (int i = 0; i < k.degree(); i++) {
            c.add(rnd.nextInt(4) == 0 ? Rational.ZERO : Rational.of(BigInteger.valueOf(rnd.nextInt(41) - 20), BigInteger.valueOf(1 + rnd.nextInt(6))));
        }
        return k.element(c);
    }
}
