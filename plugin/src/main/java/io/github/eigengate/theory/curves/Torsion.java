package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.QPoly;
import io.github.eigengate.arith.Rational;
import io.github.eigengate.arith.WeierstrassModel;
import io.github.eigengate.arith.ZFactorization;
import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The exact order of E(Q)_tors.
 *
 * <p>Bound: for a prime p ≥ 3 of good reduction, E(Q)_tors injects into Ẽ(F_p) (Silverman, AEC, VII.3.1 and
 * VII.3.4: the kernel of reduction has no torsion when v(p) = 1 < p − 1), so #E(Q)_tors divides
 * B = gcd #Ẽ(F_p) over a few such p. Points: on the integral short model y² = x³ + A·x + B with A = −27c4,
 * B = −54c6 (isomorphic to E over Q), torsion points have integer coordinates (Nagell–Lutz, AEC VIII.7.2); for each
 * prime ℓ | B the ℓ-primary part is found from the rational roots of the division polynomials ψ_ℓ (Washington,
 * <i>Elliptic Curves</i>, §3.2) and, for ℓ = 2 and 3, by solving 2Q = P (the duplication formula) and 3Q = P (x(3Q)
 * from ψ_2ψ_4/ψ_3²) for the points P already found. By Mazur's theorem (AEC VIII.7.5) only ℓ ≤ 7 occur, the 2-part
 * has order at most 8 in a cyclic factor and 16 in all, the 3-part at most 9, the 5- and 7-parts at most 5 and 7;
 * the search stops there. The order is the product of the ℓ-parts. Cremona, <i>Algorithms</i>, §3.3, bounds the same
 * way.
 */
public final class Torsion {

    private static final int BOUND_PRIMES = 20;

    private Torsion() {
    }

    /** #E(Q)_tors for a nonsingular integral model. */
    public static int order(WeierstrassModel e) {
        long bound = bound(e);
        if (bound == 1) {
            return 1;
        }
        Rational a = Rational.of(e.c4().multiply(BigInteger.valueOf(-27)));
        Rational b = Rational.of(e.c6().multiply(BigInteger.valueOf(-54)));
        QPoly f = QPoly.of(b, a, Rational.ZERO, Rational.ONE);
        int order = 1;
        if (bound % 2 == 0) {
            order *= twoPart(a, b, f, bound);
        }
        if (bound % 3 == 0) {
            order *= threePart(a, b, f, bound);
        }
        if (bound % 5 == 0) {
            order *= 1 + pointsOver(roots(psi5(a, b)), f).size();
        }
        if (bound % 7 == 0) {
            order *= 1 + pointsOver(roots(psi7(a, b)), f).size();
        }
        return order;
    }

    /** gcd of #Ẽ(F_p) over the first good primes p ≥ 3. */
    static long bound(WeierstrassModel e) {
        long g = 0;
        int used = 0;
        for (long p = 3; used < BOUND_PRIMES && g != 1; p += 2) {
            if (!Arith.isPrime(p)
                    || e.discriminant().mod(BigInteger.valueOf(p)).signum() == 0) {
                continue;
            }
            long n = p + 1 - PointCounting.trace(e, p);
            g = gcd(g, n);
            used++;
        }
        return g;
    }

    private static int twoPart(Rational a, Rational b, QPoly f, long bound) {
        int cap = 1 << Long.numberOfTrailingZeros(bound);
        List<RationalPoint> found = new ArrayList<>();
        found.add(RationalPoint.INFINITY);
        for (Rational x : roots(f)) {
            found.add(RationalPoint.of(x, Rational.ZERO));
        }
        // halve every point found until nothing new appears
        for (int i = 1; i < found.size() && found.size() < cap; i++) {
            RationalPoint p = found.get(i);
            // x(2Q) = x_P ⇔ x⁴ − 2Ax² − 8Bx + A² − 4x_P·(x³ + Ax + B) = 0
            QPoly quartic = QPoly.of(a.multiply(a), b.multiply(Rational.of(-8)), a.multiply(Rational.of(-2)),
                    Rational.ZERO, Rational.ONE).subtract(f.scale(p.x().multiply(Rational.of(4))));
            for (RationalPoint q : pointsOver(roots(quartic), f)) {
                if (q.add(q, a).equals(p) && !found.contains(q)) {
                    found.add(q);
                }
            }
        }
        return found.size();
    }

