package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.family.Shard;
import org.chirocore.io.Json;

/**
 * A sweep over the cube dimensions {@code from..to}, or one shard of it: the settings that
 * determine every certificate and the levels found.
 *
 * @param from the first dimension
 * @param to the last dimension
 * @param shard which pairs this run decided (pair index ≡ i mod k); 0/1 for a whole or merged run
 * @param seed the seed of every search
 * @param strategy the id of the search strategy
 * @param levels one per n of the range, in order
 * @param rankCores the search for a core of rank n per pair, when the run made one (sweep.json's
 *     {@code rankNCores}; absent in files of runs without it)
 */
public record SweepResult(int from, int to, Shard shard, long seed, String strategy, List<SweepLevel> levels,
        Optional<RankCoreSearch> rankCores) {
    /** The value of sweep.json's {@code format} member. */
    public static final String FORMAT = "chirocore-sweep-1";

    public SweepResult {
        levels = List.copyOf(levels);
    }

    /** The pairs found orientable (discoveries), over all levels. */
    public List<PairResult> discoveries() {
        return levels.stream().flatMap(l -> l.pairs().stream()).filter(PairResult::discovery).toList();
    }

    /** sweep.json's content. */
    public Json.Obj toJson() {
        List<Json> rows = new ArrayList<>();
        levels.forEach(l -> rows.add(l.toJson()));
        List<Json> found = new ArrayList<>();
        discoveries().forEach(p -> found.add(new Json.Str(p.id())));
        Json.Obj.Builder b = Json.Obj.builder()
                .put("format", FORMAT)
                .put("from", from)
                .put("to", to)
                .put("shard", Json.Obj.builder().put("index", shard.index()).put("count", shard.count()).build())
                .put("seed", seed)
                .put("strategy", strategy);
        rankCores.ifPresent(r -> b.put("rankNCores", r.toJson()));
        return b.put("orientablePulls", new Json.Arr(found))
                .put("levels", new Json.Arr(rows))
                .build();
    }

    /**
     * Reads sweep.json's content.
     *
     * @throws IllegalArgumentException naming the member when it is missing or of the wrong type
     */
    public static SweepResult fromJson(Json.Obj o) {
        if (!o.requireString("format").equals(FORMAT)) {
            throw new IllegalArgumentException("format is \"" + o.requireString("format") + "\", not \"" + FORMAT
                    + "\".");
        }
        Json.Obj s = o.requireObject("shard");
        Json.Arr rows = o.requireArray("levels");
        List<SweepLevel> levels = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            levels.add(SweepLevel.fromJson(rows.get(i).asObject("levels[" + i + "]")));
        }
        return new SweepResult(o.requireInt("from"), o.requireInt("to"), new Shard(s.requireInt("index"),
                s.requireInt("count")), o.requireLong("seed"), o.requireString("strategy"), levels,
                o.has("rankNCores") ? Optional.of(RankCoreSearch.fromJson(o.requireObject("rankNCores")))
                        : Optional.empty());
    }
}
