package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;

/**
 * Finds the 3-term Grassmann–Plücker relations that a sign assignment on the bases violates.
 * For each (r−2)-set X the values χ(x, p, q) are tabulated once, so a full scan costs
 * C(n, r−2)·C(n−r+2, 2) index lookups plus C(n, r−2)·C(n−r+2, 4) term evaluations, with no
 * clause ever built: this is what keeps the lazy loop's memory bounded. Not thread-safe (it
 * reuses its tables); create one per thread.
 */
final class RelationScan {
    private final BasisIndex index;
    private final int rank;
    private int[][] table = new int[0][0];
    /** variables[i][j]: the variable of X ∪ {rest[i], rest[j]}, 0 when it is not a basis. */
    private int[][] variables = new int[0][0];
    private int[] rest = new int[0];
    private int[] parity = new int[0];
    private int[] keep = new int[0];

    RelationScan(BasisIndex index) {
        this.index = index;
        this.rank = index.rank();
    }

    /**
     * The relations among the elements of {@code active} that {@code signs} violates, at most
     * {@code limit} of them and at most {@code perX} for one X, in scan order (X lexicographic,
     * then a, b, c, d lexicographic). A cap per X spreads one round's relations over many
     * contractions M/X, which the solver needs far fewer rounds to refute than one crowded corner.
     *
     * @param signs one sign per variable, index v − 1
     */
    List<GpRelation> violated(byte[] signs, ElementSet active, int limit, int perX) {
        List<GpRelation> out = new ArrayList<>();
        int[] elements = active.elements();
        int n = elements.length;
        int k = rank - 2;
        if (k < 0 || n < rank + 2) {
            return out;
        }
        ensureTables(n);
        int[] comb = ElementSets.range(k);
        int[] x = new int[k];
        do {
            for (int i = 0; i < k; i++) {
                x[i] = elements[comb[i]];
            }
            int m = tabulate(signs, x, elements);
            if (m >= 4) {
                scan(x, m, out, Math.min(limit, out.size() + perX));
                if (out.size() >= limit) {
                    return out;
                }
            }
        } while (ElementSets.nextCombination(comb, n));
        return out;
    }

    private void ensureTables(int n) {
        if (table.length < n) {
            table = new int[n][n];
            variables = new int[n][n];
            rest = new int[n];
            parity = new int[n];
            keep = new int[n];
        }
    }

    /**
     * Counts, over every relation of the whole matroid with a non-zero term, for each variable
     * the relations whose non-zero terms use its basis ({@code involved}) and how many of those
     * {@code signs} violates ({@code violated}); both arrays are indexed v − 1 and overwritten.
     * Costs one full scan.
     *
     * @return the number of violated relations
     */
    long tally(byte[] signs, int[] involved, int[] violated) {
        Arrays.fill(involved, 0);
        Arrays.fill(violated, 0);
        int[] elements = ElementSets.range(index.size());
        int n = elements.length;
        int k = rank - 2;
        if (k < 0 || n < rank + 2) {
            return 0;
        }
        ensureTables(n);
        long total = 0;
        int[] comb = ElementSets.range(k);
        do {
            int m = tabulate(signs, comb, elements);
            total += tallyX(m, involved, violated);
        } while (ElementSets.nextCombination(comb, n));
        return total;
    }

    private long tallyX(int m, int[] involved, int[] violated) {
        int[][] t = table;
        int[][] w = variables;
        long total = 0;
        for (int a = 0; a < m; a++) {
            for (int b = a + 1; b < m; b++) {
                for (int c = b + 1; c < m; c++) {
                    for (int d = c + 1; d < m; d++) {
                        int t1 = t[a][b] * t[c][d];
                        int t2 = -t[a][c] * t[b][d];
                        int t3 = t[a][d] * t[b][c];
                        if (t1 == 0 && t2 == 0 && t3 == 0) {
                            continue;
                        }
                        int pos = (t1 > 0 ? 1 : 0) + (t2 > 0 ? 1 : 0) + (t3 > 0 ? 1 : 0);
                        int neg = (t1 < 0 ? 1 : 0) + (t2 < 0 ? 1 : 0) + (t3 < 0 ? 1 : 0);
                        int bad = (pos == 0) != (neg == 0) ? 1 : 0;
                        total += bad;
                        if (t1 != 0) {
                            count(w[a][b], bad, involved, violated);
                            count(w[c][d], bad, involved, violated);
                        }
                        if (t2 != 0) {
                            count(w[a][c], bad, involved, violated);
                            count(w[b][d], bad, involved, violated);
                        }
                        if (t3 != 0) {
                            count(w[a][d], bad, involved, violated);
                            count(w[b][c], bad, involved, violated);
                        }
                    }
                }
            }
        }
        return total;
    }

