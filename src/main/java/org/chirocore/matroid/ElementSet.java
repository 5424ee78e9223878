package org.chirocore.matroid;

import java.util.Arrays;
import java.util.BitSet;
import java.util.Comparator;

/**
 * A finite set of elements of a ground set, the elements being indices 0, 1, 2, …: the sets of
 * bases, restrictions and relations in the orientation and search APIs and in explicit matroids.
 * Held as a bit set in 64-bit words, so a set inside the first 64 elements is one word and its
 * operations are a few machine instructions; a ground set of {@link Limits#ELEMENTS} elements
 * takes {@code ELEMENTS / 64} words per set. Operations cost O(words); {@link #elements} and
 * {@link #compareLex} cost O(words + size). Immutable; equal sets are {@link #equals equal}
 * whatever their history.
 */
public final class ElementSet {
    /** The empty set. */
    public static final ElementSet EMPTY = new ElementSet(new long[0]);

    /**
     * Lexicographic order of the sets' sorted element tuples (a proper prefix first): the
     * canonical order of bases in the certificate format.
     */
    public static final Comparator<ElementSet> LEXICOGRAPHIC = ElementSet::compareLex;

    /** The bits, word i holding elements 64i..64i+63; the last word is non-zero. */
    private final long[] words;
    private final int hash;

    private ElementSet(long[] trimmedWords) {
        this.words = trimmedWords;
        this.hash = Arrays.hashCode(trimmedWords);
    }

    /** Takes ownership of {@code words} after dropping its trailing zero words. */
    private static ElementSet wrap(long[] words) {
        int n = words.length;
        while (n > 0 && words[n - 1] == 0) {
            n--;
        }
        if (n == 0) {
            return EMPTY;
        }
        return new ElementSet(n == words.length ? words : Arrays.copyOf(words, n));
    }

    /**
     * The set of the given elements, in any order; repeats are ignored.
     *
     * @throws IllegalArgumentException when an element is negative
     */
    public static ElementSet of(int... elements) {
        int max = -1;
        for (int e : elements) {
            if (e < 0) {
                throw new IllegalArgumentException("Element index " + e + " is negative.");
            }
            max = Math.max(max, e);
        }
        long[] w = new long[(max >> 6) + 1];
        for (int e : elements) {
            w[e >> 6] |= 1L << e;
        }
        return wrap(w);
    }

    /** The elements 0..n−1. */
    public static ElementSet range(int n) {
        if (n < 0) {
            throw new IllegalArgumentException("A range needs n >= 0, not " + n + ".");
        }
        long[] w = new long[(n + 63) >> 6];
        Arrays.fill(w, -1L);
        if ((n & 63) != 0) {
            w[w.length - 1] = (1L << n) - 1;
        }
        return wrap(w);
    }

    /** The set whose elements are the bits of {@code mask} (elements 0..63). */
    public static ElementSet ofMask(long mask) {
        return wrap(new long[] {mask});
    }

    /** The set of the bits set in {@code bits}. */
    public static ElementSet of(BitSet bits) {
        return wrap(bits.toLongArray());
    }

    /**
     * The set as a 64-bit mask, for code that is limited to 64 elements.
     *
     * @throws IllegalStateException when an element is 64 or more
     */
    public long toMask() {
        if (words.length > 1) {
            throw new IllegalStateException("The set " + this + " has an element beyond 63; it does not fit a 64-bit mask.");
        }
        return words.length == 0 ? 0 : words[0];
    }

    /** The set as a {@link BitSet} (a copy). */
    public BitSet toBitSet() {
        return BitSet.valueOf(words);
    }

    /** The number of elements. */
    public int size() {
        int n = 0;
        for (long w : words) {
            n += Long.bitCount(w);
        }
        return n;
    }

    public boolean isEmpty() {
        return words.length == 0;
    }

    /** Whether {@code e} is an element. */
    public boolean contains(int e) {
        int i = e >> 6;
        return e >= 0 && i < words.length && (words[i] & (1L << e)) != 0;
    }

    /** The elements in increasing order. */
    public int[] elements() {
        int[] out = new int[size()];
        int k = 0;
        for (int i = 0; i < words.length; i++) {
            for (long w = words[i]; w != 0; w &= w - 1) {
                out[k++] = (i << 6) + Long.numberOfTrailingZeros(w);
            }
        }
        return out;
    }

