package org.chirocore.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.chirocore.io.Json;

/**
 * A sweep over the general-position pulls of the real cube (docs/sweep.md): per n, every pair
 * (H, O) up to symmetry with the verdicts on the pulled cube and on it with O contracted. The
 * core is the same for both certificates of a pair, so the report describes the contracted one.
 */
final class SweepRunKind implements RunKind {
    static final String RECORD = "sweep.json";

    @Override
    public String name() {
        return "sweep";
    }

    @Override
    public boolean recognises(Path dir) {
        return Files.isRegularFile(dir.resolve(RECORD));
    }

    @Override
    public String title(Path dir) {
        Json.Obj r = record(dir);
        return "Sweep of the general-position pulls of the real n-cube, n = " + r.requireLong("from") + ".."
                + r.requireLong("to");
    }

    @Override
    public List<Member> certificates(Path dir) {
        List<Member> out = new ArrayList<>();
        for (Json.Obj p : pairs(record(dir))) {
            String pair = "n = " + p.requireLong("n") + ", pair " + p.requireLong("index");
            if (p.requireObject("contracted").has("certificate")) {
                out.add(new Member(pair, file(dir, p)));
            }
            rankCoreFile(dir, p).ifPresent(f -> out.add(new Member(pair + ", core of rank " + p.requireLong("n"), f)));
        }
        return out;
    }

    @Override
    public List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf) {
        Json.Obj r = record(dir);
        try {
            boolean rankN = r.has("rankNCores");
            List<List<Document.Inline>> rows = new ArrayList<>();
            List<List<Document.Inline>> rankRows = new ArrayList<>();
            for (Json.Obj p : pairs(r)) {
                Json.Obj core = p.requireObject("core");
                List<Document.Inline> row = new ArrayList<>(List.of(text(Long.toString(p.requireLong("n"))),
                        text(Long.toString(p.requireLong("index"))),
                        new Document.Mono(p.requireString("pulled")), text(Long.toString(p.requireLong("orbitSize"))),
                        text(p.requireObject("pulledMatroid").requireString("verdict")),
                        text(p.requireObject("contracted").requireString("verdict")),
                        text(core.requireLong("elements") + ", " + core.requireLong("rank")),
                        p.requireObject("contracted").has("certificate") ? classOf.apply(file(dir, p)) : text("-")));
                rows.add(row);
                rankRows.add(List.of(text(Long.toString(p.requireLong("n"))), text(Long.toString(p.requireLong("index"))),
                        text(rankCore(p)), rankCoreFile(dir, p).map(f -> classOf.apply(f)).orElse(text("-"))));
            }
            List<String> header = List.of("n", "#", "O", "orbit", "pulled cube", "O contracted", "core k, r", "class");
            List<Document.Block> out = new ArrayList<>(List.of(Document.Paragraph.of("Every general-position pair (H, O) of the real n-cube up to its "
                            + "symmetries (seed " + r.requireLong("seed") + ", strategy " + r.requireString("strategy")
                            + "); orientable pulls found: " + r.requireArray("orientablePulls").size() + "."),
                    new Document.Heading("Pairs"),
                    new Document.Table(header, rows),
                    Document.Paragraph.of("Orbit: the pairs in the orbit of (H, O) under the cube's symmetries; core k, r: "
                            + "the core's elements and rank; class: its isomorphism class when the catalogue names it.")));
            if (rankN) {
                // a table of its own: beside the verdicts the rows would not fit a printed page
                long limit = r.requireObject("rankNCores").requireLong("timeLimitMillis");
                out.add(new Document.Heading("Cores of rank n"));
                out.add(new Document.Table(List.of("n", "#", "rank-n core", "its class"), rankRows));
                out.add(Document.Paragraph.of("Rank-n core: a minor-minimal non-orientable minor of M'/O by deletions only, searched "
                        + (limit == 0 ? "without a time limit" : "within " + seconds(limit) + " per pair")
                        + " (elements, rank, bases; \"unknown\" is no verdict, only a budget that ran out)."));
            }
            out.add(Document.Paragraph.of("A referee re-checks the certificates with:"));
            out.add(RunFiles.verifyCommand(dir, "n=*/*.cert.json"));
            return out;
        } catch (IllegalArgumentException e) {
            throw new ReportException(dir.resolve(RECORD) + ": cannot be read as a sweep: " + e.getMessage(), e);
        }
    }

    private static Document.Inline text(String s) {
        return new Document.Text(s);
    }

    /** A pair's rank-n core outcome in a few words: elements, rank, bases; none exists; unknown. */
    private static String rankCore(Json.Obj pair) {
        if (!pair.has("rankNCore")) {
            return "not searched";
        }
        Json.Obj c = pair.requireObject("rankNCore");
        String status = c.requireString("status");
        if (status.equals("found")) {
            return c.requireLong("elements") + ", " + c.requireLong("rank") + ", " + c.requireLong("bases") + " bases";
        }
        if (status.equals("unknown")) {
            long limit = c.requireLong("timeLimitMillis");
            return "unknown (" + (limit == 0 ? "no time limit" : "limit " + seconds(limit)) + ")";
        }
        return status;
    }

    private static String seconds(long millis) {
        return (millis % 1000 == 0 ? Long.toString(millis / 1000) : Double.toString(millis / 1000.0)) + " s";
    }

    private static Optional<Path> rankCoreFile(Path dir, Json.Obj pair) {
        if (!pair.has("rankNCore") || !pair.requireObject("rankNCore").has("certificate")) {
            return Optional.empty();
        }
        return Optional.of(dir.resolve("n=" + pair.requireLong("n"))
                .resolve(pair.requireObject("rankNCore").requireString("certificate")));
    }

    private static Path file(Path dir, Json.Obj pair) {
        return dir.resolve("n=" + pair.requireLong("n")).resolve(pair.requireObject("contracted").requireString("certificate"));
    }

    private static Json.Obj record(Path dir) {
        return RunFiles.object(dir.resolve(RECORD), "a sweep");
    }

    private static List<Json.Obj> pairs(Json.Obj record) {
        try {
            List<Json.Obj> out = new ArrayList<>();
            for (Json level : record.requireArray("levels").elements()) {
                for (Json p : level.asObject("a level").requireArray("pairs").elements()) {
                    out.add(p.asObject("a pair"));
                }
            }
            return out;
        } catch (IllegalArgumentException e) {
            throw new ReportException("a sweep: " + e.getMessage(), e);
        }
    }
}
