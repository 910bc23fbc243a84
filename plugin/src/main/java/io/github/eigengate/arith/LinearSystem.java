package io.github.eigengate.arith;

import java.util.ArrayList;
import java.util.List;

/** Exact solution of a linear system A y = b over Q by Gauss–Jordan elimination (Cohen, GTM 138, Alg. 2.2.1). */
public final class LinearSystem {

    private LinearSystem() {
    }

    /**
     * @param rows the rows of A (each of length d)
     * @param b    the right side (one entry per row)
     * @return the unique solution y ∈ Q^d, or {@code null} when the system is inconsistent or A has rank &lt; d
     */
    public static List<Rational> solveUnique(List<List<Rational>> rows, List<Rational> b) {
        if (rows.size() != b.size()) {
            throw new IllegalArgumentException(rows.size() + " rows but " + b.size() + " right-hand sides");
        }
        if (rows.isEmpty()) {
            return null;
        }
        int d = rows.get(0).size();
        int m = rows.size();
        Rational[][] a = new Rational[m][d + 1];
        for (int i = 0; i < m; i++) {
            if (rows.get(i).size() != d) {
                throw new IllegalArgumentException("row " + i + " has length " + rows.get(i).size() + ", not " + d);
            }
            for (int j = 0; j < d; j++) {
                a[i][j] = rows.get(i).get(j);
            }
            a[i][d] = b.get(i);
        }
        int r = 0;
        for (int c = 0; c < d; c++) {
            int pivot = -1;
            for (int i = r; i < m; i++) {
                if (a[i][c].signum() != 0) {
                    pivot = i;
                    break;
                }
            }
            if (pivot < 0) {
                return null;
            }
            Rational[] t = a[pivot];
            a[pivot] = a[r];
            a[r] = t;
            Rational inv = a[r][c].inverse();
            for (int j = c; j <= d; j++) {
                a[r][j] = a[r][j].multiply(inv);
            }
            for (int i = 0; i < m; i++) {
                if (i != r && a[i][c].signum() != 0) {
                    Rational f = a[i][c];
                    for (int j = c; j <= d; j++) {
                        a[i][j] = a[i][j].subtract(f.multiply(a[r][j]));
                    }
                }
            }
            r++;
        }
        for (int i = d; i < m; i++) {
            if (a[i][d].signum() != 0) {
                return null;
            }
        }
        List<Rational> y = new ArrayList<>(d);
        for (int i = 0; i < d; i++) {
            y.add(a[i][d]);
        }
        return y;
    }
}
