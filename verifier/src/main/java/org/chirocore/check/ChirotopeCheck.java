package org.chirocore.check;

import java.util.Optional;

/**
 * The verifier's check of a chirotope on its own, outside a certificate: the signs of a claimed
 * orientation of a matroid given by its bases, checked against every 3-term Grassmann–Plücker
 * relation with the same code that checks a certificate's minimality witnesses. Lets the
 * producer's tests pass an orientable answer through the independent checker.
 * Cost O(|bases| · r² · (n − r)² · log |bases|).
 */
public final class ChirotopeCheck {
    private ChirotopeCheck() {
    }

    /**
     * Why {@code signs} is not a chirotope of the matroid whose bases are {@code bases}, or
     * empty when it is one.
     *
     * @param size the number of elements, at most 64
     * @param rank the rank
     * @param bases the bases as bit masks, in lexicographic order of their sorted tuples
     * @param signs one '+' or '-' per basis, in the same order
     */
    public static Optional<String> violation(int size, int rank, long[] bases, String signs) {
        if (size < 0 || size > 64) {
            return Optional.of("a matroid of this format has at most 64 elements, not " + size);
        }
        for (int k = 0; k < bases.length; k++) {
            if (Long.bitCount(bases[k]) != rank || (size < 64 && bases[k] >>> size != 0)) {
                return Optional.of("basis " + k + " is not a " + rank + "-subset of the " + size + " elements");
            }
            if (k > 0 && !BasisTable.lexLess(bases[k - 1], bases[k])) {
                return Optional.of("the bases are not in lexicographic order at position " + k);
            }
        }
        if (signs.length() != bases.length) {
            return Optional.of(signs.length() + " signs for " + bases.length + " bases");
        }
        int[] values = new int[signs.length()];
        for (int i = 0; i < values.length; i++) {
            char s = signs.charAt(i);
            if (s != '+' && s != '-') {
                return Optional.of("'" + s + "' at position " + i + "; only '+' and '-' are signs");
            }
            values[i] = s == '+' ? 1 : -1;
        }
        return Relations.violated(new BasisTable(size, rank, bases), values);
    }
}
