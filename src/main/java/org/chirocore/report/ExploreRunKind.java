package org.chirocore.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

import org.chirocore.io.Json;

/**
 * A family exploration (docs/families.md, {@code family --explore}): for each n, the
 * isomorphism classes of the cores its seeded runs found, how often, and each class's
 * certificate.
 */
final class ExploreRunKind implements RunKind {
    static final String RECORD = "explore.json";

    @Override
    public String name() {
        return "family exploration";
    }

    @Override
    public boolean recognises(Path dir) {
        return Files.isRegularFile(dir.resolve(RECORD));
    }

    @Override
    public String title(Path dir) {
        return "Exploration of the family " + record(dir).requireString("family");
    }

    @Override
    public List<Member> certificates(Path dir) {
        List<Member> out = new ArrayList<>();
        for (Json.Obj m : members(record(dir))) {
            int j = 0;
            for (Json c : m.requireArray("classes").elements()) {
                j++;
                Json.Obj cls = c.asObject("a class");
                if (cls.has("certificate") && !(cls.find("certificate").orElseThrow() instanceof Json.Null)) {
                    out.add(new Member("n = " + m.requireLong("n") + ", class " + j, dir.resolve(cls.requireString("certificate"))));
                }
            }
        }
        return out;
    }

    @Override
    public List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf) {
        Json.Obj r = record(dir);
        List<List<Document.Inline>> rows = new ArrayList<>();
        try {
            for (Json.Obj m : members(r)) {
                int j = 0;
                for (Json c : m.requireArray("classes").elements()) {
                    Json.Obj cls = c.asObject("a class");
                    boolean certified = cls.has("certificate") && !(cls.find("certificate").orElseThrow() instanceof Json.Null);
                    rows.add(List.of(text(m.requireLong("n")), text(++j), text(cls.requireLong("elements")),
                            text(cls.requireLong("rank")), text(cls.requireLong("bases")),
                            certified ? classOf.apply(dir.resolve(cls.requireString("certificate"))) : new Document.Text("-"),
                            text(cls.requireLong("frequency")), new Document.Text(cls.requireString("status"))));
                }
                rows.add(List.of(text(m.requireLong("n")), new Document.Text("-"), new Document.Text("-"),
                        new Document.Text("-"), new Document.Text("-"), new Document.Text("-"),
                        text(m.requireArray("rejected").size()), new Document.Text("runs rejected")));
            }
            return List.of(
                    Document.Paragraph.of("Seeded runs of the core search at each n (seed " + r.requireLong("seed") + ", "
                            + r.requireLong("runs") + " runs per n), their cores grouped by isomorphism class."),
                    new Document.Heading("Classes"),
                    new Document.Table(List.of("n", "class", "elements", "rank", "bases", "name", "runs", "status"), rows),
                    Document.Paragraph.of("A referee re-checks the certificates with:"),
                    RunFiles.verifyCommand(dir, "n=*.cert.json"));
        } catch (IllegalArgumentException e) {
            throw new ReportException(dir.resolve(RECORD) + ": cannot be read as an exploration: " + e.getMessage(), e);
        }
    }

    private static Document.Inline text(long value) {
        return new Document.Text(Long.toString(value));
    }

    private static Json.Obj record(Path dir) {
        return RunFiles.object(dir.resolve(RECORD), "an exploration");
    }

    private static List<Json.Obj> members(Json.Obj record) {
        try {
            return record.requireArray("members").elements().stream().map(m -> m.asObject("a member")).toList();
        } catch (IllegalArgumentException e) {
            throw new ReportException("an exploration: " + e.getMessage(), e);
        }
    }
}
