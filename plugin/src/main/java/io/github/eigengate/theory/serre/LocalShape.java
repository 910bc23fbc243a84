package io.github.eigengate.theory.serre;

import java.util.Locale;
import java.util.Objects;

/**
 * The local shape at p of an odd representation ρ̄ : G_Q → GL2(F̄_p): its restriction to the inertia
 * group I_p, together with the peu/très ramifié distinction where that notion applies.
 *
 * <p>Notation: ω is the mod-p cyclotomic character (fundamental character of level 1) and ω₂ a
 * fundamental character of level 2, so ω₂^{p+1} = ω, ω₂ has order p² − 1 and ω has order p − 1
 * (Serre, Duke Math. J. 54 (1987), §2.1). The four kinds are:
 * <ul>
 *   <li>{@link Kind#IRREDUCIBLE}: ρ̄|I_p ≅ ω₂^n ⊕ ω₂^{pn} with n ≢ 0 mod p + 1 (level 2; this is
 *       exactly the condition for ω₂^n ≠ ω₂^{pn}, i.e. for ρ̄|G_{Q_p} to be irreducible).</li>
 *   <li>{@link Kind#SPLIT}: ρ̄|I_p ≅ ω^a ⊕ ω^b (tame, semisimple).</li>
 *   <li>{@link Kind#NONSPLIT}: ρ̄|I_p ≅ (ω^a * ; 0 ω^b) with * ≠ 0 on I_p, i.e. a non-split extension of
 *       ω^b (quotient) by ω^a (sub); when a − b ≡ 1 mod p − 1 it is moreover peu ramifié
 *       (Serre 1987, §2.4).</li>
 *   <li>{@link Kind#TRES}: as NONSPLIT but très ramifié; this requires a − b ≡ 1 mod p − 1.</li>
 * </ul>
 *
 * <p>Canonical form (so that equal representations give equal values):
 * <ul>
 *   <li>irreducible: n is replaced by the least non-negative residue of {n, pn} modulo p² − 1
 *       (ω₂^n ⊕ ω₂^{pn} does not see the order of the two summands);</li>
 *   <li>reducible: a and b are reduced to [0, p − 2]; for SPLIT the pair is ordered a ≤ b, since
 *       ω^a ⊕ ω^b ≅ ω^b ⊕ ω^a. For NONSPLIT and TRES the order is meaningful: a is the sub, b the
 *       quotient.</li>
 * </ul>
 *
 * <p>Text forms: the table columns are a kind word {@code irreducible|split|nonsplit|tres} and an
 * exponent string {@code n} or {@code a;b}, read by {@link #parse(int, String, String)}; the whole value
 * prints as {@code p=5 nonsplit 1;2} and is read back by {@link #parse(String)}.
 */
public final class LocalShape {

    /** The kind of ρ̄|G_{Q_p}; see the class comment. */
    public enum Kind {
        IRREDUCIBLE, SPLIT, NONSPLIT, TRES;

        /** The table word: {@code irreducible}, {@code split}, {@code nonsplit} or {@code tres}. */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }

