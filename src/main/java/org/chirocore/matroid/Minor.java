package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The minor M/C\D of a matroid, evaluated through the parent's rank oracle:
 * rank_{M/C\D}(S) = rank_M(S ∪ C) − rank_M(C) for S ⊆ E − C − D ([Ox, Prop. 3.1.6]).
 * The remaining elements keep their labels and their relative order and are renumbered
 * 0, 1, … . Each query costs one parent rank query.
 */
public final class Minor implements Matroid {
    private final Matroid parent;
    private final int[] contracted;
    private final int[] kept;
    private final List<String> labels;
    private final int rank;
    private final int contractedRank;

    /**
     * @param contracted strictly increasing parent indices to contract
     * @param deleted strictly increasing parent indices to delete, disjoint from {@code contracted}
     */
    public Minor(Matroid parent, int[] contracted, int[] deleted) {
        this.parent = parent;
        this.contracted = contracted.clone();
        boolean[] gone = new boolean[parent.size()];
        for (int e : contracted) {
            gone[checkIndex(parent, e)] = true;
        }
        for (int e : deleted) {
            if (gone[checkIndex(parent, e)]) {
                throw new IllegalArgumentException("Element " + parent.labels().get(e)
                        + " cannot be both contracted and deleted.");
            }
            gone[e] = true;
        }
        List<String> names = new ArrayList<>();
        int[] keep = new int[parent.size()];
        int k = 0;
        for (int e = 0; e < parent.size(); e++) {
            if (!gone[e]) {
                keep[k++] = e;
                names.add(parent.labels().get(e));
            }
        }
        this.kept = Arrays.copyOf(keep, k);
        this.labels = List.copyOf(names);
        this.contractedRank = parent.rank(this.contracted);
        this.rank = parent.rank(ElementSets.union(kept, this.contracted)) - contractedRank;
    }

    /** The restriction M|S = M \ (E − S). */
    public static Minor restriction(Matroid parent, int[] kept) {
        boolean[] in = new boolean[parent.size()];
        for (int e : kept) {
            in[checkIndex(parent, e)] = true;
        }
        int[] deleted = new int[parent.size() - kept.length];
        int k = 0;
        for (int e = 0; e < parent.size(); e++) {
            if (!in[e]) {
                deleted[k++] = e;
            }
        }
        return new Minor(parent, new int[0], Arrays.copyOf(deleted, k));
    }

    private static int checkIndex(Matroid parent, int e) {
        if (e < 0 || e >= parent.size()) {
            throw new IllegalArgumentException("Element index " + e + " is outside 0.." + (parent.size() - 1) + ".");
        }
        return e;
    }

    /** The parent index of this minor's element {@code i}. */
    public int parentIndex(int i) {
        return kept[i];
    }

    @Override
    public List<String> labels() {
        return labels;
    }

    @Override
    public int rank() {
        return rank;
    }

    @Override
    public int rank(int[] set) {
        return parent.rank(ElementSets.union(lift(set), contracted)) - contractedRank;
    }

    /**
     * cl_{M/C\D}(S) consists of the remaining e with e ∈ cl_M(S ∪ C), as rank_{M/C\D}(S ∪ {e}) −
     * rank_{M/C\D}(S) = rank_M(S ∪ C ∪ {e}) − rank_M(S ∪ C): one closure query of the parent.
     */
    @Override
    public int[] inClosure(int[] set, int[] candidates) {
        int[] inParent = parent.inClosure(ElementSets.union(lift(set), contracted), lift(candidates));
        return Arrays.stream(inParent).map(e -> Arrays.binarySearch(kept, e)).toArray();
    }

    /** The parent indices of this minor's elements {@code set}, in the same order. */
    private int[] lift(int[] set) {
        int[] lifted = new int[set.length];
        for (int i = 0; i < set.length; i++) {
            lifted[i] = kept[set[i]];
        }
        return lifted;
    }

    /**
     * When C is independent and M/C\D keeps the rank r(M) − |C|, S is a basis of the minor exactly
     * when S ∪ C is a basis of M (both say |S| = r(M) − |C| and r(S ∪ C) = r(M)): one basis lookup
     * in the parent instead of a rank query, which for an explicit parent scans all its bases.
     */
    @Override
    public boolean isBasis(int[] set) {
        if (set.length != rank) {
            return false;
        }
        if (contractedRank != contracted.length || rank + contractedRank != parent.rank()) {
            return rank(set) == set.length;
        }
        return parent.isBasis(ElementSets.union(lift(set), contracted));
    }
}
