package io.github.eigengate.data;

import io.github.eigengate.arith.Rational;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * The coefficients a_n of one form as read from the tables, each with the row it was read from.
 *
 * <p>Stored compactly, so that one form with 10^7 coefficients fits in a small heap: integer values (the rational
 * forms) in an {@code int[]} or {@code long[]} (a {@link Rational} is made on each {@link #get}), other values as
 * objects; the indices implicit when they are exactly 1..size, else an ascending {@code int[]} (dense index sets
 * such as every prime get a lookup table indexed by n, sparse ones a binary search); the rows as runs of consecutive
 * lines of one file (the first position, line and file of each run), from which every row's line is derived.
 *
 * @param <E> the element type of the coefficient field
 */
public final class Coefficients<E> {

    private final int size;
    private final int[] indices;   // ascending; null when the indices are 1..size
    private final int[] ints;      // values, when all are integers of an int
    private final long[] longs;    // values, when all are integers of a long (and some not of an int)
    private final Object[] values; // otherwise
    private final int[] slot;      // slot[n] = position + 1; null when indices is null or too sparse
    private final int[] runStart;  // position of the first row of each run of consecutive lines, ascending
    private final int[] runLine;
    private final String[] runFile;

    private Coefficients(int size, int[] indices, int[] ints, long[] longs, Object[] values, int[] runStart,
                         int[] runLine, String[] runFile) {
        this.size = size;
        this.indices = indices;
        this.ints = ints;
        this.longs = longs;
        this.values = values;
        this.runStart = runStart;
        this.runLine = runLine;
        this.runFile = runFile;
        int max = maxIndex();
        if (indices != null && (long) max <= 4L * size + 4096) {
            slot = new int[max + 1];
            for (int i = 0; i < size; i++) {
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
        if (indices == null) {
            return n <= size ? (int) n - 1 : -1;
        }
        if (slot != null) {
            return n < slot.length ? slot[(int) n] - 1 : -1;
        }
        int i = Arrays.binarySearch(indices, 0, size, (int) n);
        return i >= 0 ? i : -1;
    }

    @SuppressWarnings("unchecked")
    private E value(int i) {
        if (ints != null) {
            return (E) Rational.of(ints[i]);
        }
        if (longs != null) {
            return (E) Rational.of(longs[i]);
        }
        return (E) values[i];
    }

    /** a_n, or {@code null} when the tables do not give it. */
    public E get(long n) {
        int i = position(n);
        return i < 0 ? null : value(i);
    }

    public boolean has(long n) {
        return position(n) >= 0;
    }

    /** The row a_n was read from, or {@code null} when absent. */
    public SourceLocation at(long n) {
        int i = position(n);
        if (i < 0) {
            return null;
        }
        int r = Arrays.binarySearch(runStart, i);
        if (r < 0) {
            r = -r - 2; // the run starting before i
        }
        return SourceLocation.row(runFile[r], runLine[r] + (i - runStart[r]));
    }

    /** The indices n present, ascending. */
    public int[] indices() {
        if (indices == null) {
            int[] all = new int[size];
            for (int i = 0; i < size; i++) {
                all[i] = i + 1;
            }
            return all;
        }
        return Arrays.copyOf(indices, size);
    }

    public int size() {
        return size;
    }

    /** The largest n present, 0 if none. */
    public int maxIndex() {
        return size == 0 ? 0 : indices == null ? size : indices[size - 1];
    }

    /**
     * Collects rows in reading order. Appending in ascending n (the usual layout) costs no lookup; anything else
     * falls back to an index map. Values are kept as primitives while they are integers.
     */
    public static final class Builder<E> {
        private int size;
        private int[] n;          // null while the indices are 1..size
        private int[] ints = new int[64];
        private long[] longs;
        private Object[] objects;
        private int runs;
        private int[] runStart = new int[4];
        private int[] runLine = new int[4];
        private String[] runFile = new String[4];
        private int lastLine;
        private boolean ascending = true;
        private Map<Integer, Integer> index;

        /** The position of index {@code k}, or -1. */
        private int find(int k) {
            if (size == 0) {
                return -1;
            }
            if (n == null) {
                return k >= 1 && k <= size ? k - 1 : -1;
            }
            if (ascending) {
                if (k > n[size - 1]) {
                    return -1;
                }
                int i = Arrays.binarySearch(n, 0, size, k);
                return i >= 0 ? i : -1;
            }
            Integer i = index.get(k);
            return i == null ? -1 : i;
        }

        @SuppressWarnings("unchecked")
        private E value(int i) {
            if (objects != null) {
                return (E) objects[i];
            }
            return (E) (longs != null ? Rational.of(longs[i]) : Rational.of(ints[i]));
        }

        public E get(int k) {
            int i = find(k);
            return i < 0 ? null : value(i);
        }

        public boolean has(int k) {
            return find(k) >= 0;
        }

        public SourceLocation at(int k) {
            int i = find(k);
            if (i < 0) {
                return null;
            }
            int r = Arrays.binarySearch(runStart, 0, runs, i);
            if (r < 0) {
                r = -r - 2;
            }
            return SourceLocation.row(runFile[r], runLine[r] + (i - runStart[r]));
        }

        /** Adds a_k; the caller has made sure k is new. */
        public void put(int k, E value, String fileName, int lineNumber) {
            if (value instanceof Rational r && r.isInteger() && r.num().bitLength() < 64 && objects == null) {
                putInteger(k, r.num().longValue(), fileName, lineNumber);
                return;
            }
            slotFor(k, fileName, lineNumber);
            if (objects == null) {
                toObjects();
            }
            objects[size - 1] = value;
        }

        /**
         * Adds a_k = v (an integer; the element type must be {@link Rational}), without making a Rational; the caller
         * has made sure k is new.
         */
        public void putInteger(int k, long v, String fileName, int lineNumber) {
            slotFor(k, fileName, lineNumber);
            int i = size - 1;
            if (objects != null) {
                objects[i] = Rational.of(v);
            } else if (longs != null) {
                longs[i] = v;
            } else if (v == (int) v) {
                ints[i] = (int) v;
            } else {
                longs = new long[ints.length];
                for (int j = 0; j < i; j++) {
                    longs[j] = ints[j];
                }
                ints = null;
                longs[i] = v;
            }
        }

        /** Records index k and its row at position size, growing the arrays; size is incremented. */
        private void slotFor(int k, String fileName, int lineNumber) {
            int cap = objects != null ? objects.length : longs != null ? longs.length : ints.length;
            if (size == cap) {
                int grown = Math.max(64, cap + (cap >> 1));
                if (objects != null) {
                    objects = Arrays.copyOf(objects, grown);
                } else if (longs != null) {
                    longs = Arrays.copyOf(longs, grown);
                } else {
                    ints = Arrays.copyOf(ints, grown);
                }
            }
            if (n == null && k != size + 1) {
                n = new int[Math.max(64, cap)];
                for (int i = 0; i < size; i++) {
                    n[i] = i + 1;
                }
            }
            if (n != null) {
                if (size >= n.length) {
                    n = Arrays.copyOf(n, Math.max(64, n.length + (n.length >> 1)));
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
            }
            if (runs == 0 || lineNumber != lastLine + 1 || !fileName.equals(runFile[runs - 1])) {
                if (runs == runStart.length) {
                    int grown = runs * 2;
                    runStart = Arrays.copyOf(runStart, grown);
                    runLine = Arrays.copyOf(runLine, grown);
                    runFile = Arrays.copyOf(runFile, grown);
                }
                runStart[runs] = size;
                runLine[runs] = lineNumber;
                runFile[runs] = fileName;
                runs++;
            }
            lastLine = lineNumber;
            size++;
        }

        private void toObjects() {
            int cap = longs != null ? longs.length : ints.length;
            objects = new Object[cap];
            for (int i = 0; i < size - 1; i++) {
                objects[i] = longs != null ? Rational.of(longs[i]) : Rational.of(ints[i]);
            }
            ints = null;
            longs = null;
        }

        public boolean isEmpty() {
            return size == 0;
        }

        public Coefficients<E> build() {
            int[] ix = n == null ? null : Arrays.copyOf(n, size);
            int[] is = ints == null ? null : Arrays.copyOf(ints, size);
            long[] ls = longs == null ? null : Arrays.copyOf(longs, size);
            Object[] os = objects == null ? null : Arrays.copyOf(objects, size);
            int[] rs = Arrays.copyOf(runStart, runs);
            int[] rl = Arrays.copyOf(runLine, runs);
            String[] rf = Arrays.copyOf(runFile, runs);
            if (ascending) {
                return new Coefficients<>(size, ix, is, ls, os, rs, rl, rf);
            }
            // sort by n; each row's line from the runs in reading order, then runs again in the sorted order
            Integer[] order = new Integer[size];
            for (int i = 0; i < size; i++) {
                order[i] = i;
            }
            Arrays.sort(order, (a, b) -> Integer.compare(n[a], n[b]));
            int[] lines = new int[size];
            String[] files = new String[size];
            for (int r = 0; r < runs; r++) {
                int end = r + 1 < runs ? rs[r + 1] : size;
                for (int i = rs[r]; i < end; i++) {
                    lines[i] = rl[r] + (i - rs[r]);
                    files[i] = rf[r];
                }
            }
            int[] sortedIx = new int[size];
            int[] sortedInts = is == null ? null : new int[size];
            long[] sortedLongs = ls == null ? null : new long[size];
            Object[] sortedObjects = os == null ? null : new Object[size];
            int[] nrs = new int[size];
            int[] nrl = new int[size];
            String[] nrf = new String[size];
            int nruns = 0;
            for (int i = 0; i < size; i++) {
                int j = order[i];
                sortedIx[i] = n[j];
                if (sortedInts != null) {
                    sortedInts[i] = is[j];
                } else if (sortedLongs != null) {
                    sortedLongs[i] = ls[j];
                } else {
                    sortedObjects[i] = os[j];
                }
                if (nruns == 0 || lines[j] != nrl[nruns - 1] + (i - nrs[nruns - 1]) || !files[j].equals(nrf[nruns - 1])) {
                    nrs[nruns] = i;
                    nrl[nruns] = lines[j];
                    nrf[nruns] = files[j];
                    nruns++;
                }
            }
            return new Coefficients<>(size, sortedIx, sortedInts, sortedLongs, sortedObjects,
                    Arrays.copyOf(nrs, nruns), Arrays.copyOf(nrl, nruns), Arrays.copyOf(nrf, nruns));
        }
    }
}
