package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.NamedMatroid;

/**
 * The family table: one row per n with the pulled matroid's size and rank, the core's size,
 * rank, bases and non-bases, its vertices, whether it is isomorphic to the core of n − 1, the
 * proof's size and the times, and under each n a {@link CoreDescription}. Written as Markdown
 * for people and JSON for programs, both atomically. Isomorphism costs what
 * {@link HyperplaneIsomorphismInspector} costs per consecutive pair of cores. Immutable.
 *
 * @param family the family
 * @param settings the run's settings
 * @param rows the rows, in increasing n
 */
public record FamilyTable(FamilyDefinition family, FamilyRun.Settings settings, List<Row> rows) {
    public FamilyTable {
        rows = List.copyOf(rows);
    }

    /**
     * One row.
     *
     * @param member what the run found at n
     * @param description the core's description, when there is a core
     * @param isomorphicToPrevious whether the core is isomorphic to the core at n − 1; empty when
     *     either has no core or n − 1 is not in the table
     */
    public record Row(MemberResult member, Optional<CoreDescription> description,
            Optional<Boolean> isomorphicToPrevious) {
    }

    /** The table of {@code results}, given in increasing n. */
    static FamilyTable of(FamilyDefinition family, FamilyRun.Settings settings, List<MemberResult> results) {
        List<Row> rows = new ArrayList<>();
        MemberResult previous = null;
        for (MemberResult r : results) {
            Optional<CoreDescription> description = core(r).map(CoreDescription::of);
            Optional<Boolean> iso = Optional.empty();
            if (previous != null && previous.n() == r.n() - 1 && core(previous).isPresent() && core(r).isPresent()) {
                iso = Optional.of(new HyperplaneIsomorphismInspector(core(previous).get(), core(r).get()).find()
                        .isPresent());
            }
            rows.add(new Row(r, description, iso));
            previous = r;
        }
        return new FamilyTable(family, settings, rows);
    }

    /**
     * Writes {@link FamilyRun#TABLE_MD} and {@link FamilyRun#TABLE_JSON} into {@code dir},
     * atomically. The JSON records which part of which range the table covers (member
     * {@value #PART}: from, to, shard, of), so that {@link FamilyMerge} can tell a complete set of
     * shards from one with a shard missing or repeated.
     */
    void write(Path dir, int from, int to, Shard shard) throws IOException {
        AtomicFiles.writeString(dir.resolve(FamilyRun.TABLE_MD), toMarkdown());
        Map<String, Json> members = new LinkedHashMap<>(toJson().members());
        members.put(PART, Json.Obj.builder().put("from", from).put("to", to).put("shard", shard.index())
                .put("of", shard.count()).build());
        AtomicFiles.writeJson(dir.resolve(FamilyRun.TABLE_JSON), new Json.Obj(members));
    }

    /** The member of the table's JSON file naming the part of the run it covers. */
    static final String PART = "part";

