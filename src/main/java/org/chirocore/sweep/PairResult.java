package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.io.Json;

/**
 * The outcome of one general-position pair (H, O) of the sweep, as sweep.json records it.
 *
 * @param n the cube dimension
 * @param index the pair's position among the general-position pairs of the n-cube, in the order
 *     of the enumeration (shards select by it)
 * @param normal H's canonical integer normal a
 * @param offset H's offset b
 * @param hyperplane the labels of H's vertices
 * @param pulled the label of O
 * @param hyperplaneOrbit the number of hyperplanes in H's orbit under B_n
 * @param orbitSize the number of pairs in the orbit of (H, O) under B_n
 * @param pulledVerdict the verdict on the pulled cube (rank n + 1 on 2^n elements)
 * @param contractedVerdict the verdict on the pulled cube with O contracted
 * @param core the minimal non-orientable core both certificates prove, when there is one
 * @param rankCore the outcome of the search for a core of rank n of M'/O, when the run searched
 *     one ({@link RankCoreSearch})
 */
public record PairResult(int n, int index, List<Integer> normal, int offset, List<String> hyperplane, String pulled,
        long hyperplaneOrbit, long orbitSize, Verdict pulledVerdict, Verdict contractedVerdict, Optional<Core> core,
        Optional<RankCore> rankCore) {
    public PairResult {
        normal = List.copyOf(normal);
        hyperplane = List.copyOf(hyperplane);
    }

    /**
     * A minimal non-orientable core.
     *
     * @param elements its number of elements
     * @param rank its rank
     * @param labels the cube vertices it keeps
     * @param name a well-known name (F7, F7*, AG(3,2)) when it is isomorphic to one
     */
    public record Core(int elements, int rank, List<String> labels, Optional<String> name) {
        public Core {
            labels = List.copyOf(labels);
        }
    }

    /** A name for the pair's files: n, normal, offset and O, e.g. {@code n3_a1-1-1_b1_o111}. */
    public String id() {
        return id(n, normal, offset, pulled);
    }

    /** The id of the pair (n, a·x = b, O); see {@link #id()}. */
    public static String id(int n, List<Integer> normal, int offset, String pulled) {
        StringBuilder s = new StringBuilder("n").append(n).append("_a");
        for (int i = 0; i < normal.size(); i++) {
            s.append(i == 0 ? "" : "-").append(normal.get(i));
        }
        return s.append("_b").append(offset).append("_o").append(pulled).toString();
    }

    /** The same pair with another rank-n core outcome (or none). */
    PairResult withRankCore(Optional<RankCore> other) {
        return new PairResult(n, index, normal, offset, hyperplane, pulled, hyperplaneOrbit, orbitSize, pulledVerdict,
                contractedVerdict, core, other);
    }

    /** Whether either matroid was found orientable: no such pull was known. */
    public boolean discovery() {
        return pulledVerdict instanceof Verdict.Orientable || contractedVerdict instanceof Verdict.Orientable;
    }

    /** The pair as a member of sweep.json. */
    public Json.Obj toJson() {
        List<Json> a = new ArrayList<>();
        normal.forEach(x -> a.add(Json.Num.of(x)));
        Json.Obj.Builder b = Json.Obj.builder()
                .put("n", n)
                .put("index", index)
                .put("normal", new Json.Arr(a))
                .put("offset", offset)
                .put("hyperplane", Json.Arr.ofStrings(hyperplane))
                .put("pulled", pulled)
                .put("hyperplaneOrbit", hyperplaneOrbit)
                .put("orbitSize", orbitSize)
                .put("pulledMatroid", withShape(pulledVerdict.toJson(), 1 << n, n + 1))
                .put("contracted", withShape(contractedVerdict.toJson(), (1 << n) - 1, n));
        core.ifPresent(c -> {
            Json.Obj.Builder cb = Json.Obj.builder()
                    .put("elements", c.elements())
                    .put("rank", c.rank())
                    .put("labels", Json.Arr.ofStrings(c.labels()));
            c.name().ifPresent(name -> cb.put("name", name));
            b.put("core", cb.build());
        });
        rankCore.ifPresent(r -> b.put("rankNCore", r.toJson()));
        if (discovery()) {
            b.put("discovery", "ORIENTABLE PULL: this pull is orientable, which no published result reports");
        }
        return b.build();
    }

    private static Json.Obj withShape(Json.Obj verdict, int elements, int rank) {
        Json.Obj.Builder b = Json.Obj.builder().put("elements", elements).put("rank", rank);
        verdict.members().forEach(b::put);
        return b.build();
    }

    /**
     * Reads a pair written by {@link #toJson}.
     *
     * @throws IllegalArgumentException naming the member when it is missing or of the wrong type
     */
    public static PairResult fromJson(Json.Obj o) {
        Json.Arr a = o.requireArray("normal");
        List<Integer> normal = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            normal.add(a.get(i).asInt("normal[" + i + "]"));
        }
        Optional<Core> core = Optional.empty();
        if (o.has("core")) {
            Json.Obj c = o.requireObject("core");
            core = Optional.of(new Core(c.requireInt("elements"), c.requireInt("rank"), strings(c.requireArray("labels")),
                    c.has("name") ? Optional.of(c.requireString("name")) : Optional.empty()));
        }
        return new PairResult(o.requireInt("n"), o.requireInt("index"), normal, o.requireInt("offset"),
                strings(o.requireArray("hyperplane")), o.requireString("pulled"), o.requireLong("hyperplaneOrbit"),
                o.requireLong("orbitSize"), Verdict.fromJson(o.requireObject("pulledMatroid")),
                Verdict.fromJson(o.requireObject("contracted")), core,
                o.has("rankNCore") ? Optional.of(RankCore.fromJson(o.requireObject("rankNCore"))) : Optional.empty());
    }

    private static List<String> strings(Json.Arr a) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            out.add(a.get(i).asString("[" + i + "]"));
        }
        return out;
    }
}