        /**
         * Reads a table word (case-insensitive, surrounding whitespace ignored).
         *
         * @throws IllegalArgumentException if the word is not one of the four
         */
        public static Kind fromWord(String word) {
            Objects.requireNonNull(word, "kind word");
            String w = word.strip().toLowerCase(Locale.ROOT);
            for (Kind k : values()) {
                if (k.word().equals(w)) {
                    return k;
                }
            }
            throw new IllegalArgumentException(
                    "unknown shape word \"" + word + "\": expected irreducible, split, nonsplit or tres");
        }
    }

    private final int p;
    private final Kind kind;
    /** Canonical exponent for IRREDUCIBLE, else 0. */
    private final int n;
    /** Sub and quotient exponents in [0, p − 2] for the reducible kinds, else 0. */
    private final int a;
    private final int b;

    private LocalShape(int p, Kind kind, int n, int a, int b) {
        this.p = p;
        this.kind = kind;
        this.n = n;
        this.a = a;
        this.b = b;
    }

    /**
     * Returns the shape ρ̄|I_p ≅ ω₂^n ⊕ ω₂^{pn}.
     *
     * @param n any integer; it is taken modulo p² − 1 and then canonicalised (see class comment)
     * @throws IllegalArgumentException if p is not a prime ≥ 5 (p = 2, 3 have their own message), or if
     *     n ≡ 0 mod p + 1, in which case ω₂^n = ω^{n/(p+1)} has level 1 and the sum is reducible
     */
    public static LocalShape irreducible(int p, long n) {
        Primes.requireSupported(p);
        long q = (long) p * p - 1;
        long m = Math.floorMod(n, q);
        if (m % (p + 1) == 0) {
            throw new IllegalArgumentException("irreducible shape with n = " + n + " for p = " + p
                    + ": n ≡ 0 mod p + 1 = " + (p + 1) + ", so ω₂^n = ω^" + (m / (p + 1))
                    + " has level 1 and ω₂^n ⊕ ω₂^{pn} is reducible; use split/nonsplit instead");
        }
        long conj = (m * p) % q;
        return new LocalShape(p, Kind.IRREDUCIBLE, (int) Math.min(m, conj), 0, 0);
    }

    /**
     * Returns the reducible shape ρ̄|I_p ≅ (ω^a * ; 0 ω^b) of the given kind.
     *
     * @param kind SPLIT, NONSPLIT or TRES
     * @param a exponent of the sub (any integer, taken mod p − 1)
     * @param b exponent of the quotient (any integer, taken mod p − 1)
     * @throws IllegalArgumentException if p is not a supported prime, kind is IRREDUCIBLE, or kind is
     *     TRES and a − b ≢ 1 mod p − 1 (très ramifié only makes sense for an extension of ω^b by
     *     ω^{b+1}, Serre 1987, §2.4)
     * @throws NullPointerException if kind is null
     */
    public static LocalShape reducible(int p, Kind kind, long a, long b) {
        Primes.requireSupported(p);
        Objects.requireNonNull(kind, "kind");
        if (kind == Kind.IRREDUCIBLE) {
            throw new IllegalArgumentException("reducible(...) needs kind split, nonsplit or tres, not irreducible");
        }
        int ra = (int) Math.floorMod(a, (long) p - 1);
        int rb = (int) Math.floorMod(b, (long) p - 1);
        if (kind == Kind.TRES && Math.floorMod(ra - rb, p - 1) != 1) {
            throw new IllegalArgumentException("très ramifié shape with a = " + a + ", b = " + b + " for p = " + p
                    + ": très ramifié needs a − b ≡ 1 mod p − 1 = " + (p - 1));
        }
        if (kind == Kind.SPLIT && ra > rb) {
            return new LocalShape(p, kind, 0, rb, ra);
        }
        return new LocalShape(p, kind, 0, ra, rb);
    }

    /**
     * Reads the table columns: a kind word and an exponent string ({@code n} for irreducible,
     * {@code a;b} otherwise; signed decimal integers, whitespace around them ignored).
     *
     * @throws IllegalArgumentException if the word or the exponents are malformed, or the shape is
     *     rejected by {@link #irreducible(int, long)} / {@link #reducible(int, Kind, long, long)}
     */
    public static LocalShape parse(int p, String kindWord, String exponents) {
        Kind kind = Kind.fromWord(kindWord);
        Objects.requireNonNull(exponents, "exponents");
        if (kind == Kind.IRREDUCIBLE) {
            if (exponents.indexOf(';') >= 0) {
                throw new IllegalArgumentException("irreducible shape takes one exponent n, got \"" + exponents + "\"");
            }
            return irreducible(p, parseExponent(exponents, "n"));
        }
        String[] parts = exponents.split(";", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException(
                    kind.word() + " shape takes two exponents \"a;b\", got \"" + exponents + "\"");
        }
        return reducible(p, kind, parseExponent(parts[0], "a"), parseExponent(parts[1], "b"));
    }

    /**
     * Reads the form printed by {@link #toString()}: {@code p=<prime> <word> <exponents>}, tokens
     * separated by whitespace.
     *
     * @throws IllegalArgumentException if the text does not have that form or the shape is invalid
     */
    public static LocalShape parse(String text) {
        Objects.requireNonNull(text, "text");
        String[] tokens = text.strip().split("\\s+");
        if (tokens.length != 3 || !tokens[0].startsWith("p=")) {
            throw new IllegalArgumentException(
                    "local shape \"" + text + "\": expected \"p=<prime> <kind> <exponents>\"");
        }
        int p;
        try {
            p = Integer.parseInt(tokens[0].substring(2));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("local shape \"" + text + "\": p is not an integer", e);
        }
        return parse(p, tokens[1], tokens[2]);
    }

    private static long parseExponent(String s, String name) {
        try {
            return Long.parseLong(s.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("exponent " + name + " = \"" + s + "\" is not an integer", e);
        }
    }

    /** The prime p (≥ 5). */
    public int p() {
        return p;
    }

    /** The kind. */
    public Kind kind() {
        return kind;
    }

    /** True iff the kind is IRREDUCIBLE. */
    public boolean isIrreducible() {
        return kind == Kind.IRREDUCIBLE;
    }

    /**
     * The canonical level-2 exponent n ∈ [0, p² − 2]: the lesser of the residues of n and pn.
     *
     * @throws IllegalStateException if the shape is reducible
     */
    public int n() {
        if (kind != Kind.IRREDUCIBLE) {
            throw new IllegalStateException("n() is only defined for irreducible shapes, this is " + this);
        }
        return n;
    }

    /**
     * The exponent a ∈ [0, p − 2] of the sub ω^a (for SPLIT: the smaller exponent).
     *
     * @throws IllegalStateException if the shape is irreducible
     */
    public int a() {
        requireReducible("a()");
        return a;
    }

    /**
     * The exponent b ∈ [0, p − 2] of the quotient ω^b (for SPLIT: the larger exponent).
     *
     * @throws IllegalStateException if the shape is irreducible
     */
    public int b() {
        requireReducible("b()");
        return b;
    }

    private void requireReducible(String what) {
        if (kind == Kind.IRREDUCIBLE) {
            throw new IllegalStateException(what + " is only defined for reducible shapes, this is " + this);
        }
    }

    /**
     * Returns the shape of ρ̄ ⊗ ω^j: n ↦ n + j(p + 1) (as ω = ω₂^{p+1}), (a, b) ↦ (a + j, b + j);
     * the kind is unchanged (twisting by a character does not change (non-)splitting, nor the
     * peu/très ramifié class of ρ̄ ⊗ ω^{−b}).
     */
    public LocalShape twist(int j) {
        if (kind == Kind.IRREDUCIBLE) {
            long q = (long) p * p - 1;
            return irreducible(p, Math.floorMod(n + (long) j * (p + 1), q));
        }
        return reducible(p, kind, (long) a + j, (long) b + j);
    }

    /** The exponent string of the table: {@code n} or {@code a;b}, canonical. */
    public String exponents() {
        return kind == Kind.IRREDUCIBLE ? Integer.toString(n) : a + ";" + b;
    }

    /** Returns {@code p=<p> <word> <exponents>}, e.g. {@code p=7 tres 3;2}. */
    @Override
    public String toString() {
        return "p=" + p + " " + kind.word() + " " + exponents();
    }

    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof LocalShape other)) {
            return false;
        }
        return p == other.p && kind == other.kind && n == other.n && a == other.a && b == other.b;
    }

    @Override
    public int hashCode() {
        return Objects.hash(p, kind, n, a, b);
    }
}
