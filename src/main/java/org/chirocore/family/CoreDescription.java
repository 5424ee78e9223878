package org.chirocore.family;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.chirocore.io.Json;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;

/**
 * A description of a core whose elements are cube vertices, meant to help a person state a
 * family: the vertices grouped by Hamming weight, and the non-bases (r-sets that are not bases)
 * grouped by the multiset of their vertices' weights, e.g. "{1,1,1}: 1 non-basis". Equal cores
 * give equal descriptions; isomorphic cores need not. Cost: C(|E|, r) basis tests.
 *
 * @param verticesByWeight the core's labels in element order, filed under their weight
 * @param nonBasesByWeights the number of non-bases for each sorted list of weights, in
 *     lexicographic order of the lists
 */
public record CoreDescription(Map<Integer, List<String>> verticesByWeight, Map<List<Integer>, Integer> nonBasesByWeights) {
    private static final Comparator<List<Integer>> LEXICOGRAPHIC = (a, b) -> {
        for (int k = 0; k < Math.min(a.size(), b.size()); k++) {
            int c = Integer.compare(a.get(k), b.get(k));
            if (c != 0) {
                return c;
            }
        }
        return Integer.compare(a.size(), b.size());
    };

    public CoreDescription {
        TreeMap<Integer, List<String>> vertices = new TreeMap<>();
        verticesByWeight.forEach((w, labels) -> vertices.put(w, List.copyOf(labels)));
        verticesByWeight = Collections.unmodifiableMap(vertices);
        TreeMap<List<Integer>, Integer> nonBases = new TreeMap<>(LEXICOGRAPHIC);
        nonBasesByWeights.forEach((w, count) -> nonBases.put(List.copyOf(w), count));
        nonBasesByWeights = Collections.unmodifiableMap(nonBases);
    }

    /**
     * The description of {@code core}, whose labels must be 0/1 vertex labels.
     *
     * @throws IllegalArgumentException naming a label that is not a 0/1 string
     */
    public static CoreDescription of(ExplicitMatroid core) {
        int[] weight = new int[core.size()];
        Map<Integer, List<String>> vertices = new TreeMap<>();
        for (int e = 0; e < core.size(); e++) {
            String label = core.labels().get(e);
            if (!label.matches("[01]+")) {
                throw new IllegalArgumentException("The core's element \"" + label + "\" is not a cube vertex.");
            }
            weight[e] = (int) label.chars().filter(c -> c == '1').count();
            vertices.computeIfAbsent(weight[e], w -> new ArrayList<>()).add(label);
        }
        Map<List<Integer>, Integer> nonBases = new TreeMap<>(LEXICOGRAPHIC);
        int[] set = ElementSets.range(core.rank());
        do {
            if (!core.isBasis(set)) {
                List<Integer> weights = new ArrayList<>();
                for (int e : set) {
                    weights.add(weight[e]);
                }
                Collections.sort(weights);
                nonBases.merge(weights, 1, Integer::sum);
            }
        } while (ElementSets.nextCombination(set, core.size()));
        return new CoreDescription(vertices, nonBases);
    }

    /** "weight 1: 100 010 001; weight 2: 110 101 011". */
    public String verticesText() {
        List<String> parts = new ArrayList<>();
        verticesByWeight.forEach((w, labels) -> parts.add("weight " + w + ": " + String.join(" ", labels)));
        return String.join("; ", parts);
    }

    /** "{1,1,1}: 1 non-basis; {0,2,2}: 3 non-bases", or "none". */
    public String nonBasesText() {
        List<String> parts = new ArrayList<>();
        nonBasesByWeights.forEach((w, count) -> parts.add(multiset(w) + ": " + count + " non-bas"
                + (count == 1 ? "is" : "es")));
        return parts.isEmpty() ? "none" : String.join("; ", parts);
    }

    /** The description as JSON: {"vertices": {"1": [...]}, "nonBases": {"{1,1,1}": 1}}. */
    public Json.Obj toJson() {
        Json.Obj.Builder vertices = Json.Obj.builder();
        verticesByWeight.forEach((w, labels) -> vertices.put(String.valueOf(w), Json.Arr.ofStrings(labels)));
        Json.Obj.Builder nonBases = Json.Obj.builder();
        nonBasesByWeights.forEach((w, count) -> nonBases.put(multiset(w), count));
        return Json.Obj.builder().put("vertices", vertices.build()).put("nonBases", nonBases.build()).build();
    }

    private static String multiset(List<Integer> weights) {
        return "{" + String.join(",", weights.stream().map(String::valueOf).toList()) + "}";
    }
}
