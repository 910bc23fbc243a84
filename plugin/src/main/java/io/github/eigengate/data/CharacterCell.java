package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import java.math.BigInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The {@code character} cell: empty or {@code 1} for the trivial character, otherwise {@code g:a/b} pairs joined by
 * {@code ;} (spaces allowed), meaning χ(g) = exp(2πi·a/b). Any generating set is accepted, redundant generators and
 * unreduced fractions included; the generators and the homomorphism property are verified exactly
 * ({@link DirichletCharacter#fromValues}).
 */
public final class CharacterCell {

    /** What the column expects, as findings say it. */
    public static final String EXPECTED =
            "empty, 1, or g:a/b pairs joined by ';' with units 1 < g < N that generate (Z/NZ)^×";

    private static final Pattern PAIR = Pattern.compile("\\s*(-?\\d+)\\s*:\\s*(-?\\d+)\\s*/\\s*(-?\\d+)\\s*");
    private static final int MAX_PAIRS = 64;

    private CharacterCell() {
    }

    /** A parsed cell: the character, or why it is not one. */
    public record Parsed(DirichletCharacter character, String problem) {
        public boolean ok() {
            return character != null;
        }
    }

    /** Parses the cell for modulus N. Never throws on bad text. */
    public static Parsed parse(String text, int modulus) {
        String t = text.strip();
        if (t.isEmpty() || t.equals("1")) {
            return new Parsed(DirichletCharacter.trivial(modulus), null);
        }
        String[] parts = t.split(";", -1);
        if (parts.length > MAX_PAIRS) {
            return fail("at most " + MAX_PAIRS + " generators are accepted, found " + parts.length);
        }
        long[] g = new long[parts.length];
        long[] a = new long[parts.length];
        long[] b = new long[parts.length];
        for (int i = 0; i < parts.length; i++) {
            Matcher m = PAIR.matcher(parts[i]);
            if (!m.matches()) {
                return fail("pair " + (i + 1) + " '" + parts[i].strip() + "' is not of the form g:a/b");
            }
            Long gi = small(m.group(1));
            Long ai = small(m.group(2));
            Long bi = small(m.group(3));
            if (gi == null || ai == null || bi == null) {
                return fail("pair " + (i + 1) + " has a number too large for a character mod " + modulus);
            }
            if (bi <= 0) {
                return fail("pair " + (i + 1) + " has denominator " + bi + "; it must be positive");
            }
            g[i] = gi;
            a[i] = ai;
            b[i] = bi;
        }
        if (modulus <= 2) {
            return fail("every character mod " + modulus + " is trivial; write 1 or leave the cell empty");
        }
        for (int i = 0; i < g.length; i++) {
            long order = multiplicativeOrder(g[i], modulus);
            long den = b[i] / gcd(Math.floorMod(a[i], b[i]), b[i]);
            if (order > 0 && order % den != 0) {
                return fail("χ(" + g[i] + ") = exp(2πi·" + a[i] + "/" + b[i] + ") has order " + den
                        + ", which does not divide the order " + order + " of " + g[i] + " mod " + modulus);
            }
        }
        try {
            return new Parsed(DirichletCharacter.fromValues(modulus, g, a, b), null);
        } catch (IllegalArgumentException e) {
            return fail(e.getMessage());
        }
    }

    /** The order of g in (Z/NZ)^×, or 0 when g is not a unit or N is too large to walk (fromValues reports). */
    private static long multiplicativeOrder(long g, int modulus) {
        if (modulus > DirichletCharacter.MAX_MODULUS || gcd(Math.floorMod(g, modulus), modulus) != 1) {
            return 0;
        }
        long x = Math.floorMod(g, modulus);
        long r = x;
        for (long k = 1; k <= modulus; k++) {
            if (r == 1 % modulus) {
                return k;
            }
            r = r * x % modulus;
        }
        return 0;
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return Math.abs(a);
    }

    private static Parsed fail(String why) {
        return new Parsed(null, why);
    }

    private static Long small(String digits) {
        if (digits.length() > 12) {
            return null;
        }
        BigInteger v = new BigInteger(digits);
        return v.abs().compareTo(BigInteger.valueOf(1_000_000_000_000L)) > 0 ? null : v.longValue();
    }
}