    /** The table in Markdown. */
    public String toMarkdown() {
        StringBuilder b = new StringBuilder();
        b.append("# Family ").append(family.name()).append("\n\n").append(family.description()).append("\n\n");
        b.append("Definition ").append(family.source()).append("; field ").append(family.field().name())
                .append("; pulled vertex ").append(family.contractPulled() ? "contracted" : "not contracted")
                .append("; seed ").append(settings.seed()).append(", strategy ").append(settings.strategy().id())
                .append(".\n\n");
        b.append("Times in ms: search and refutation as recorded in each certificate when it was written; ")
                .append("verification as rerun by the run that wrote this table.\n\n");
        b.append("| n | elements | rank | core elements | core rank | bases | non-bases | core vertices "
                + "| ≅ core of n − 1 | relations | DRAT lemmas | DRAT bytes | search | refutation | verify | status |\n");
        b.append("|---".repeat(16)).append("|\n");
        for (Row row : rows) {
            MemberResult m = row.member();
            b.append("| ").append(m.n()).append(" | ").append(m.elements()).append(" | ").append(m.rank()).append(" | ");
            if (m instanceof MemberResult.Certified c) {
                ExplicitMatroid core = c.facts().core();
                CertificateFacts f = c.facts();
                b.append(core.size()).append(" | ").append(core.rank()).append(" | ").append(core.basisCount())
                        .append(" | ").append(nonBases(core)).append(" | ").append(String.join(" ", core.labels()))
                        .append(" | ").append(row.isomorphicToPrevious().map(i -> i ? "yes" : "no").orElse("–"))
                        .append(" | ").append(f.relations()).append(" | ").append(f.lemmas()).append(" | ")
                        .append(f.dratBytes()).append(" | ").append(f.searchMillis()).append(" | ")
                        .append(f.refutationMillis()).append(" | ").append(c.verifyMillis()).append(" | ")
                        .append(c.status()).append(" |\n");
            } else {
                b.append("– | ".repeat(12)).append(m.status()).append(" |\n");
            }
        }
        for (Row row : rows) {
            b.append("\n## n = ").append(row.member().n()).append("\n\n");
            if (row.member() instanceof MemberResult.Certified c) {
                CoreDescription d = row.description().orElseThrow();
                b.append("- certificate: `").append(c.certificate()).append("` (sha256 ").append(c.facts().sha256())
                        .append("), ").append(c.status()).append("\n");
                b.append("- isomorphism class: ").append(Catalogue.identify(c.facts().core()).map(NamedMatroid::title)
                        .orElse("not in the catalogue of named matroids")).append("\n");
                b.append("- core vertices by weight: ").append(d.verticesText()).append("\n");
                b.append("- non-bases by weights: ").append(d.nonBasesText()).append("\n");
            } else {
                b.append("- no core: ").append(row.member().status()).append("\n");
            }
        }
        return b.toString();
    }

    /** The table as JSON. */
    public Json.Obj toJson() {
        List<Json> members = new ArrayList<>();
        for (Row row : rows) {
            MemberResult m = row.member();
            Json.Obj.Builder b = Json.Obj.builder()
                    .put("n", m.n())
                    .put("pulled", Json.Obj.builder().put("elements", m.elements()).put("rank", m.rank()).build());
            if (m instanceof MemberResult.Certified c) {
                ExplicitMatroid core = c.facts().core();
                CertificateFacts f = c.facts();
                b.put("status", c.status())
                        .put("certificate", c.certificate())
                        .put("sha256", f.sha256())
                        .put("reused", c.reused())
                        .put("core", Json.Obj.builder()
                                .put("elements", core.size())
                                .put("rank", core.rank())
                                .put("bases", core.basisCount())
                                .put("nonBases", nonBases(core))
                                .put("labels", Json.Arr.ofStrings(core.labels()))
                                .build())
                        .put("isomorphicToPrevious", row.isomorphicToPrevious().<Json>map(Json.Bool::new)
                                .orElse(Json.NULL))
                        .put("description", row.description().orElseThrow().toJson())
                        .put("proof", Json.Obj.builder()
                                .put("relations", f.relations())
                                .put("lemmas", f.lemmas())
                                .put("dratBytes", f.dratBytes())
                                .build())
                        .put("millis", Json.Obj.builder()
                                .put("search", f.searchMillis())
                                .put("refutation", f.refutationMillis())
                                .put("verify", c.verifyMillis())
                                .build());
            } else {
                b.put("status", m.status());
            }
            members.add(b.build());
        }
        return Json.Obj.builder()
                .put("family", family.name())
                .put("definition", family.source())
                .put("definitionSha256", family.sha256())
                .put("description", family.description())
                .put("field", family.field().name())
                .put("contractPulled", family.contractPulled())
                .put("seed", settings.seed())
                .put("strategy", settings.strategy().id())
                .put("members", new Json.Arr(members))
                .build();
    }

    private static Optional<ExplicitMatroid> core(MemberResult r) {
        return r instanceof MemberResult.Certified c ? Optional.of(c.facts().core()) : Optional.empty();
    }

    private static long nonBases(ExplicitMatroid core) {
        return ElementSets.binomial(core.size(), core.rank()) - core.basisCount();
    }
}
