package io.github.eigengate.arith;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * A Dirichlet character χ : (Z/NZ)^× → μ_m ⊂ C^×, exactly: χ(n) = ζ_m^{e(n)} with ζ_m = exp(2πi/m) and an integer
 * exponent e(n) mod m, m the order of χ.
 *
 * <p>Representation: (Z/NZ)^× = ∏_p (Z/p^a)^× by the Chinese remainder theorem; each factor is cyclic for p odd
 * (generator: the least primitive root mod p that is also one mod p², hence mod every p^a — Ireland–Rosen, *A
 * Classical Introduction to Modern Number Theory*, §4.1, numbering from memory), and (Z/2^a)^× = ⟨−1⟩ × ⟨5⟩ for a ≥ 3 (Ireland–Rosen
 * §4.1). χ is stored as its exponents on these standard generators, lifted to N by CRT (≡ g mod p^a, ≡ 1 mod the
 * rest). Because the generator chosen mod p^a reduces to the one chosen mod p^b (b ≤ a), restriction to a smaller
 * modulus keeps the exponents, which makes {@link #restrictTo} and {@link #primeToPart} exact and cheap.
 *
 * <p>Discrete logarithms use one table per prime power (shared, immutable), so moduli are limited to
 * {@link #MAX_MODULUS} for nontrivial characters; the trivial character exists for every N.
 *
 * <p>Immutable and canonical: two characters are equal when they have the same modulus and the same values.
 */
public final class DirichletCharacter {

    /** The largest modulus of a character built from values (the log tables have p^a entries). */
    public static final int MAX_MODULUS = 1_000_000;

    private final int modulus;
    private final int order;
    private final Component[] components;
    private final int[] exponent; // on components[i].generator, in [0, order)

    private DirichletCharacter(int modulus, Component[] components, int[] rawExponent, int rawOrder) {
        this.modulus = modulus;
        boolean trivial = true;
        for (int e : rawExponent) {
            trivial &= (long) e % rawOrder == 0;
        }
        if (trivial) {
            // canonical: the trivial character keeps no generators, so it equals trivial(N) however it was given
            components = new Component[0];
            rawExponent = new int[0];
        }
        this.components = components;
        // reduce to the exact order: m = lcm over i of rawOrder / gcd(rawOrder, e_i)
        long m = 1;
        for (int e : rawExponent) {
            m = lcm(m, rawOrder / gcd(rawOrder, e));
        }
        this.order = (int) m;
        this.exponent = new int[rawExponent.length];
        for (int i = 0; i < rawExponent.length; i++) {
            exponent[i] = (int) ((long) rawExponent[i] * order / rawOrder % order);
        }
    }

    /** The trivial character mod N (N ≥ 1, any size). */
    public static DirichletCharacter trivial(int modulus) {
        if (modulus < 1) {
            throw new IllegalArgumentException("the modulus must be positive, was " + modulus);
        }
        return new DirichletCharacter(modulus, new Component[0], new int[0], 1);
    }

    /**
     * The character mod N with χ(g_j) = exp(2πi·num_j/den_j). Verifies exactly (by walking the Cayley graph of the
     * group the g_j generate) that the g_j generate (Z/NZ)^× and that the values define a homomorphism.
     *
     * @throws IllegalArgumentException with a sentence saying what is wrong (for the data layer to report)
     */
    public static DirichletCharacter fromValues(int modulus, long[] generators, long[] num, long[] den) {
        if (modulus < 1) {
            throw new IllegalArgumentException("the modulus must be positive, was " + modulus);
        }
        if (modulus > MAX_MODULUS) {
            throw new IllegalArgumentException("characters are supported for moduli up to " + MAX_MODULUS
                    + ", not " + modulus);
        }
        int k = generators.length;
        long m = 1;
        for (int j = 0; j < k; j++) {
            if (den[j] < 1) {
                throw new IllegalArgumentException("the denominator of the value at " + generators[j]
                        + " must be positive");
            }
            long g = gcd(Math.floorMod(num[j], den[j]), den[j]);
            m = lcm(m, den[j] / g);
            if (m > modulus) {
                throw new IllegalArgumentException("the values have order " + m + ", more than the group mod "
                        + modulus + " allows");
            }
        }
        int[] c = new int[k];
        for (int j = 0; j < k; j++) {
            // a/b reduced: χ(g_j) = ζ_m^{a·m/b}
            long r = Math.floorMod(num[j], den[j]);
            long g = gcd(r, den[j]);
            long a = r / g;
            long b = den[j] / g;
            c[j] = (int) (a * (m / b) % m);
        }
        int[] g = new int[k];
        for (int j = 0; j < k; j++) {
            if (generators[j] <= 1 || generators[j] >= modulus || gcd(generators[j], modulus) != 1) {
                throw new IllegalArgumentException(generators[j] + " is not a unit g with 1 < g < " + modulus);
            }
            g[j] = (int) generators[j];
        }
        // walk: value[x] = χ-exponent of x, -1 = not reached
        int[] value = new int[modulus];
        Arrays.fill(value, -1);
        int[] queue = new int[modulus];
        int head = 0;
        int tail = 0;
        value[1 % modulus] = 0;
        queue[tail++] = 1 % modulus;
        while (head < tail) {
            int x = queue[head++];
            for (int j = 0; j < k; j++) {
                int y = (int) ((long) x * g[j] % modulus);
                int v = (int) ((value[x] + (long) c[j]) % m);
                if (value[y] < 0) {
                    value[y] = v;
                    queue[tail++] = y;
                } else if (value[y] != v) {
                    throw new IllegalArgumentException("the values are not those of a character: two products of"
                            + " the generators equal " + y + " mod " + modulus + " but get different values");
                }
            }
        }
        long phi = totient(modulus);
        if (tail != phi) {
            throw new IllegalArgumentException("the generators do not generate (Z/" + modulus + "Z)^×: they reach "
                    + tail + " of its " + phi + " elements");
        }
        Component[] comps = components(modulus);
        int[] e = new int[comps.length];
        for (int i = 0; i < comps.length; i++) {
            e[i] = value[(int) comps[i].lift];
        }
        return new DirichletCharacter(modulus, comps, e, (int) m);
    }

    public int modulus() {
        return modulus;
    }

    /** The order m of χ (1 for the trivial character). */
    public int order() {
        return order;
    }

    public boolean isTrivial() {
        return order == 1;
    }

    /** The exponent e with χ(n) = ζ_m^e, in [0, m); −1 when gcd(n, N) > 1 (χ(n) = 0). */
    public int exponent(long n) {
        long r = Math.floorMod(n, (long) modulus);
        if (modulus == 1) {
            return 0;
        }
        if (gcd(r, modulus) != 1) {
            return -1;
        }
        if (order == 1) {
            return 0;
        }
        long s = 0;
        for (int i = 0; i < components.length; i++) {
            if (exponent[i] != 0) {
                s += (long) exponent[i] * components[i].log(r) % order;
            }
        }
        return (int) (s % order);
    }

    /**
     * Generators of (Z/NZ)^×, one per cyclic factor of its standard decomposition (a primitive root mod each odd
     * p^a, and −1, 5 mod 2^a), each lifted by the Chinese remainder theorem to be 1 at the other prime powers. A
     * character, or any homomorphism on (Z/NZ)^×, is determined by its values on them.
     *
     * @throws IllegalArgumentException if N is not in [1, {@value #MAX_MODULUS}]
     */
    public static long[] generators(int modulus) {
        if (modulus < 1) {
            throw new IllegalArgumentException("the modulus must be positive, was " + modulus);
        }
        Component[] cs = components(modulus);
        long[] out = new long[cs.length];
        for (int i = 0; i < cs.length; i++) {
            out[i] = cs[i].lift;
        }
        return out;
    }

    /** χ(−1) = −1. */
    public boolean isOdd() {
        return order % 2 == 0 && exponent(-1) == order / 2;
    }

    /**
     * χ(n) as an element of a field that contains ζ_m as {@code zeta}: zero, one, ±1 for m ≤ 2 (zeta unused, may
     * be null), zeta^e otherwise.
     */
    public <E> E value(long n, Field<E> field, E zeta) {
        int e = exponent(n);
        if (e < 0) {
            return field.zero();
        }
        if (e == 0) {
            return field.one();
        }
        if (order == 2) {
            return field.negate(field.one());
        }
        if (zeta == null) {
            throw new IllegalArgumentException("a character of order " + order + " needs a root of unity");
        }
        return Powers.power(zeta, e, field.one(), field::multiply);
    }

    /** The conductor: the least f | N such that χ is trivial on the units ≡ 1 mod f. */
    public int conductor() {
        long f = 1;
        for (Component c : primeComponents()) {
            f *= conductorPart(c.prime);
        }
        return (int) f;
    }

    /** The p-part of the conductor. */
    public int conductorPart(int p) {
        int a = valuation(modulus, p);
        if (a == 0) {
            return 1;
        }
        if (p != 2) {
            int e = exponentAt(p, false);
            if (e == 0) {
                return 1;
            }
            // the units ≡ 1 mod p^b form the cyclic subgroup generated by g^{(p−1)p^{b−1}}
            long step = p - 1;
            for (int b = 1; b <= a; b++) {
                if ((long) e * step % order == 0) {
                    return (int) pow(p, b);
                }
                step *= p;
            }
            return (int) pow(p, a);
        }
        int sign = exponentAt(2, true);
        int five = a >= 3 ? exponentAt(2, false) : 0;
        if (sign == 0 && five == 0) {
            return 1;
        }
        // the units ≡ 1 mod 2^b (b ≥ 2) are generated by 5^{2^{b−2}}
        long step = 1;
        for (int b = 2; b <= a; b++) {
            if ((long) five * step % order == 0) {
                return (int) pow(2, b);
            }
            step *= 2;
        }
        return (int) pow(2, a);
    }

    /** Whether χ is primitive (its conductor is N). */
    public boolean isPrimitive() {
        return conductor() == modulus;
    }

    /** χ^a. */
    public DirichletCharacter pow(long a) {
        int[] e = new int[exponent.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = (int) Math.floorMod((long) exponent[i] * Math.floorMod(a, (long) order), (long) order);
        }
        return new DirichletCharacter(modulus, components, e, order);
    }

    /** The complex conjugate χ̄ = χ^{−1}. */
    public DirichletCharacter conjugate() {
        return pow(-1);
    }

    /** χψ for ψ of the same modulus. */
    public DirichletCharacter multiply(DirichletCharacter other) {
        requireSameModulus(other);
        if (isTrivial()) {
            return other;
        }
        if (other.isTrivial()) {
            return this;
        }
        long m = lcm(order, other.order);
        int[] e = new int[exponent.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = (int) (((long) exponent[i] * (m / order) + (long) other.exponent[i] * (m / other.order)) % m);
        }
        return new DirichletCharacter(modulus, components, e, (int) m);
    }

    /** Whether {@code other} = χ^a for some a prime to the order (the two lie in one Galois orbit). */
    public boolean isGaloisConjugate(DirichletCharacter other) {
        if (other.modulus != modulus || other.order != order) {
            return false;
        }
        for (int a = 1; a <= order; a++) {
            if (gcd(a, order) == 1 && Arrays.equals(pow(a).exponent, other.exponent)) {
                return true;
            }
        }
        return false;
    }

    /** [Q(χ) : Q] = φ(m), the size of the Galois orbit of χ. */
    public int orbitSize() {
        return (int) totient(order);
    }

    /**
     * The character mod M inducing the same primitive character, for M | N a multiple of the conductor.
     *
     * @throws IllegalArgumentException if M does not divide N or the conductor does not divide M
     */
    public DirichletCharacter restrictTo(int m) {
        if (m < 1 || modulus % m != 0 || m % conductor() != 0) {
            throw new IllegalArgumentException("χ mod " + modulus + " of conductor " + conductor()
                    + " is not defined mod " + m);
        }
        return lift(m);
    }

    /**
     * The character mod M (any M with cond(χ) | M, not necessarily dividing N) whose primitive character is that of
     * χ: at primes of M not dividing N the component is trivial.
     */
    public DirichletCharacter lift(int m) {
        if (m % conductor() != 0) {
            throw new IllegalArgumentException("the conductor " + conductor() + " does not divide " + m);
        }
        if (isTrivial()) {
            return trivial(m);
        }
        Component[] target = components(m);
        int[] e = new int[target.length];
        for (int i = 0; i < target.length; i++) {
            Component t = target[i];
            if (modulus % t.prime == 0) {
                e[i] = exponentAt(t.prime, t.sign);
            }
        }
        return new DirichletCharacter(m, target, e, order);
    }

    /**
     * The prime-to-p part χ' of χ, a character mod N/p^{v_p(N)}: χ = χ_p·χ' with χ_p of p-power conductor
     * (the decomposition (Z/NZ)^× = (Z/p^a)^× × (Z/N'Z)^×).
     */
    public DirichletCharacter primeToPart(int p) {
        int rest = modulus;
        while (rest % p == 0) {
            rest /= p;
        }
        if (isTrivial()) {
            return trivial(rest);
        }
        Component[] target = components(rest);
        int[] e = new int[target.length];
        for (int i = 0; i < target.length; i++) {
            e[i] = exponentAt(target[i].prime, target[i].sign);
        }
        return new DirichletCharacter(rest, target, e, order);
    }

    /**
     * The values on the standard generators in the table syntax {@code g:a/b;…} (a/b in lowest terms), or
     * {@code 1} for the trivial character. Parsing it back with {@link #fromValues} gives an equal character.
     */
    public String cell() {
        if (isTrivial()) {
            return "1";
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < components.length; i++) {
            long g = gcd(exponent[i], order);
            parts.add(components[i].lift + ":" + exponent[i] / g + "/" + order / g);
        }
        return String.join(";", parts);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DirichletCharacter c && c.modulus == modulus && c.order == order
                && Arrays.equals(c.exponent, exponent);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * modulus + order) + Arrays.hashCode(exponent);
    }

    /** E.g. {@code χ mod 13 of order 6 (2:1/6)}. */
    @Override
    public String toString() {
        return isTrivial() ? "trivial character mod " + modulus
                : "χ mod " + modulus + " of order " + order + " (" + cell() + ")";
    }

    // --- the standard decomposition of (Z/NZ)^× ---

    /** One cyclic factor: generator {@code gen} mod {@code power} = p^a, of order {@code size}, lifted to N. */
    private static final class Component {
        final int prime;
        final int power;
        final boolean sign;  // the ⟨−1⟩ factor of (Z/2^a)^×
        final int gen;
        final int size;
        final long lift;
        final int[] logs;    // logs[r mod power], shared

        Component(int prime, int power, boolean sign, int gen, int size, long lift) {
            this.prime = prime;
            this.power = power;
            this.sign = sign;
            this.gen = gen;
            this.size = size;
            this.lift = lift;
            this.logs = sign ? null : LOGS.computeIfAbsent(((long) power << 32) | gen, key -> logTable(power, gen));
        }

        /** The exponent of r's projection to this factor. */
        long log(long r) {
            int x = (int) (r % power);
            if (sign) {
                return x % 4 == 1 ? 0 : 1;
            }
            if (prime == 2 && x % 4 == 3) {
                x = power - x; // drop the −1 factor
            }
            return logs[x];
        }
    }

    private static final Map<Long, int[]> LOGS = new ConcurrentHashMap<>();

    private static int[] logTable(int power, int gen) {
        int[] logs = new int[power];
        long x = 1;
        int i = 0;
        do {
            logs[(int) x] = i++;
            x = x * gen % power;
        } while (x != 1);
        return logs;
    }

    private static final Map<Integer, Component[]> COMPONENTS = new ConcurrentHashMap<>();

    private static Component[] components(int n) {
        if (n > MAX_MODULUS) {
            throw new IllegalArgumentException("characters are supported for moduli up to " + MAX_MODULUS);
        }
        return COMPONENTS.computeIfAbsent(n, DirichletCharacter::decompose);
    }

    private static Component[] decompose(int n) {
        List<Component> out = new ArrayList<>();
        int rest = n;
        for (int p = 2; rest > 1; p = (long) p * p > rest ? rest : p + 1) {
            if (rest % p != 0) {
                continue;
            }
            int a = 0;
            int q = 1;
            while (rest % p == 0) {
                rest /= p;
                q *= p;
                a++;
            }
            int cofactor = n / q;
            if (p == 2) {
                if (a >= 2) {
                    out.add(new Component(2, q, true, q - 1, 2, crt(q - 1, q, cofactor)));
                }
                if (a >= 3) {
                    out.add(new Component(2, q, false, 5, q / 4, crt(5, q, cofactor)));
                }
            } else {
                int g = primitiveRoot(p);
                out.add(new Component(p, q, false, g, q / p * (p - 1), crt(g, q, cofactor)));
            }
        }
        return out.toArray(new Component[0]);
    }

    private List<Component> primeComponents() {
        List<Component> out = new ArrayList<>();
        for (Component c : components) {
            if (out.isEmpty() || out.get(out.size() - 1).prime != c.prime) {
                out.add(c);
            }
        }
        return out;
    }

    /** The exponent on the factor of prime p (the sign factor for p = 2 when {@code sign}); 0 if absent. */
    private int exponentAt(int p, boolean sign) {
        for (int i = 0; i < components.length; i++) {
            if (components[i].prime == p && components[i].sign == sign) {
                return exponent[i];
            }
        }
        return 0;
    }

    /** The least g that is a primitive root mod p and mod p² (so mod every p^a). */
    private static int primitiveRoot(int p) {
        long phi = p - 1;
        List<Long> factors = new ArrayList<>();
        long r = phi;
        for (long q = 2; q * q <= r; q++) {
            if (r % q == 0) {
                factors.add(q);
                while (r % q == 0) {
                    r /= q;
                }
            }
        }
        if (r > 1) {
            factors.add(r);
        }
        for (int g = 2; ; g++) {
            boolean root = true;
            for (long q : factors) {
                if (powMod(g, phi / q, p) == 1) {
                    root = false;
                    break;
                }
            }
            if (root && BigInteger.valueOf(g).modPow(BigInteger.valueOf(phi), BigInteger.valueOf((long) p * p))
                    .intValue() != 1) {
                return g;
            }
        }
    }

    private static long crt(long g, long q, long cofactor) {
        if (cofactor == 1) {
            return g % q;
        }
        // x ≡ g mod q, x ≡ 1 mod cofactor
        long inv = BigInteger.valueOf(cofactor).modInverse(BigInteger.valueOf(q)).longValue();
        long x = 1 + cofactor * (Math.floorMod((g - 1) % q * inv, q));
        return x % (q * cofactor);
    }

    private void requireSameModulus(DirichletCharacter other) {
        if (other.modulus != modulus) {
            throw new IllegalArgumentException("characters mod " + modulus + " and mod " + other.modulus
                    + " cannot be multiplied");
        }
    }

    private static long powMod(long a, long e, long m) {
        long r = 1;
        a %= m;
        while (e > 0) {
            if ((e & 1) == 1) {
                r = r * a % m;
            }
            a = a * a % m;
            e >>= 1;
        }
        return r;
    }

    private static long pow(long b, int e) {
        long r = 1;
        for (int i = 0; i < e; i++) {
            r *= b;
        }
        return r;
    }

    private static int valuation(long n, int p) {
        int v = 0;
        while (n % p == 0) {
            n /= p;
            v++;
        }
        return v;
    }

    private static long totient(long n) {
        long r = n;
        long x = n;
        for (long p = 2; p * p <= x; p++) {
            if (x % p == 0) {
                while (x % p == 0) {
                    x /= p;
                }
                r -= r / p;
            }
        }
        if (x > 1) {
            r -= r / x;
        }
        return r;
    }

    private static long gcd(long a, long b) {
        a = Math.abs(a);
        b = Math.abs(b);
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a;
    }

    private static long lcm(long a, long b) {
        return a / gcd(a, b) * b;
    }
}