    private static int threePart(Rational a, Rational b, QPoly f, long bound) {
        List<RationalPoint> found = new ArrayList<>();
        found.add(RationalPoint.INFINITY);
        QPoly psi3 = psi3(a, b);
        found.addAll(pointsOver(roots(psi3), f));
        if (found.size() > 1 && bound % 9 == 0) {
            // x(3Q) = x − ψ2ψ4/ψ3², ψ2ψ4 = 8·f·g
            QPoly phi3 = QPoly.x().multiply(psi3).multiply(psi3).subtract(f.multiply(g(a, b)).scale(Rational.of(8)));
            List<RationalPoint> threes = List.copyOf(found.subList(1, found.size()));
            for (RationalPoint p : threes) {
                QPoly eq = phi3.subtract(psi3.multiply(psi3).scale(p.x()));
                for (RationalPoint q : pointsOver(roots(eq), f)) {
                    if (q.times(3, a).equals(p) && !found.contains(q)) {
                        found.add(q);
                    }
                }
            }
        }
        return found.size();
    }

    /** The rational points (x, ±y) over the given x, where f(x) is a nonzero square. */
    private static List<RationalPoint> pointsOver(List<Rational> xs, QPoly f) {
        List<RationalPoint> out = new ArrayList<>();
        for (Rational x : xs) {
            Rational v = f.evaluate(x);
            Rational y = sqrt(v);
            if (y != null && y.signum() != 0) {
                out.add(RationalPoint.of(x, y));
                out.add(RationalPoint.of(x, y.negate()));
            }
        }
        return out;
    }

    /** The distinct rational roots, from the linear factors over Q. */
    private static List<Rational> roots(QPoly p) {
        List<Rational> out = new ArrayList<>();
        if (p.degree() < 1) {
            return out;
        }
        for (ZFactorization.Factor fac : ZFactorization.factorWithMultiplicity(p)) {
            QPoly l = fac.factor();
            if (l.degree() == 1) {
                out.add(l.coefficient(0).negate().divide(l.coefficient(1)));
            }
        }
        return out;
    }

    private static Rational sqrt(Rational v) {
        if (v.signum() < 0) {
            return null;
        }
        BigInteger n = v.num().sqrt();
        BigInteger d = v.den().sqrt();
        if (!n.multiply(n).equals(v.num()) || !d.multiply(d).equals(v.den())) {
            return null;
        }
        return Rational.of(n, d);
    }

    /** ψ3 = 3x⁴ + 6Ax² + 12Bx − A². */
    static QPoly psi3(Rational a, Rational b) {
        return QPoly.of(a.multiply(a).negate(), b.multiply(Rational.of(12)), a.multiply(Rational.of(6)),
                Rational.ZERO, Rational.of(3));
    }

    /** g = ψ4 / (4y) = x⁶ + 5Ax⁴ + 20Bx³ − 5A²x² − 4ABx − 8B² − A³. */
    static QPoly g(Rational a, Rational b) {
        return QPoly.of(b.multiply(b).multiply(Rational.of(-8)).subtract(a.pow(3)),
                a.multiply(b).multiply(Rational.of(-4)), a.multiply(a).multiply(Rational.of(-5)),
                b.multiply(Rational.of(20)), a.multiply(Rational.of(5)), Rational.ZERO, Rational.ONE);
    }

    private static QPoly f2(Rational a, Rational b) {
        QPoly f = QPoly.of(b, a, Rational.ZERO, Rational.ONE);
        return f.multiply(f);
    }

    /** ψ5 = ψ4ψ2³ − ψ3³ = 32f²g − ψ3³. */
    static QPoly psi5(Rational a, Rational b) {
        QPoly p3 = psi3(a, b);
        return f2(a, b).multiply(g(a, b)).scale(Rational.of(32)).subtract(p3.pow(3));
    }

    /** ψ7 = ψ5ψ3³ − ψ2ψ4³ = ψ5ψ3³ − 128f²g³. */
    static QPoly psi7(Rational a, Rational b) {
        QPoly p3 = psi3(a, b);
        return psi5(a, b).multiply(p3.pow(3)).subtract(f2(a, b).multiply(g(a, b).pow(3)).scale(Rational.of(128)));
    }

    private static long gcd(long x, long y) {
        while (y != 0) {
            long t = x % y;
            x = y;
            y = t;
        }
        return Math.abs(x);
    }
}
