package org.chirocore.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.chirocore.io.Json;

/**
 * An enumeration of the minor-minimal non-orientable minors of one matroid up to its symmetries
 * (docs/enumeration.md, {@code enumerate}): its record {@code summary.json} lists each
 * isomorphism class found, with a certificate {@code class-K.cert.json} of the class's first
 * core. The report says whether the enumeration is complete, and when it is not, why (a budget
 * ran out): the classes of an incomplete enumeration are those found, not all there are.
 */
final class EnumerationRunKind implements RunKind {
    static final String RECORD = "summary.json";
    private static final String FORMAT = "chirocore-enumeration";

    @Override
    public String name() {
        return "enumeration";
    }

    @Override
    public boolean recognises(Path dir) {
        return Files.isRegularFile(dir.resolve(RECORD));
    }

    @Override
    public String title(Path dir) {
        Json.Obj input = read(dir, r -> r.requireObject("input"));
        return "Minor-minimal non-orientable minors of a rank-" + input.requireLong("rank") + " matroid on "
                + input.requireLong("elements") + " elements";
    }

    @Override
    public List<Member> certificates(Path dir) {
        List<Member> out = new ArrayList<>();
        for (Json.Obj c : classes(dir)) {
            certificate(dir, c).ifPresent(file -> out.add(new Member("class " + c.requireLong("class"), file)));
        }
        return out;
    }

    @Override
    public List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf) {
        return read(dir, r -> {
            List<List<Document.Inline>> rows = new ArrayList<>();
            for (Json.Obj c : classes(dir)) {
                Json.Obj example = c.requireObject("example");
                List<String> contracted = strings(example.requireArray("contracted"));
                rows.add(List.of(text(Long.toString(c.requireLong("class"))), text(Long.toString(c.requireLong("elements"))),
                        text(Long.toString(c.requireLong("rank"))), text(Long.toString(c.requireLong("bases"))),
                        text(Long.toString(c.requireLong("count"))),
                        certificate(dir, c).map(classOf).orElse(text("no certificate")),
                        new Document.Mono(contracted.isEmpty() ? "none" : String.join(" ", contracted)),
                        new Document.Mono(String.join(" ", strings(example.requireArray("labels"))))));
            }
            Json.Obj symmetry = r.requireObject("symmetry");
            Json.Obj sets = r.requireObject("contractionSets");
            return List.of(Document.Paragraph.of("Input: " + input(r.requireObject("input")) + "; ranks "
                            + strings(r.requireArray("ranks")) + "; symmetry " + symmetry.requireString("kind") + " (order "
                            + symmetry.requireLong("order") + ")."),
                    Document.Paragraph.of(completeness(r) + " " + sets.requireLong("representatives")
                            + " contraction sets up to symmetry (" + sets.requireLong("all") + " in all), "
                            + r.requireLong("minimalNonOrientableRestrictions") + " minimal non-orientable restrictions, "
                            + r.requireLong("withNonOrientableContraction") + " of them with a non-orientable single-element "
                            + "contraction; " + r.requireLong("solverCalls") + " solver calls."),
                    new Document.Heading("Classes"),
                    new Document.Table(List.of("class", "k", "r", "bases", "count", "name", "C", "example labels"), rows),
                    Document.Paragraph.of("k, r, bases: the elements, rank and number of bases of the class's cores; count: "
                            + "the cores found in the class; name: its isomorphism class when the catalogue names it and its "
                            + "certificate verifies; C and example labels: the first core found is M/C restricted to those "
                            + "labels."),
                    Document.Paragraph.of("A referee re-checks the certificates with:"),
                    RunFiles.verifyCommand(dir, "class-*.cert.json"));
        });
    }

    /**
     * Whether the enumeration is complete, in words. Complete only when the record says so and
     * gives no reason for stopping early; anything else is reported as incomplete.
     */
    private static String completeness(Json.Obj record) {
        Optional<String> reason = record.find("incomplete").filter(j -> j instanceof Json.Str).map(j -> j.asString("a reason"));
        if (record.requireBoolean("complete") && reason.isEmpty()) {
            return "The enumeration is complete: every minor-minimal non-orientable minor of the ranks searched is in one "
                    + "of the classes below.";
        }
        return "The enumeration is INCOMPLETE (" + reason.orElse("no reason recorded") + "): the classes below are those "
                + "found before it stopped, and there may be others.";
    }

    private static String input(Json.Obj input) {
        String size = "rank " + input.requireLong("rank") + " on " + input.requireLong("elements") + " elements";
        if (input.has("construction")) {
            Json.Obj c = input.requireObject("construction");
            return size + ", the " + c.requireLong("cube") + "-cube over " + c.requireString("field") + " with H = {"
                    + String.join(", ", strings(c.requireArray("hyperplane"))) + "} pulled at " + c.requireString("pulled")
                    + (c.requireBoolean("contractPulled") ? ", the pulled vertex contracted" : "");
        }
        return size + (input.has("sha256") ? ", a given matroid (SHA-256 " + input.requireString("sha256").substring(0, 16)
                + "...)" : "");
    }

    private static Optional<Path> certificate(Path dir, Json.Obj c) {
        return c.find("certificate").filter(j -> j instanceof Json.Str).map(j -> dir.resolve(j.asString("a file name")));
    }

    private static List<Json.Obj> classes(Path dir) {
        return read(dir, r -> r.requireArray("classes").elements().stream().map(c -> c.asObject("a class")).toList());
    }

    private static List<String> strings(Json.Arr array) {
        return array.elements().stream().map(j -> j instanceof Json.Num n ? n.text() : j.asString("a label")).toList();
    }

    private static Document.Inline text(String s) {
        return new Document.Text(s);
    }

    /** {@code what} applied to the record, a malformed record named as such. */
    private static <T> T read(Path dir, Function<Json.Obj, T> what) {
        Json.Obj record = RunFiles.object(dir.resolve(RECORD), "an enumeration summary");
        try {
            if (!record.requireString("format").equals(FORMAT)) {
                throw new IllegalArgumentException("format is \"" + record.requireString("format") + "\", expected \""
                        + FORMAT + "\"");
            }
            return what.apply(record);
        } catch (IllegalArgumentException e) {
            throw new ReportException(dir.resolve(RECORD) + ": cannot be read as an enumeration: " + e.getMessage(), e);
        }
    }
}
