package io.github.eigengate.theory.spaces;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.github.eigengate.theory.Arith;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ArithTest {

    /** β * σ0 = δ (β is the Dirichlet inverse of σ0; G. Martin, J. Number Theory 112 (2005), §1). */
    @Test
    void betaIsDirichletInverseOfSigma0() {
        for (long n = 1; n <= 2000; n++) {
            long s = 0;
            for (long d : Arith.divisors(Arith.factor(n))) {
                s += Arith.beta(d) * Arith.sigma0(n / d);
            }
            assertEquals(n == 1 ? 1 : 0, s, "n = " + n);
        }
        // β(p) = −2, β(p²) = 1, β(p³) = 0 (ibid.)
        assertEquals(-2, Arith.beta(7));
        assertEquals(1, Arith.beta(49));
        assertEquals(0, Arith.beta(8));
        assertEquals(1, Arith.beta(1));
    }

    /** Jacobi symbol against Euler's criterion a^{(p−1)/2} mod p for primes p (Ireland–Rosen, Prop. 5.1.2). */
    @Test
    void jacobiMatchesEulerCriterion() {
        long[] primes = {3, 5, 7, 11, 13, 65537, 1_000_003};
        Random rnd = new Random(7L);
        for (long p : primes) {
            for (int i = 0; i < 300; i++) {
                long a = rnd.nextLong() % (10 * p);
                long e = java.math.BigInteger.valueOf(Math.floorMod(a, p))
                        .modPow(java.math.BigInteger.valueOf((p - 1) / 2), java.math.BigInteger.valueOf(p)).longValue();
                int expected = e == 0 ? 0 : (e == 1 ? 1 : -1);
                assertEquals(expected, Arith.jacobi(a, p), "(" + a + "/" + p + ")");
            }
        }
        assertEquals(1, Arith.jacobi(5, 1));
        assertThrows(IllegalArgumentException.class, () -> Arith.jacobi(3, 8));
        assertThrows(IllegalArgumentException.class, () -> Arith.jacobi(3, 0));
    }

    @Test
    void isqrtIsExact() {
        Random rnd = new Random(11L);
        for (int i = 0; i < 10_000; i++) {
            long n = rnd.nextLong() >>> 1 >>> rnd.nextInt(62);
            long r = Arith.isqrt(n);
            assertEquals(true, r * r <= n && (r + 1) > n / (r + 1), "isqrt(" + n + ")");
        }
        assertEquals(0, Arith.isqrt(0));
        assertEquals(3037000499L, Arith.isqrt(Long.MAX_VALUE));
        assertEquals(99, Arith.isqrt(9999));
        assertEquals(100, Arith.isqrt(10_000));
        assertThrows(IllegalArgumentException.class, () -> Arith.isqrt(-1));
    }

    @Test
    void factorDivisorsPsiPhi() {
        assertArrayEquals(new long[] {1, 2, 4, 5, 10, 20}, Arith.divisors(Arith.factor(20)));
        assertArrayEquals(new long[] {1}, Arith.divisors(Arith.factor(1)));
        assertEquals(0, Arith.factor(1).length);
        // ψ(N) = [SL2(Z) : Γ0(N)]: ψ(11) = 12, ψ(60) = 144; φ(60) = 16 (from the definitions)
        assertEquals(12, Arith.psi(11));
        assertEquals(144, Arith.psi(60));
        assertEquals(16, Arith.phi(60));
        assertEquals(1, Arith.phi(1));
        assertThrows(IllegalArgumentException.class, () -> Arith.factor(0));
        assertThrows(ArithmeticException.class, () -> Arith.powExact(10, 19));
    }
}
