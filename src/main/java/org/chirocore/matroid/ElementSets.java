package org.chirocore.matroid;

import java.util.Arrays;
import java.util.List;
import java.util.StringJoiner;

/**
 * Small helpers for subsets of a ground set written as strictly increasing index arrays, and
 * for the 64-bit masks of the enumeration ({@code search.marco}, at most
 * {@link Limits#ENUMERATED_ELEMENTS} elements); sets of any size are {@link ElementSet}s. All
 * methods are pure.
 */
public final class ElementSets {
    private ElementSets() {
    }

    /** The mask with bit {@code i} set for every index {@code i} in {@code set}. */
    public static long mask(int[] set) {
        long m = 0L;
        for (int e : set) {
            if (e < 0 || e >= 64) {
                throw new IllegalArgumentException("Element index " + e + " does not fit a 64-element mask.");
            }
            m |= 1L << e;
        }
        return m;
    }

    /** The strictly increasing indices of the bits set in {@code mask}. */
    public static int[] elements(long mask) {
        int[] out = new int[Long.bitCount(mask)];
        int k = 0;
        for (long m = mask; m != 0; m &= m - 1) {
            out[k++] = Long.numberOfTrailingZeros(m);
        }
        return out;
    }

    /** The union of two strictly increasing arrays, strictly increasing. */
    public static int[] union(int[] a, int[] b) {
        int[] out = new int[a.length + b.length];
        int i = 0;
        int j = 0;
        int k = 0;
        while (i < a.length || j < b.length) {
            if (j == b.length || (i < a.length && a[i] < b[j])) {
                out[k++] = a[i++];
            } else if (i == a.length || b[j] < a[i]) {
                out[k++] = b[j++];
            } else {
                out[k++] = a[i++];
                j++;
            }
        }
        return Arrays.copyOf(out, k);
    }

    /** {@code set} with {@code e} inserted in order (unchanged if already present). */
    public static int[] with(int[] set, int e) {
        return union(set, new int[] {e});
    }

    /** Whether the strictly increasing array {@code set} contains {@code e}. */
    public static boolean contains(int[] set, int e) {
        return Arrays.binarySearch(set, e) >= 0;
    }

    /** The mask of the elements {@code 0..n-1}, for n ≤ 64. */
    public static long allMask(int n) {
        return n == 64 ? -1L : (1L << n) - 1;
    }

    /** The set written with its elements' labels for messages, e.g. "{100, 010, 001}". */
    public static String format(List<String> labels, int[] set) {
        StringJoiner out = new StringJoiner(", ", "{", "}");
        for (int e : set) {
            out.add(labels.get(e));
        }
        return out.toString();
    }

    /** The elements {@code 0..n-1}. */
    public static int[] range(int n) {
        int[] out = new int[n];
        for (int i = 0; i < n; i++) {
            out[i] = i;
        }
        return out;
    }

    /**
     * Advances {@code comb} (a strictly increasing k-subset of {0..n-1}) to the next k-subset in
     * lexicographic order.
     *
     * @return false when {@code comb} was the last one (it is then left unchanged)
     */
    public static boolean nextCombination(int[] comb, int n) {
        int k = comb.length;
        int i = k - 1;
        while (i >= 0 && comb[i] == n - k + i) {
            i--;
        }
        if (i < 0) {
            return false;
        }
        comb[i]++;
        for (int j = i + 1; j < k; j++) {
            comb[j] = comb[j - 1] + 1;
        }
        return true;
    }

    /** The binomial coefficient C(n, k) as a long, or {@code Long.MAX_VALUE} when it overflows. */
    public static long binomial(int n, int k) {
        if (k < 0 || k > n) {
            return 0;
        }
        k = Math.min(k, n - k);
        long c = 1;
        for (int i = 1; i <= k; i++) {
            try {
                c = Math.multiplyExact(c, n - k + i) / i;
            } catch (ArithmeticException overflow) {
                return Long.MAX_VALUE;
            }
        }
        return c;
    }
}
