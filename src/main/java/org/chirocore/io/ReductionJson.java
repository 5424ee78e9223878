package org.chirocore.io;

import java.util.Locale;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.MinorWitness;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;

/**
 * The reduction file of {@code docs/reduction-format.md}: where the input came from, the search
 * settings, the verdict, and for a minimal core the core, the path M/C\D to it, its minimality
 * witnesses and the search figures. Members are always written in the documented order, so
 * equal inputs give identical text. Provisional: a certificate format will supersede it.
 * Cost: linear in the size of the core and its witnesses.
 */
public final class ReductionJson {
    /** The value of the {@code format} member. */
    public static final String FORMAT = "chirocore-reduction";
    /** The value of the {@code version} member. */
    public static final int VERSION = 1;

    private ReductionJson() {
    }

    /** Where the reduced matroid came from. */
    public sealed interface Source {
    }

    /** The matroid was built by a cube construction. */
    public record Constructed(CubeConstruction construction) implements Source {
    }

    /**
     * The matroid was read from a file.
     *
     * @param name the path as given by the user
     * @param sha256 the SHA-256 of the file's bytes, lower-case hex
     */
    public record FromFile(String name, String sha256) implements Source {
    }

    /**
     * The reduction file for {@code result}, obtained from {@code source} with {@code settings}.
     *
     * @throws org.chirocore.matroid.InvalidHyperplaneException when a constructed source's
     *     hyperplane does not fit its cube (it was built, so in practice it fits)
     */
    public static Json.Obj reduction(Source source, SearchSettings settings, SearchResult result) {
        Json.Obj.Builder b = Json.Obj.builder()
                .put("format", FORMAT)
                .put("version", VERSION)
                .put("source", source(source))
                .put("settings", settings(settings));
        if (result instanceof SearchResult.Found f) {
            MinimalCore core = f.core();
            b.put("verdict", "non-orientable-core")
                    .put("core", MatroidFiles.toJson(core.core()))
                    .put("path", Json.Obj.builder()
                            .put("contracted", Json.Arr.ofStrings(core.contracted()))
                            .put("deleted", Json.Arr.ofStrings(core.deleted()))
                            .build())
                    .put("witnesses", new Json.Arr(core.witnesses().stream().map(ReductionJson::witness).toList()))
                    .put("stats", Json.Obj.builder()
                            .put("decisions", core.stats().decisions())
                            .put("grownTo", core.stats().grownTo())
                            .put("millis", core.stats().millis())
                            .build());
        } else if (result instanceof SearchResult.Orientable o) {
            b.put("verdict", "orientable").put("signs", ResultJson.signString(o.witness()));
        } else if (result instanceof SearchResult.Unknown u) {
            b.put("verdict", "unknown").put("reason", u.reason());
        }
        return b.build();
    }

    /**
     * A construction as {@code n}, {@code field}, {@code hyperplane} ({@code equation} or null,
     * {@code vertices}), {@code pulled} and {@code contracted}.
     *
     * @throws org.chirocore.matroid.InvalidHyperplaneException when the hyperplane does not fit the cube
     */
    public static Json.Obj construction(CubeConstruction c) {
        return Json.Obj.builder()
                .put("n", c.n())
                .put("field", c.field().name())
                .put("hyperplane", Json.Obj.builder()
                        .put("equation", c.hyperplaneEquation().<Json>map(Json.Str::new).orElse(Json.NULL))
                        .put("vertices", Json.Arr.ofStrings(c.hyperplaneVertices()))
                        .build())
                .put("pulled", c.pulledVertex())
                .put("contracted", c.contractPulled())
                .build();
    }

    private static Json.Obj source(Source source) {
        if (source instanceof Constructed c) {
            return Json.Obj.builder().put("construction", construction(c.construction())).build();
        }
        FromFile f = (FromFile) source;
        return Json.Obj.builder().put("file", f.name()).put("sha256", f.sha256()).build();
    }

    private static Json.Obj settings(SearchSettings s) {
        Budget budget = s.budget();
        return Json.Obj.builder()
                .put("seed", s.seed())
                .put("strategy", s.strategy().id())
                .put("budget", Json.Obj.builder()
                        .put("conflictsPerCall", budget.conflictsPerCall())
                        .put("rounds", budget.rounds())
                        .put("millis", budget.millis())
                        .build())
                .build();
    }

    private static Json witness(MinorWitness w) {
        return Json.Obj.builder()
                .put("element", w.element())
                .put("operation", w.operation().name().toLowerCase(Locale.ROOT))
                .put("signs", ResultJson.signString(w.witness()))
                .build();
    }
}
