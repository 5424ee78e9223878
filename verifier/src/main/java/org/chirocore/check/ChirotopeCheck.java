package org.chirocore.check;

import java.util.Arrays;
import java.util.List;
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
     * @param size the number of elements, at most {@link VerifierLimits#MAX_ELEMENTS}
     * @param rank the rank
     * @param bases the bases as sorted element arrays, in lexicographic order
     * @param signs one '+' or '-' per basis, in the same order
     */
    public static Optional<String> violation(int size, int rank, List<int[]> bases, String signs) {
        if (size < 0 || size > VerifierLimits.MAX_ELEMENTS) {
            return Optional.of("a matroid of this format has at most " + VerifierLimits.MAX_ELEMENTS + " elements, not " + size);
        }
        for (int k = 0; k < bases.size(); k++) {
            int[] b = bases.get(k);
            boolean sorted = b.length == rank;
            for (int i = 0; i < b.length && sorted; i++) {
                sorted = b[i] >= (i == 0 ? 0 : b[i - 1] + 1) && b[i] < size;
            }
            if (!sorted) {
                return Optional.of("basis " + k + " is not a sorted " + rank + "-subset of the " + size + " elements");
            }
            if (k > 0 && Arrays.compare(bases.get(k - 1), b) >= 0) {
                return Optional.of("the bases are not in lexicographic order at position " + k);
            }
        }
        if (signs.length() != bases.size()) {
            return Optional.of(signs.length() + " signs for " + bases.size() + " bases");
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
