package io.github.eigengate.data;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * The coefficients a_n of one form as read from the tables, each with the row it was read from. Dense index sets
 * (every n up to a bound, or every prime: the usual case) are stored in arrays indexed by n, sparse ones by binary
 * search.
 *
 * @param <E> the element type of the coefficient field
 */
public final class Coefficients<E> {

    private final int[] indices;      // ascending
    private final Object[] values;    // parallel to indices
    private final int[] lines;        // parallel to indices
    private final String[] files;     // parallel to indices (shared strings)
    private final int[] slot;         // slot[n] = position + 1 in indices, or null when sparse

    private Coefficients(int[] indices, Object[] values, int[] lines, String[] files) {
        this.indices = indices;
        this.values = values;
        this.lines = lines;
        this.files = files;
        int max = indices.length == 0 ? 0 : indices[indices.length - 1];
        if ((long) max <= 4L * indices.length + 4096) {
            slot = new int[max + 1];
            for (int i = 0; i < indices.length; i++) {
                slot[indices[i]] = i + 1;
            }
        } else {
            slot = null;
        }
    }

    private int position(long n) {
        if (n < 1 || n > Integer.MAX_VALUE) {
            return -1;
        }
        if (slot != null) {
            return n < slot.length ? slot[(int) n] - 1 : -1;
        }
        int i = Arrays.binarySearch(indices, (int) n);
        return i >= 0 ? i : -1;
    }

    /** a_n, or {@code null} when the tables do not give it. */
    @SuppressWarnings("unchecked")
    public E get(long n) {
        int i = position(n);
        return i < 0 ? null : (E) values[i];
    }

    public boolean has(long n) {
        return position(n) >= 0;
    }

    /** The row a_n was read from, or {@code null} when absent. */
    public SourceLocation at(long n) {
        int i = position(n);
        return i < 0 ? null : SourceLocation.row(files[i], lines[i]);
    }

    /** The indices n present, ascending. */
    public int[] indices() {
        return indices.clone();
    }

    public int size() {
        return indices.length;
    }

    /** The largest n present, 0 if none. */
    public int maxIndex() {
        return indices.length == 0 ? 0 : indices[indices.length - 1];
    }

    /**
     * Collects rows in reading order. Appending in ascending n (the usual layout) costs no lookup; anything else
     * falls back to an index map.
     */
    public static final class Builder<E> {
        private int size;
        private int[] n = new int[64];
        private Object[] v = new Object[64];
        private int[] line = new int[64];
        private String[] file = new String[64];
        private boolean ascending = true;
        private Map<Integer, Integer> index;

        /** The position of index {@code k}, or -1. */
        private int find(int k) {
            if (size == 0) {
                return -1;
            }
            if (ascending && k > n[size - 1]) {
                return -1;
            }
            if (ascending) {
                int i = Arrays.binarySearch(n, 0, size, k);
                return i >= 0 ? i : -1;
            }
            Integer i = index.get(k);
            return i == null ? -1 : i;
        }

        @SuppressWarnings("unchecked")
        public E get(int k) {
            int i = find(k);
            return i < 0 ? null : (E) v[i];
        }

        public SourceLocation at(int k) {
            int i = find(k);
            return i < 0 ? null : SourceLocation.row(file[i], line[i]);
        }

        /** Adds a_k; the caller has made sure k is new. */
        public void put(int k, E value, String fileName, int lineNumber) {
            if (size == n.length) {
                int cap = size * 2;
                n = Arrays.copyOf(n, cap);
                v = Arrays.copyOf(v, cap);
                line = Arrays.copyOf(line, cap);
                file = Arrays.copyOf(file, cap);
            }
            if (ascending && size > 0 && k < n[size - 1]) {
                ascending = false;
                index = new HashMap<>();
                for (int i = 0; i < size; i++) {
                    index.put(n[i], i);
                }
            }
            if (!ascending) {
                index.put(k, size);
            }
            n[size] = k;
            v[size] = value;
            line[size] = lineNumber;
            file[size] = fileName;
            size++;
        }

        public boolean isEmpty() {
            return size == 0;
        }

        public Coefficients<E> build() {
            int[] idx = Arrays.copyOf(n, size);
            Object[] vals = Arrays.copyOf(v, size);
            int[] lns = Arrays.copyOf(line, size);
            String[] fls = Arrays.copyOf(file, size);
            if (!ascending) {
                Integer[] order = new Integer[size];
                for (int i = 0; i < size; i++) {
                    order[i] = i;
                }
                Arrays.sort(order, (a, b) -> Integer.compare(n[a], n[b]));
                for (int i = 0; i < size; i++) {
                    idx[i] = n[order[i]];
                    vals[i] = v[order[i]];
                    lns[i] = line[order[i]];
                    fls[i] = file[order[i]];
                }
            }
            return new Coefficients<>(idx, vals, lns, fls);
        }
    }
}
