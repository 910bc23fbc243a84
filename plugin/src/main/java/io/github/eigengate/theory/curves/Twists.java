package io.github.eigengate.theory.curves;

import io.github.eigengate.theory.Arith;
import java.util.ArrayList;
import java.util.List;

/**
 * Which quadratic twist explains a table of a_p that differs from a curve's: the form of E ⊗ χ_d has
 * a_p = χ_d(p)·a_p(E) at p ∤ d (Shimura, <i>Introduction to the Arithmetic Theory of Automorphic Functions</i>,
 * Prop. 3.64), χ_d the Kronecker character of the fundamental discriminant d. An odd prime of d not dividing the
 * conductor of E makes the twist additive there, so it divides the level of the table's form: the candidates d are
 * built from −4, ±8 and p* = (−1)^((p−1)/2)·p for the odd primes of the two levels and the primes where one of
 * the table and the curve has a_p = 0 and the other not.
 */
public final class Twists {

    private Twists() {
    }

    /**
     * The fundamental discriminant d ≠ 1 of smallest |d| (positive first) with a_p(f) = (d/p)·a_p(E) at every listed
     * p ∤ d, and a_p(f)·a_p(E) = 0 at p | d; 0 when there is none.
     */
    public static long discriminant(int[] primes, long[] form, long[] curve, long levelForm, long levelCurve) {
        List<Long> odd = new ArrayList<>();
        for (long n : new long[] {levelForm, levelCurve}) {
            for (long q : Arith.primeFactors(Math.max(1, n))) {
                if (q != 2 && !odd.contains(q)) {
                    odd.add(q);
                }
            }
        }
        for (int i = 0; i < primes.length && odd.size() < 16; i++) {
            boolean oneZero = (form[i] == 0) != (curve[i] == 0);
            if (primes[i] != 2 && oneZero && !odd.contains((long) primes[i])) {
                odd.add((long) primes[i]);
            }
        }
        if (odd.size() > 16) {
            return 0;
        }
        List<Long> candidates = new ArrayList<>();
        for (long twoPart : new long[] {1, -4, 8, -8}) {
            for (int mask = 0; mask < 1 << odd.size(); mask++) {
                long d = twoPart;
                boolean overflow = false;
                for (int j = 0; j < odd.size(); j++) {
                    if ((mask >> j & 1) == 1) {
                        long q = odd.get(j);
                        long star = q % 4 == 1 ? q : -q;
                        if (Math.abs(d) > Long.MAX_VALUE / q) {
                            overflow = true;
                            break;
                        }
                        d *= star;
                    }
                }
                // a product of p* is ≡ 1 mod 4: with the 2-part it is a fundamental discriminant
                if (!overflow && d != 1) {
                    candidates.add(d);
                }
            }
        }
        candidates.sort((x, y) -> Math.abs(x) != Math.abs(y) ? Long.compare(Math.abs(x), Math.abs(y))
                : Long.compare(y, x));
        for (long d : candidates) {
            if (matches(d, primes, form, curve)) {
                return d;
            }
        }
        return 0;
    }

    private static boolean matches(long d, int[] primes, long[] form, long[] curve) {
        for (int i = 0; i < primes.length; i++) {
            int chi = Legendre.kronecker(d, primes[i]);
            if (chi == 0) {
                if (form[i] != 0 && curve[i] != 0) {
                    return false;
                }
            } else if (form[i] != chi * curve[i]) {
                return false;
            }
        }
        return true;
    }
}
