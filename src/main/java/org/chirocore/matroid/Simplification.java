package org.chirocore.matroid;

import java.util.Arrays;

/**
 * The simplification of a matroid as a restriction: no loops, and one element (the first) of
 * each parallel class ([Ox, §1.7]). Projections of the cube from several points have many
 * parallel elements, so the simplification can be far smaller than the matroid. Costs at most
 * size × (number of classes) rank queries of two-element sets.
 */
public final class Simplification {
    private Simplification() {
    }

    /** The kept elements, strictly increasing: the first element of each parallel class. */
    public static int[] representatives(Matroid m) {
        int[] kept = new int[m.size()];
        int k = 0;
        for (int e = 0; e < m.size(); e++) {
            if (m.rank(new int[] {e}) == 0) {
                continue;
            }
            boolean parallel = false;
            for (int i = 0; i < k && !parallel; i++) {
                parallel = m.rank(new int[] {kept[i], e}) == 1;
            }
            if (!parallel) {
                kept[k++] = e;
            }
        }
        return Arrays.copyOf(kept, k);
    }
}
