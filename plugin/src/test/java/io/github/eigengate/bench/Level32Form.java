package io.github.eigengate.bench;

/**
 * The coefficients a_n, n ≤ N, of the weight-2 newform of level 32 (the CM form of y² = x³ − x, η(4z)²η(8z)²): its
 * L-function is that of the Hecke character ψ(α) = α on Z[i] for α ≡ 1 mod (2 + 2i) (Ireland–Rosen, <i>A Classical
 * Introduction to Modern Number Theory</i>, 2nd ed., §18.4 and §18.5), so a_n = Σ α over the α = a + bi with
 * a² + b² = n and α ≡ 1 mod (2 + 2i), i.e. a odd, b even, a + b ≡ 1 mod 4 (the imaginary parts cancel in conjugate
 * pairs). All n ≤ N at once in O(N). Checked against PARI/GP ellan in Level32FormTest.
 */
final class Level32Form {
    private Level32Form() {
    }

    /** a[n] for 1 ≤ n ≤ max (a[0] unused). */
    static int[] coefficients(int max) {
        int[] a = new int[max + 1];
        int r = (int) Math.sqrt((double) max) + 1;
        for (int x = -r; x <= r; x += 1) {
            if ((x & 1) == 0) {
                continue;
            }
            long xx = (long) x * x;
            for (int y = -2 * (r / 2); y <= r; y += 2) { // b even
                long n = xx + (long) y * y;
                if (n > max || Math.floorMod(x + y, 4) != 1) {
                    continue;
                }
                a[(int) n] += x;
            }
        }
        return a;
    }
}
