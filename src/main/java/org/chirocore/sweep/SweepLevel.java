package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.io.Json;

/**
 * What the sweep found at one cube dimension n. The counts are those of the whole enumeration
 * (every shard computes them); {@code pairs} holds the pairs of this run's shard only.
 *
 * @param n the cube dimension
 * @param orbits the number of hyperplane orbits under B_n
 * @param hyperplanes the number of hyperplanes spanned by vertices (the orbit sizes added up)
 * @param candidates the number of pairs (H, O ∉ H) up to symmetry
 * @param generalPositionPairs the number of pairs in general position up to symmetry
 * @param generalPositionPulls the number of general-position pairs (H, O) counted without symmetry
 * @param pairs the general-position pairs decided by this run, in enumeration order
 */
public record SweepLevel(int n, int orbits, long hyperplanes, int candidates, int generalPositionPairs,
        long generalPositionPulls, List<PairResult> pairs) {
    public SweepLevel {
        pairs = List.copyOf(pairs);
    }

    /** The same counts with other pairs (a merge's union). */
    SweepLevel withPairs(List<PairResult> others) {
        return new SweepLevel(n, orbits, hyperplanes, candidates, generalPositionPairs, generalPositionPulls, others);
    }

    /** The member of sweep.json. */
    public Json.Obj toJson() {
        List<Json> rows = new ArrayList<>();
        pairs.forEach(p -> rows.add(p.toJson()));
        return Json.Obj.builder()
                .put("n", n)
                .put("orbits", orbits)
                .put("hyperplanes", hyperplanes)
                .put("candidates", candidates)
                .put("generalPositionPairs", generalPositionPairs)
                .put("generalPositionPulls", generalPositionPulls)
                .put("pairs", new Json.Arr(rows))
                .build();
    }

    /**
     * Reads a level written by {@link #toJson}.
     *
     * @throws IllegalArgumentException naming the member when it is missing or of the wrong type
     */
    public static SweepLevel fromJson(Json.Obj o) {
        Json.Arr rows = o.requireArray("pairs");
        List<PairResult> pairs = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            pairs.add(PairResult.fromJson(rows.get(i).asObject("pairs[" + i + "]")));
        }
        return new SweepLevel(o.requireInt("n"), o.requireInt("orbits"), o.requireLong("hyperplanes"),
                o.requireInt("candidates"), o.requireInt("generalPositionPairs"), o.requireLong("generalPositionPulls"),
                pairs);
    }

    /** Whether the counts (not the pairs) agree with {@code other}'s. */
    boolean sameCounts(SweepLevel other) {
        return n == other.n && orbits == other.orbits && hyperplanes == other.hyperplanes
                && candidates == other.candidates && generalPositionPairs == other.generalPositionPairs
                && generalPositionPulls == other.generalPositionPulls;
    }
}
