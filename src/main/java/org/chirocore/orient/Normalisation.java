package org.chirocore.orient;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

import org.chirocore.matroid.ElementSet;

/**
 * The bases whose sign may be fixed to +1 without loss of generality: reorienting a set A
 * multiplies χ(B) by (−1)^{|A∩B|} and −χ is a chirotope too, so any sign pattern on a family S
 * is reached when the vectors (1, 1_B), B ∈ S, are linearly independent over GF(2)
 * ([BLSWZ, §3.1–3.2] for reorientation; the independence argument is common practice). The
 * choice made here: the first basis B0 and, for each later element e outside B0 that is not a
 * loop, the basis B0 − f + e with the smallest such f.
 */
public final class Normalisation {
    private Normalisation() {
    }

    /** The variables to fix to +1, at most size − rank + 1 of them, in increasing order. */
    public static int[] fixedVariables(BasisIndex index) {
        List<Integer> out = new ArrayList<>();
        if (index.basisCount() == 0) {
            return new int[0];
        }
        ElementSet b0 = index.basis(1);
        out.add(1);
        for (int e = 0; e < index.size(); e++) {
            if (b0.contains(e)) {
                continue;
            }
            for (int f : b0.elements()) {
                int v = index.variable(b0.without(f).with(e));
                if (v != 0) {
                    out.add(v);
                    break;
                }
            }
        }
        int[] fixed = out.stream().mapToInt(Integer::intValue).sorted().toArray();
        if (!independentOverGf2(index, fixed)) {
            throw new IllegalStateException("The normalisation bases are not GF(2)-independent; fixing them would be unsound.");
        }
        return fixed;
    }

    /** Whether the vectors (1, 1_B) for the given variables' bases are linearly independent over GF(2). */
    public static boolean independentOverGf2(BasisIndex index, int[] variables) {
        List<BitSet> rows = new ArrayList<>();
        int n = index.size();
        for (int v : variables) {
            BitSet row = index.basis(v).toBitSet();
            row.set(n);
            rows.add(row);
        }
        int rank = 0;
        for (int bit = 0; bit <= n && rank < rows.size(); bit++) {
            int pivot = -1;
            for (int i = rank; i < rows.size(); i++) {
                if (rows.get(i).get(bit)) {
                    pivot = i;
                    break;
                }
            }
            if (pivot < 0) {
                continue;
            }
            BitSet p = rows.get(pivot);
            rows.set(pivot, rows.get(rank));
            rows.set(rank, p);
            for (int i = 0; i < rows.size(); i++) {
                if (i != rank && rows.get(i).get(bit)) {
                    rows.get(i).xor(p);
                }
            }
            rank++;
        }
        return rank == rows.size();
    }
}
