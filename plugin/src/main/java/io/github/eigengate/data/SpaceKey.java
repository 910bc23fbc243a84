package io.github.eigengate.data;

import io.github.eigengate.arith.DirichletCharacter;
import java.util.Objects;

/**
 * A space S_k(N, χ) with χ a character mod N, written {@code N=11 k=2} in reports when χ is trivial and
 * {@code N=13 k=2 χ=2:1/6} (the {@code character} cell syntax, on the standard generators) otherwise.
 *
 * <p>A row of {@code spaces.csv} stands for the whole Galois orbit of χ: {@link #orbit()} is the key two rows or a row
 * and a form share exactly when their characters are Galois-conjugate.
 */
public record SpaceKey(int level, int weight, DirichletCharacter character) {

    public SpaceKey {
        Objects.requireNonNull(character, "character");
        if (character.modulus() != level) {
            throw new IllegalArgumentException("a character mod " + character.modulus() + " for level " + level);
        }
    }

    /** S_k(Γ0(N)), trivial character. */
    public SpaceKey(int level, int weight) {
        this(level, weight, DirichletCharacter.trivial(level));
    }

    /** The key of the Galois orbit: the same level and weight, and the orbit's representative with the least cell. */
    public SpaceKey orbit() {
        if (character.isTrivial()) {
            // a trivial character read from values keeps zero exponents: compare by the one canonical trivial
            return new SpaceKey(level, weight);
        }
        if (character.order() == 2) {
            return this;
        }
        DirichletCharacter best = character;
        String bestCell = character.cell();
        int m = character.order();
        for (int a = 2; a < m; a++) {
            if (gcd(a, m) == 1) {
                DirichletCharacter c = character.pow(a);
                String cell = c.cell();
                if (cell.compareTo(bestCell) < 0) {
                    best = c;
                    bestCell = cell;
                }
            }
        }
        return new SpaceKey(level, weight, best);
    }

    /** Whether a form of level N', weight k' and character χ' lies in this space's orbit: N' = N, k' = k, χ' ~ χ. */
    public boolean contains(int formLevel, int formWeight, DirichletCharacter formCharacter) {
        return formLevel == level && formWeight == weight && formCharacter.modulus() == level
                && (formCharacter.isTrivial() ? character.isTrivial() : formCharacter.isGaloisConjugate(character));
    }

    @Override
    public String toString() {
        String base = "N=" + level + " k=" + weight;
        return character.isTrivial() ? base : base + " χ=" + character.cell();
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
