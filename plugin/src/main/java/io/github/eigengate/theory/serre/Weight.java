package io.github.eigengate.theory.serre;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * A Serre weight of GL2(F_p): the irreducible F̄_p-representation σ = Sym^r F̄_p² ⊗ det^s of GL2(F_p)
 * with 0 ≤ r ≤ p − 1 and 0 ≤ s ≤ p − 2.
 *
 * <p>These p(p − 1) representations are pairwise non-isomorphic and exhaust the irreducible
 * F̄_p-representations of GL2(F_p) (Brauer–Nesbitt; the parametrisation of Buzzard–Diamond–Jarvis,
 * Duke Math. J. 155 (2010), §2 — section from memory). So (r, s) in these ranges is a canonical
 * form; det^s only matters modulo p − 1 because det takes values in F_p^×.
 *
 * <p>The record itself only checks r ≥ 0 and s ≥ 0, because p is not part of the value; use
 * {@link #of(int, int, int)}, {@link #parse(String, int)} or {@link #parseSet(String, int)} to check
 * the upper bounds for a given p.
 *
 * <p>Text form: {@code (r,s)}. Sets are written {@code (r,s);(r,s);...} in the canonical order of
 * {@link #compareTo(Weight)}: increasing r, then increasing s (the order of the pair as written).
 *
 * @param r the symmetric power, 0 ≤ r ≤ p − 1
 * @param s the power of the determinant, 0 ≤ s ≤ p − 2
 */
public record Weight(int r, int s) implements Comparable<Weight> {

    /**
     * @throws IllegalArgumentException if r &lt; 0 or s &lt; 0
     */
    public Weight {
        if (r < 0 || s < 0) {
            throw new IllegalArgumentException("Serre weight (" + r + "," + s + "): r and s must be ≥ 0");
        }
    }

    /**
     * Returns Sym^r ⊗ det^s for GL2(F_p), checking the canonical ranges.
     *
     * @throws IllegalArgumentException if p is not a supported prime (see {@link LocalShape}), or
     *     r ∉ [0, p − 1], or s ∉ [0, p − 2]
     */
    public static Weight of(int r, int s, int p) {
        Primes.requireSupported(p);
        if (r < 0 || r > p - 1) {
            throw new IllegalArgumentException("r = " + r + " is out of range 0.." + (p - 1) + " for p = " + p);
        }
        if (s < 0 || s > p - 2) {
            throw new IllegalArgumentException("s = " + s + " is out of range 0.." + (p - 2) + " for p = " + p);
        }
        return new Weight(r, s);
    }

    /** Returns true iff 0 ≤ r ≤ p − 1 and 0 ≤ s ≤ p − 2. */
    public boolean isWeightFor(int p) {
        return r <= p - 1 && s <= p - 2;
    }

    /** The dimension r + 1 of Sym^r. */
    public int dimension() {
        return r + 1;
    }

    /**
     * Returns σ ⊗ det^j = Sym^r ⊗ det^{(s + j) mod (p − 1)}; j may be negative.
     *
     * @throws IllegalArgumentException if p is not supported or this is not a weight for p
     */
    public Weight twist(int j, int p) {
        requireFor(p);
        return new Weight(r, Math.floorMod((long) s + j, p - 1));
    }

    /** Canonical order: by r, then by s. */
    @Override
    public int compareTo(Weight o) {
        int c = Integer.compare(r, o.r);
        return c != 0 ? c : Integer.compare(s, o.s);
    }

    /** Returns {@code (r,s)}; {@link #parse(String, int)} reads it back. */
    @Override
    public String toString() {
        return "(" + r + "," + s + ")";
    }

    /**
     * Parses one weight {@code (r,s)}; whitespace between tokens is ignored.
     *
     * @throws IllegalArgumentException on a syntax error, or if (r, s) is out of range for p; the
     *     message names the 1-based column of the offending character
     */
    public static Weight parse(String text, int p) {
        Primes.requireSupported(p);
        Scanner sc = new Scanner(text, p, "weight");
        sc.skipSpace();
        Weight w = sc.weight();
        sc.skipSpace();
        if (!sc.atEnd()) {
            throw sc.error("unexpected '" + sc.peek() + "' after the weight");
        }
        return w;
    }

    /**
     * Parses a set of weights written {@code (r,s);(r,s);...}.
     *
     * <p>Whitespace between tokens is ignored (not inside a number); the empty or blank string is the
     * empty set. The order of the items is free, but the same weight twice is an error.
     *
     * @param p the prime, used to check 0 ≤ r ≤ p − 1 and 0 ≤ s ≤ p − 2
     * @return an unmodifiable set, iterating in canonical order
     * @throws IllegalArgumentException on a syntax error, an out-of-range entry or a duplicate; the
     *     message quotes the input and names the 1-based column
     * @throws NullPointerException if text is null
     */
    public static Set<Weight> parseSet(String text, int p) {
        Primes.requireSupported(p);
        Scanner sc = new Scanner(text, p, "weight set");
        SortedSet<Weight> out = new TreeSet<>();
        sc.skipSpace();
        if (sc.atEnd()) {
            return Collections.unmodifiableSortedSet(out);
        }
        while (true) {
            sc.skipSpace();
            int start = sc.pos;
            Weight w = sc.weight();
            if (!out.add(w)) {
                throw sc.errorAt(start, "duplicate weight " + w);
            }
            sc.skipSpace();
            if (sc.atEnd()) {
                return Collections.unmodifiableSortedSet(out);
            }
            if (sc.peek() != ';') {
                throw sc.error("expected ';' between weights but found '" + sc.peek() + "'");
            }
            sc.pos++;
        }
    }

    /**
     * Writes a collection of weights as {@code (r,s);(r,s);...} in canonical order (by r, then s),
     * without spaces; duplicates are written once. The empty collection gives the empty string.
     * For every p, {@code parseSet(formatSet(w), p)} equals {@code Set.copyOf(w)} when all members
     * are weights for p.
     */
    public static String formatSet(Collection<Weight> weights) {
        List<Weight> sorted = new ArrayList<>(new TreeSet<>(weights));
        StringBuilder sb = new StringBuilder();
        for (Weight w : sorted) {
            if (sb.length() > 0) {
                sb.append(';');
            }
            sb.append(w);
        }
        return sb.toString();
    }

    private void requireFor(int p) {
        Primes.requireSupported(p);
        if (!isWeightFor(p)) {
            throw new IllegalArgumentException(this + " is not a Serre weight for p = " + p);
        }
    }

    /** Hand-written scanner so that errors can name a column of the original text. */
    private static final class Scanner {
        private final String text;
        private final int p;
        private final String label;
        private int pos;

        Scanner(String text, int p, String label) {
            if (text == null) {
                throw new NullPointerException("weight text is null");
            }
            this.text = text;
            this.p = p;
            this.label = label;
        }

        boolean atEnd() {
            return pos >= text.length();
        }

        char peek() {
            return text.charAt(pos);
        }

        void skipSpace() {
            while (!atEnd() && Character.isWhitespace(peek())) {
                pos++;
            }
        }

        void expect(char c) {
            skipSpace();
            if (atEnd()) {
                throw error("expected '" + c + "' but the text ended");
            }
            if (peek() != c) {
                throw error("expected '" + c + "' but found '" + peek() + "'");
            }
            pos++;
        }

        Weight weight() {
            expect('(');
            skipSpace();
            int rPos = pos;
            long r = integer();
            expect(',');
            skipSpace();
            int sPos = pos;
            long s = integer();
            expect(')');
            if (r < 0 || r > p - 1) {
                throw errorAt(rPos, "r = " + r + " is out of range 0.." + (p - 1) + " for p = " + p);
            }
            if (s < 0 || s > p - 2) {
                throw errorAt(sPos, "s = " + s + " is out of range 0.." + (p - 2) + " for p = " + p);
            }
            return new Weight((int) r, (int) s);
        }

        /** An optionally signed decimal integer; values beyond 10 digits are rejected as out of range. */
        long integer() {
            int start = pos;
            boolean negative = false;
            if (!atEnd() && (peek() == '-' || peek() == '+')) {
                negative = peek() == '-';
                pos++;
            }
            int digitsStart = pos;
            while (!atEnd() && peek() >= '0' && peek() <= '9') {
                pos++;
            }
            if (pos == digitsStart) {
                pos = start;
                throw error(atEnd() ? "expected an integer but the text ended"
                        : "expected an integer but found '" + peek() + "'");
            }
            if (pos - digitsStart > 10) {
                throw errorAt(start, "integer " + text.substring(start, pos) + " is out of range");
            }
            long v = Long.parseLong(text.substring(digitsStart, pos));
            return negative ? -v : v;
        }

        IllegalArgumentException error(String what) {
            return errorAt(pos, what);
        }

        IllegalArgumentException errorAt(int at, String what) {
            return new IllegalArgumentException(
                    label + " \"" + text + "\", column " + (at + 1) + ": " + what);
        }
    }
}
