package org.chirocore.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.stream.Stream;

import org.chirocore.io.Json;

/**
 * A family run (docs/families.md): its definition, the table of {@code table.json} in two parts
 * that fit a page (sizes; proof and times), charts of the core's size, the DRAT lemmas and the
 * times against n, and the certificates with their content hashes.
 */
final class FamilyRunKind implements RunKind {
    static final String TABLE = "table.json";

    @Override
    public String name() {
        return "family run";
    }

    @Override
    public boolean recognises(Path dir) {
        return Files.isRegularFile(dir.resolve(TABLE));
    }

    @Override
    public String title(Path dir) {
        Json.Obj table = table(dir);
        List<Json.Obj> members = members(table);
        return "The family " + table.requireString("family") + ": n = " + members.get(0).requireLong("n") + ".."
                + members.get(members.size() - 1).requireLong("n");
    }

    @Override
    public List<Member> certificates(Path dir) {
        return members(table(dir)).stream().filter(m -> m.has("certificate"))
                .map(m -> new Member("n = " + m.requireLong("n"), dir.resolve(m.requireString("certificate")))).toList();
    }

    @Override
    public List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf) {
        Json.Obj table = table(dir);
        try {
            return summary(dir, table, members(table), classOf);
        } catch (IllegalArgumentException e) {
            throw new ReportException(dir.resolve(TABLE) + ": cannot be read as a family table: " + e.getMessage(), e);
        }
    }

    private static List<Document.Block> summary(Path dir, Json.Obj table, List<Json.Obj> members,
            Function<Path, Document.Inline> classOf) {
        List<Document.Block> blocks = new ArrayList<>();
        blocks.add(Document.Paragraph.of(table.requireString("description")));
        blocks.add(new Document.Bullets(List.of(
                List.of(new Document.Text("definition: "), new Document.Mono(table.requireString("definition"))),
                List.of(new Document.Text("field: " + table.requireString("field") + "; O contracted: "
                        + (table.requireBoolean("contractPulled") ? "yes" : "no"))),
                List.of(new Document.Text("search: seed " + table.requireLong("seed") + ", strategy "
                        + table.requireString("strategy"))))));
        blocks.add(new Document.Heading("Table"));
        blocks.add(new Document.Table(List.of("n", "elements", "rank", "core elements", "core rank", "bases", "non-bases",
                "class", "status"), members.stream().map(m -> {
                    Optional<Json.Obj> core = m.find("core").map(c -> c.asObject("core"));
                    Json.Obj pulled = m.requireObject("pulled");
                    List<Document.Inline> row = new ArrayList<>(Stream.of(Long.toString(m.requireLong("n")),
                            Long.toString(pulled.requireLong("elements")), Long.toString(pulled.requireLong("rank")),
                            cell(core, "elements"), cell(core, "rank"), cell(core, "bases"), cell(core, "nonBases"))
                            .<Document.Inline>map(Document.Text::new).toList());
                    row.add(m.has("certificate") ? classOf.apply(dir.resolve(m.requireString("certificate"))) : new Document.Text("-"));
                    row.add(new Document.Text(m.requireString("status")));
                    return row;
                }).toList()));
        blocks.add(Document.Table.plain(List.of("n", "relations", "DRAT lemmas", "DRAT bytes", "search ms", "refutation ms",
                "verify ms"), members.stream().map(m -> {
                    Optional<Json.Obj> proof = m.find("proof").map(c -> c.asObject("proof"));
                    Optional<Json.Obj> millis = m.find("millis").map(c -> c.asObject("millis"));
                    return List.of(Long.toString(m.requireLong("n")), cell(proof, "relations"), cell(proof, "lemmas"),
                            cell(proof, "dratBytes"), cell(millis, "search"), cell(millis, "refutation"), cell(millis, "verify"));
                }).toList()));
        blocks.add(Document.Paragraph.of("Times in ms: search and refutation as recorded when the certificate was written, "
                + "verification as rerun by the family run. Class: the core's isomorphism class when the catalogue names it "
                + "(docs/reports.md), after its certificate verified again for this report; details of each core below."));
        blocks.add(new Document.Heading("Charts"));
        blocks.add(new Document.Figure(LineChart.of("core-size", "Core size against n", "n", "elements",
                List.of(series("core elements", members, m -> m.requireObject("core").requireLong("elements"))))));
        blocks.add(new Document.Figure(LineChart.of("proof-size", "Proof size against n", "n", "DRAT lemmas",
                List.of(series("DRAT lemmas", members, m -> m.requireObject("proof").requireLong("lemmas"))))));
        blocks.add(new Document.Figure(LineChart.of("time", "Time against n", "n", "ms", List.of(
                series("search", members, m -> m.requireObject("millis").requireLong("search")),
                series("refutation", members, m -> m.requireObject("millis").requireLong("refutation")),
                series("verify", members, m -> m.requireObject("millis").requireLong("verify"))))));
        blocks.add(new Document.Heading("Certificates"));
        blocks.add(new Document.Bullets(members.stream().filter(m -> m.has("certificate"))
                .map(m -> List.<Document.Inline>of(new Document.Text("n = " + m.requireLong("n") + ": "),
                        new Document.Mono(m.requireString("certificate")), new Document.Text(", SHA-256 of its content "),
                        new Document.Mono(m.requireString("sha256"))))
                .toList()));
        blocks.add(Document.Paragraph.of("A referee re-checks every certificate with:"));
        blocks.add(RunFiles.verifyCommand(dir, "n=*.cert.json"));
        return blocks;
    }

    private static Json.Obj table(Path dir) {
        return RunFiles.object(dir.resolve(TABLE), "a family table");
    }

    private static List<Json.Obj> members(Json.Obj table) {
        try {
            List<Json.Obj> members = table.requireArray("members").elements().stream().map(m -> m.asObject("a member")).toList();
            if (members.isEmpty()) {
                throw new IllegalArgumentException("the table has no members");
            }
            return members;
        } catch (IllegalArgumentException e) {
            throw new ReportException("a family table: " + e.getMessage(), e);
        }
    }

    private static String cell(Optional<Json.Obj> obj, String name) {
        return obj.map(o -> Long.toString(o.requireLong(name))).orElse("-");
    }

    /** The members that have a core, as points (n, value). */
    private static LineChart.Series series(String name, List<Json.Obj> members, Function<Json.Obj, Long> value) {
        return new LineChart.Series(name, members.stream().filter(m -> m.has("core"))
                .map(m -> new long[] {m.requireLong("n"), value.apply(m)}).toList());
    }
}
