package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import java.math.BigInteger;

/**
 * The reduction of an elliptic curve over Q at one prime p, as Tate's algorithm finds it.
 *
 * @param p                  the prime
 * @param exponent           f_p, the exponent of p in the conductor
 * @param kodaira            the Kodaira symbol of the special fibre of the Néron model: {@code I0}, {@code I5},
 *                           {@code II}, {@code III}, {@code IV}, {@code I0*}, {@code I3*}, {@code IV*},
 *                           {@code III*}, {@code II*}
 * @param tamagawa           c_p, the number of components of the special fibre defined over F_p
 * @param type               good, split or non-split multiplicative, or additive reduction
 * @param minimal            a model minimal at p (the given one after the changes of Tate's algorithm)
 * @param discriminantValuation v_p of the minimal discriminant
 */
public record LocalReduction(BigInteger p, int exponent, String kodaira, int tamagawa, Type type,
                             WeierstrassModel minimal, int discriminantValuation) {

    /** The kind of reduction. */
    public enum Type { GOOD, SPLIT, NONSPLIT, ADDITIVE }

    /**
     * a_p at a bad prime: +1 split multiplicative, −1 non-split, 0 additive (Silverman, AEC, Ex. 5.11 / Thm. of
     * Deligne–Rapoport on the Euler factor).
     *
     * @throws IllegalStateException at a good prime, where a_p is counted ({@link PointCounting})
     */
    public int badTrace() {
        return switch (type) {
            case SPLIT -> 1;
            case NONSPLIT -> -1;
            case ADDITIVE -> 0;
            case GOOD -> throw new IllegalStateException("good reduction at " + p + ": count points");
        };
    }
}
