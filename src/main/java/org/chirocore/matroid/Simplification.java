package org.chirocore.matroid;

import java.util.Arrays;
import java.util.stream.IntStream;

/**
 * The simplification of a matroid as a restriction: no loops, and one element (the first) of
 * each parallel class ([Ox, §1.7]). Projections of the cube from several points have many
 * parallel elements, so the simplification can be far smaller than the matroid. Costs one
 * {@link Matroid#inClosure} query for the loops and one per parallel class, each over the
 * elements not yet placed in a class: a dot product or two per element when the matroid is a
 * minor of a matrix matroid, which makes simplifying a contracted pulled 16-cube cheap.
 */
public final class Simplification {
    private Simplification() {
    }

    /** The kept elements, strictly increasing: the first element of each parallel class. */
    public static int[] representatives(Matroid m) {
        boolean[] placed = new boolean[m.size()];
        for (int loop : m.inClosure(new int[0], ElementSets.range(m.size()))) {
            placed[loop] = true;
        }
        int[] kept = new int[m.size()];
        int k = 0;
        for (int e = 0; e < m.size(); e++) {
            if (placed[e]) {
                continue;
            }
            kept[k++] = e;
            // a non-loop f with rank {e, f} = 1 is parallel to e
            int[] later = IntStream.range(e + 1, m.size()).filter(f -> !placed[f]).toArray();
            for (int f : m.inClosure(new int[] {e}, later)) {
                placed[f] = true;
            }
        }
        return Arrays.copyOf(kept, k);
    }
}