    /** The smallest element that is at least {@code from}, or −1 when there is none. */
    public int next(int from) {
        int i = Math.max(from, 0) >> 6;
        if (i >= words.length) {
            return -1;
        }
        long w = words[i] & (-1L << Math.max(from, 0));
        while (true) {
            if (w != 0) {
                return (i << 6) + Long.numberOfTrailingZeros(w);
            }
            if (++i == words.length) {
                return -1;
            }
            w = words[i];
        }
    }

    /** This set with {@code e} added. */
    public ElementSet with(int e) {
        if (contains(e)) {
            return this;
        }
        if (e < 0) {
            throw new IllegalArgumentException("Element index " + e + " is negative.");
        }
        long[] w = Arrays.copyOf(words, Math.max(words.length, (e >> 6) + 1));
        w[e >> 6] |= 1L << e;
        return new ElementSet(w);
    }

    /** This set with {@code e} removed. */
    public ElementSet without(int e) {
        if (!contains(e)) {
            return this;
        }
        long[] w = words.clone();
        w[e >> 6] &= ~(1L << e);
        return wrap(w);
    }

    public ElementSet union(ElementSet other) {
        long[] big = words.length >= other.words.length ? words : other.words;
        long[] small = big == words ? other.words : words;
        long[] w = big.clone();
        for (int i = 0; i < small.length; i++) {
            w[i] |= small[i];
        }
        return new ElementSet(w);
    }

    public ElementSet intersection(ElementSet other) {
        long[] w = new long[Math.min(words.length, other.words.length)];
        for (int i = 0; i < w.length; i++) {
            w[i] = words[i] & other.words[i];
        }
        return wrap(w);
    }

    /** The elements of this set that are not in {@code other}. */
    public ElementSet minus(ElementSet other) {
        long[] w = words.clone();
        for (int i = 0; i < Math.min(w.length, other.words.length); i++) {
            w[i] &= ~other.words[i];
        }
        return wrap(w);
    }

    /** Whether every element of this set is in {@code other}. */
    public boolean isSubsetOf(ElementSet other) {
        if (words.length > other.words.length) {
            return false;
        }
        for (int i = 0; i < words.length; i++) {
            if ((words[i] & ~other.words[i]) != 0) {
                return false;
            }
        }
        return true;
    }

    /** |this ∩ other|. */
    public int intersectionSize(ElementSet other) {
        int n = 0;
        for (int i = 0; i < Math.min(words.length, other.words.length); i++) {
            n += Long.bitCount(words[i] & other.words[i]);
        }
        return n;
    }

    /** The number of elements greater than {@code e}. */
    public int countAbove(int e) {
        int n = 0;
        int i = e >> 6;
        if (i < words.length) {
            n += Long.bitCount(words[i] >>> e >>> 1);
        }
        for (int j = Math.max(i + 1, 0); j < words.length; j++) {
            n += Long.bitCount(words[j]);
        }
        return n;
    }

    /**
     * Compares the sorted element tuples lexicographically (a proper prefix first). At the least
     * element d of the symmetric difference the tuples first differ: the set holding d is smaller
     * unless the other set has nothing above d (then the other is a prefix).
     */
    public int compareLex(ElementSet other) {
        int n = Math.max(words.length, other.words.length);
        for (int i = 0; i < n; i++) {
            long a = i < words.length ? words[i] : 0;
            long b = i < other.words.length ? other.words[i] : 0;
            if (a != b) {
                int d = (i << 6) + Long.numberOfTrailingZeros(a ^ b);
                boolean mine = contains(d);
                ElementSet lacking = mine ? other : this;
                boolean lackingGoesOn = lacking.next(d + 1) >= 0;
                return mine == lackingGoesOn ? -1 : 1;
            }
        }
        return 0;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ElementSet s && s.hash == hash && Arrays.equals(s.words, words);
    }

    @Override
    public int hashCode() {
        return hash;
    }

    /** The sorted elements in JSON style, e.g. {@code [0, 3, 5]}. */
    @Override
    public String toString() {
        return Arrays.toString(elements());
    }
}
