package org.chirocore.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.chirocore.io.Json;

/**
 * The report on a family run (docs/families.md): its definition, the table of
 * {@code table.json}, and charts of the core's size, the DRAT lemmas and the times against n.
 * The certificates are not re-verified here (the run verified them; the table says so, and the
 * report gives the command that re-checks them). Cost: linear in the table's size.
 */
public final class FamilyReport {
    private static final List<String> HEADER = List.of("n", "elements", "rank", "core elements", "core rank", "bases",
            "non-bases", "relations", "DRAT lemmas", "DRAT bytes", "search ms", "refutation ms", "verify ms", "status");

    private FamilyReport() {
    }

    /**
     * Describes the family run in {@code dir}.
     *
     * @throws ReportException when {@code dir/table.json} cannot be read or lacks a member
     */
    public static Document of(Path dir) {
        Path table = dir.resolve("table.json");
        try {
            return of(dir, Json.parseUtf8(Files.readAllBytes(table)).asObject("table"));
        } catch (IOException | IllegalArgumentException e) {
            throw new ReportException(table + ": cannot be read as a family table: " + e.getMessage(), e);
        }
    }

    private static Document of(Path dir, Json.Obj table) {
        List<Json.Obj> members = table.requireArray("members").elements().stream().map(m -> m.asObject("a member")).toList();
        if (members.isEmpty()) {
            throw new IllegalArgumentException("the table has no members");
        }
        List<Document.Block> blocks = new ArrayList<>();
        blocks.add(Document.Paragraph.of(table.requireString("description")));
        blocks.add(new Document.Bullets(List.of(
                List.of(new Document.Text("definition: "), new Document.Mono(table.requireString("definition"))),
                List.of(new Document.Text("field: " + table.requireString("field") + "; O contracted: "
                        + (table.requireBoolean("contractPulled") ? "yes" : "no"))),
                List.of(new Document.Text("search: seed " + table.requireLong("seed") + ", strategy "
                        + table.requireString("strategy"))))));
        blocks.add(new Document.Heading("Table"));
        blocks.add(new Document.Table(HEADER, members.stream().map(FamilyReport::row).toList()));
        blocks.add(Document.Paragraph.of("Times in ms: search and refutation as recorded when the certificate was written, "
                + "verification as rerun by the family run."));
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
        blocks.add(new Document.Table(List.of("n", "certificate", "SHA-256 of its content"), members.stream()
                .filter(m -> m.has("certificate"))
                .map(m -> List.of(Long.toString(m.requireLong("n")), m.requireString("certificate"), m.requireString("sha256")))
                .toList()));
        blocks.add(Document.Paragraph.of("A referee re-checks every certificate with:"));
        blocks.add(new Document.Code("java -jar chirocore.jar verify " + dir.resolve("n=*.cert.json")));
        return new Document("The family " + table.requireString("family") + ": n = " + members.get(0).requireLong("n") + ".."
                + members.get(members.size() - 1).requireLong("n"), blocks);
    }

    private static List<String> row(Json.Obj m) {
        Optional<Json.Obj> core = m.find("core").map(c -> c.asObject("core"));
        Optional<Json.Obj> proof = m.find("proof").map(c -> c.asObject("proof"));
        Optional<Json.Obj> millis = m.find("millis").map(c -> c.asObject("millis"));
        Json.Obj pulled = m.requireObject("pulled");
        return List.of(Long.toString(m.requireLong("n")), Long.toString(pulled.requireLong("elements")),
                Long.toString(pulled.requireLong("rank")), cell(core, "elements"), cell(core, "rank"), cell(core, "bases"),
                cell(core, "nonBases"), cell(proof, "relations"), cell(proof, "lemmas"), cell(proof, "dratBytes"),
                cell(millis, "search"), cell(millis, "refutation"), cell(millis, "verify"), m.requireString("status"));
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
