package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;

/**
 * Closures and flats through a rank oracle: the closure of S is S together with every element
 * whose addition keeps the rank ([Ox, §1.4]). Hyperplanes are the flats of rank r − 1,
 * hyperlines those of rank r − 2.
 */
public final class Flats {
    private Flats() {
    }

    /** The closure of {@code set}, strictly increasing. Costs size() rank queries. */
    public static int[] closure(Matroid m, int[] set) {
        int r = m.rank(set);
        int[] out = new int[m.size()];
        int k = 0;
        for (int e = 0; e < m.size(); e++) {
            if (ElementSets.contains(set, e) || m.rank(ElementSets.with(set, e)) == r) {
                out[k++] = e;
            }
        }
        return Arrays.copyOf(out, k);
    }

    /** Whether {@code set} is a flat: no outside element lies in its closure. */
    public static boolean isFlat(Matroid m, int[] set) {
        return firstOutsideInClosure(m, set) < 0;
    }

    /**
     * The first element outside {@code set} that lies in its closure, or −1 when {@code set} is a
     * flat. Costs one {@link Matroid#inClosure} of the other elements.
     */
    public static int firstOutsideInClosure(Matroid m, int[] set) {
        int[] outside = IntStream.range(0, m.size()).filter(e -> !ElementSets.contains(set, e)).toArray();
        int[] inClosure = m.inClosure(set, outside);
        return inClosure.length == 0 ? -1 : inClosure[0];
    }

    /**
     * All flats of rank {@code k} contained in {@code within} (itself a flat, or the ground set),
     * each once, in order of their lexicographically first spanning k-subset. Costs
     * C(|within|, k) rank queries plus one closure per flat found.
     */
    public static List<int[]> flatsOfRank(Matroid m, int k, int[] within) {
        Set<List<Integer>> seen = new LinkedHashSet<>();
        List<int[]> out = new ArrayList<>();
        if (k > within.length) {
            return out;
        }
        int[] comb = ElementSets.range(k);
        int[] chosen = new int[k];
        do {
            for (int i = 0; i < k; i++) {
                chosen[i] = within[comb[i]];
            }
            if (m.rank(chosen) != k || containedInFound(chosen, out)) {
                continue;
            }
            int[] flat = closure(m, chosen);
            if (seen.add(Arrays.stream(flat).boxed().toList())) {
                out.add(flat);
            }
        } while (ElementSets.nextCombination(comb, within.length));
        return out;
    }

    private static boolean containedInFound(int[] chosen, List<int[]> found) {
        for (int[] f : found) {
            boolean all = true;
            for (int e : chosen) {
                if (!ElementSets.contains(f, e)) {
                    all = false;
                    break;
                }
            }
            if (all) {
                return true;
            }
        }
        return false;
    }

    /** The hyperplanes (flats of rank r − 1) of {@code m}. */
    public static List<int[]> hyperplanes(Matroid m) {
        return flatsOfRank(m, m.rank() - 1, ElementSets.range(m.size()));
    }
}
