package io.github.eigengate.theory.spaces;

import io.github.eigengate.theory.Arith;
import java.math.BigInteger;
import java.util.HashMap;
import java.util.Map;

/**
 * Tr(T_n | S_k^new(Γ0(N))) for every n ≥ 1, also when (n, N) &gt; 1 (trivial character, even k ≥ 2), and the trace
 * of the Atkin–Lehner involution W_q on the new space for q ‖ N.
 *
 * <h2>Derivation (docs/theory-spaces.md, "New-space traces at every n")</h2>
 * S_k(Γ0(N)) = ⊕_{M | N} ⊕_g ⊕_{d | N/M} C·g(dz), g running over the newforms of level M (Atkin–Lehner 1970,
 * Thm 5; Diamond–Shurman Thm 5.8.3). The span of the g(dz) for one g is a tensor product over the primes p | N/M
 * of local spaces V_p with basis g_j = g(p^j z), 0 ≤ j ≤ r = v_p(N/M), since T_q (q ∤ N) commutes with B_d and
 * U_p commutes with B_{d'} for p ∤ d'. On V_p: U_p g_j = g_{j−1} for j ≥ 1 (U_p B_p = 1), and U_p g_0 = a_p(g) g_0
 * if p | M, U_p g_0 = a_p(g) g_0 − p^{k−1} g_1 if p ∤ M (T_p = U_p + p^{k−1} B_p at level prime to p). The
 * characteristic polynomial of U_p is x^r (x − a_p) resp. x^{r−1}(x² − a_p x + p^{k−1}), so
 * Tr(U_p^e | V_p) = r + 1 (e = 0), a_{p^e}(g) (e ≥ 1, p | M), a_{p^e}(g) − p^{k−1} a_{p^{e−2}}(g) (e ≥ 1, p ∤ M,
 * a_{p^{−1}} = 0). Multiplying the local traces and summing over g:
 * <pre>Tr(T_n | S_k(N)) = Σ_{M | N} Π_{p | N, p ∤ n}(v_p(N/M) + 1) Σ_{t} (−1)^{ω(t)} t^{k−1} Tr(T_{n/t²} | S_k^new(M)),</pre>
 * t running over the squarefree products of primes p | N with p ∤ M and p² | n. The term M = N is the wanted
 * new trace; the others have smaller level and are found the same way (memoised), down to M = 1. For (n, N) = 1
 * this is the σ0-relation of {@link TraceFormula}. Cohen–Strömberg (GSM 179, ch. 13) treat the same
 * decomposition. With a character χ the factor p^{k−1} becomes χ(p) p^{k−1} (not implemented yet: the trace
 * formula here is for the trivial character).
 *
 * <p>Atkin–Lehner: for q ‖ N a newform has a_q = −w_q q^{k/2−1} (Atkin–Lehner 1970, Thm 3), so
 * Tr(W_q | S_k^new(N)) = −Tr(U_q | S_k^new(N)) / q^{k/2−1}.
 *
 * <p>Not thread-safe (a memo table); one instance per weight and check run.
 */
public final class NewSpaceTraces {

    private final int weight;
    private final HurwitzClassNumbers table;
    private final Map<Integer, TraceFormula> formulas = new HashMap<>();
    private final Map<Integer, Map<Long, BigInteger>> memo = new HashMap<>();

    private NewSpaceTraces(int weight, HurwitzClassNumbers table) {
        this.weight = weight;
        this.table = table;
    }

    /**
     * @param weight even k ≥ 2 (odd k: every trace is 0)
     * @param table  Hurwitz class numbers with bound ≥ 4n for the largest n asked
     */
    public static NewSpaceTraces of(int weight, HurwitzClassNumbers table) {
        if (weight < 2) {
            throw new IllegalArgumentException("weight must be >= 2, got " + weight);
        }
        return new NewSpaceTraces(weight, table);
    }

    /** Tr(T_n | S_k^new(Γ0(N))) for any n ≥ 1 (see class comment). */
    public BigInteger newTrace(int level, long n) {
        if (level < 1 || n < 1) {
            throw new IllegalArgumentException("need level >= 1 and n >= 1, got " + level + ", " + n);
        }
        if (weight % 2 == 1) {
            return BigInteger.ZERO;
        }
        if (Arith.gcd(n, level) == 1) {
            return formula(level).newTrace(weight, n);
        }
        Map<Long, BigInteger> byN = memo.computeIfAbsent(level, k -> new HashMap<>());
        BigInteger known = byN.get(n);
        if (known != null) {
            return known;
        }
        BigInteger rest = BigInteger.ZERO;
        long[][] f = Arith.factor(level);
        for (long m : Arith.divisors(f)) {
            if (m != level) {
                rest = rest.add(oldContribution(level, f, (int) m, n));
            }
        }
        BigInteger value = formula(level).trace(weight, n).subtract(rest);
        byN.put(n, value);
        return value;
    }

    /**
     * Tr(W_q | S_k^new(Γ0(N))) for a prime q with q ‖ N: Σ over the newforms (every embedding) of w_q.
     *
     * @throws IllegalArgumentException unless q is a prime exactly dividing N
     */
    public BigInteger atkinLehnerTrace(int level, int q) {
        if (!Arith.isPrime(q) || level % q != 0 || (level / q) % q == 0) {
            throw new IllegalArgumentException(q + " is not a prime exactly dividing " + level);
        }
        BigInteger u = newTrace(level, q);
        BigInteger scale = BigInteger.valueOf(q).pow(weight / 2 - 1);
        BigInteger[] qr = u.divideAndRemainder(scale);
        if (qr[1].signum() != 0) {
            throw new IllegalStateException("Tr U_q not divisible by q^(k/2-1): " + u);
        }
        return qr[0].negate();
    }

    /** The M-term of the sum in the class comment, for M | N, M &lt; N. */
    private BigInteger oldContribution(int level, long[][] f, int m, long n) {
        long mult = 1;
        long[] squares = new long[f.length];
        int s = 0;
        for (long[] pe : f) {
            long p = pe[0];
            int r = Arith.valuation(level / m, p);
            if (n % p != 0) {
                mult *= r + 1;
            } else if (m % p != 0 && n % (p * p) == 0) {
                squares[s++] = p;
            }
        }
        BigInteger sum = BigInteger.ZERO;
        for (int mask = 0; mask < (1 << s); mask++) {
            long t = 1;
            for (int i = 0; i < s; i++) {
                if ((mask & (1 << i)) != 0) {
                    t *= squares[i];
                }
            }
            BigInteger term = newTrace(m, n / (t * t)).multiply(BigInteger.valueOf(t).pow(weight - 1));
            sum = Integer.bitCount(mask) % 2 == 0 ? sum.add(term) : sum.subtract(term);
        }
        return sum.multiply(BigInteger.valueOf(mult));
    }

    private TraceFormula formula(int level) {
        return formulas.computeIfAbsent(level, l -> TraceFormula.forLevel(l, table));
    }
}