    private static void count(int variable, int bad, int[] involved, int[] violated) {
        involved[variable - 1]++;
        violated[variable - 1] += bad;
    }
    /**
     * Fills {@code table[i][j]} = χ(x, rest[i], rest[j]) for the elements outside X (sorted
     * {@code x}, a subset of the sorted {@code elements}) that are not loops of M/X, and returns
     * how many there are.
     */
    private int tabulate(byte[] signs, int[] x, int[] elements) {
        // parity[i]: parity of the number of elements of X above rest[i]; moving p then q behind
        // the sorted x costs that many transpositions each.
        int m = 0;
        int inX = 0;
        for (int e : elements) {
            if (inX < x.length && x[inX] == e) {
                inX++;
            } else {
                parity[m] = (x.length - inX) & 1;
                rest[m++] = e;
            }
        }
        for (int i = 0; i < m; i++) {
            table[i][i] = 0;
            for (int j = i + 1; j < m; j++) {
                int v = index.variable(x, rest[i], rest[j]);
                int value = v == 0 ? 0 : ((parity[i] ^ parity[j]) == 0 ? signs[v - 1] : -signs[v - 1]);
                table[i][j] = value;
                table[j][i] = -value;
                variables[i][j] = v;
                variables[j][i] = v;
            }
        }
        // Drop loops of M/X (all-zero rows): they take part in no non-trivial relation. Rows and
        // columns are compacted in place; a row moves only to a position already read.
        int kept = 0;
        for (int i = 0; i < m; i++) {
            boolean zero = true;
            for (int j = 0; j < m && zero; j++) {
                zero = table[i][j] == 0;
            }
            if (!zero) {
                keep[kept++] = i;
            }
        }
        for (int i = 0; i < kept; i++) {
            int[] from = table[keep[i]];
            int[] to = table[i];
            int[] fromVariables = variables[keep[i]];
            int[] toVariables = variables[i];
            for (int j = 0; j < kept; j++) {
                to[j] = from[keep[j]];
                toVariables[j] = fromVariables[keep[j]];
            }
            rest[i] = rest[keep[i]];
        }
        return kept;
    }

    /** Scans the 4-subsets of rest[0..m) until {@code out} holds {@code limit} relations. */
    private void scan(int[] x, int m, List<GpRelation> out, int limit) {
        int[][] t = table;
        ElementSet xSet = null;
        for (int a = 0; a < m; a++) {
            int[] ta = t[a];
            for (int b = a + 1; b < m; b++) {
                int[] tb = t[b];
                int ab = ta[b];
                for (int c = b + 1; c < m; c++) {
                    int ac = ta[c];
                    int bc = tb[c];
                    int[] tc = t[c];
                    for (int d = c + 1; d < m; d++) {
                        int t1 = ab * tc[d];
                        int t2 = -ac * tb[d];
                        int t3 = ta[d] * bc;
                        int pos = (t1 > 0 ? 1 : 0) + (t2 > 0 ? 1 : 0) + (t3 > 0 ? 1 : 0);
                        int neg = (t1 < 0 ? 1 : 0) + (t2 < 0 ? 1 : 0) + (t3 < 0 ? 1 : 0);
                        if ((pos == 0) != (neg == 0)) {
                            xSet = xSet == null ? ElementSet.of(x) : xSet;
                            out.add(new GpRelation(xSet, rest[a], rest[b], rest[c], rest[d]));
                            if (out.size() >= limit) {
                                return;
                            }
                        }
                    }
                }
            }
        }
    }
}
