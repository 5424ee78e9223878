package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Colour refinement (the one-dimensional Weisfeiler–Leman method), run jointly on several
 * graphs so that equal colours mean the same thing in all of them: a vertex's new colour is its
 * old colour together with the multiset of its neighbours' colours, renumbered through one
 * shared table, repeated until the number of colours stops growing. An isomorphism maps each
 * vertex to a vertex of the same stable colour, so the colours prune an isomorphism search and
 * differing colour counts rule isomorphism out. Each round costs O(edges · log degree); there
 * are at most as many rounds as vertices.
 */
final class ColourRefinement {
    private ColourRefinement() {
    }

    /**
     * The stable colours of each graph's vertices.
     *
     * @param adjacency per graph, the neighbours of each vertex
     * @param initial per graph, the starting colour of each vertex
     */
    static List<int[]> stableColours(List<int[][]> adjacency, List<int[]> initial) {
        List<int[]> colours = new ArrayList<>(initial);
        int classes = distinct(colours);
        while (true) {
            Map<List<Integer>, Integer> table = new HashMap<>();
            List<int[]> next = new ArrayList<>();
            for (int g = 0; g < colours.size(); g++) {
                next.add(refineOnce(adjacency.get(g), colours.get(g), table));
            }
            if (table.size() == classes) {
                return colours;
            }
            colours = next;
            classes = table.size();
        }
    }

    private static int[] refineOnce(int[][] adjacency, int[] colour, Map<List<Integer>, Integer> table) {
        int[] out = new int[colour.length];
        for (int v = 0; v < colour.length; v++) {
            int[] around = new int[adjacency[v].length];
            for (int k = 0; k < around.length; k++) {
                around[k] = colour[adjacency[v][k]];
            }
            Arrays.sort(around);
            List<Integer> signature = new ArrayList<>(around.length + 1);
            signature.add(colour[v]);
            for (int c : around) {
                signature.add(c);
            }
            out[v] = table.computeIfAbsent(signature, s -> table.size());
        }
        return out;
    }

    private static int distinct(List<int[]> colours) {
        return (int) colours.stream().flatMapToInt(Arrays::stream).distinct().count();
    }
}
