package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.search.CoreConstraints;

/**
 * Follows one core shape across n through an exploration: for each n, the class of cores whose
 * number of elements and rank are the shape's expressions in n (the most frequent one when
 * several match), and whether it is isomorphic to the chosen core of the previous n. This is how
 * a person picks one candidate family (e.g. "n + 4 elements of rank 3") out of the several
 * minimal cores each n has. Each n is {@link Status#FOUND found}, {@link Status#ABSENT absent}
 * (proved: the shape's rank exceeds the member's or is below 3, or an unconstrained search
 * steered to the shape's rank answered "none exists") or {@link Status#UNKNOWN unknown}.
 */
public final class ShapeFollow {
    /** The table in Markdown, in the exploration's directory. */
    public static final String FOLLOW_MD = "follow.md";
    /** The table in JSON. */
    public static final String FOLLOW_JSON = "follow.json";

    private ShapeFollow() {
    }

    /**
     * A core shape: its number of elements and its rank as integer expressions in n.
     *
     * @param text the shape as written, e.g. {@code elements=n+4,rank=3}
     * @param rankText the rank's expression as written, e.g. {@code 3}
     */
    public record Shape(String text, Expression elements, Expression rank, String rankText) {
        /**
         * Parses {@code elements=E,rank=R}, in either order.
         *
         * @throws FamilyException naming the part that is not of that form
         */
        public static Shape parse(String text) {
            Expression elements = null;
            Expression rank = null;
            String rankText = null;
            for (String part : text.split(",")) {
                String[] kv = part.split("=", 2);
                String key = kv[0].trim();
                if (kv.length != 2 || !(key.equals("elements") || key.equals("rank"))) {
                    throw new FamilyException("The shape \"" + text + "\" must read elements=EXPR,rank=EXPR; \""
                            + part.trim() + "\" is not of that form.");
                }
                Expression e;
                try {
                    e = Expression.parse(kv[1].trim(), Set.of('n'));
                } catch (IllegalArgumentException bad) {
                    throw new FamilyException("The shape \"" + text + "\": " + key + ": " + bad.getMessage(), bad);
                }
                if (key.equals("elements")) {
                    elements = e;
                } else {
                    rank = e;
                    rankText = kv[1].trim();
                }
            }
            if (elements == null || rank == null) {
                throw new FamilyException("The shape \"" + text + "\" must give both elements and rank.");
            }
            return new Shape(text, elements, rank, rankText);
        }

        /** Whether {@code core} has this shape at n. */
        boolean fits(ExplicitMatroid core, int n) {
            return core.size() == elements.value(n, 0) && core.rank() == rank.value(n, 0);
        }
    }

    /** Whether a core of the shape exists at one n, as far as the exploration knows. */
    public enum Status {
        /** A verified run found a core of the shape. */
        FOUND("found"),
        /** No core of the shape exists: proved, see {@link ShapeFollow}. */
        ABSENT("none exists"),
        /** No run found one, and nothing proves there is none. */
        UNKNOWN("unknown");

        private final String text;

        Status(String text) {
            this.text = text;
        }

        /** The status as the table states it. */
        public String text() {
            return text;
        }
    }

    /**
     * One n of the followed shape.
     *
     * @param n the cube dimension
     * @param status found, absent or unknown
     * @param chosen the chosen class, empty when no core of the shape arose
     * @param frequency how many runs gave that class
     * @param runs how many runs were made at n
     * @param isomorphicToPrevious whether the chosen core is isomorphic to the previous n's chosen
     *     core (empty when either is missing)
     */
    public record Row(int n, Status status, Optional<FamilyExploration.CoreClass> chosen, int frequency, int runs,
            Optional<Boolean> isomorphicToPrevious) {
    }

    /** The followed shape over the exploration's members, in increasing n. */
    public static List<Row> follow(FamilyExploration.Findings report, Shape shape) {
        List<Row> rows = new ArrayList<>();
        Optional<ExplicitMatroid> previous = Optional.empty();
        for (FamilyExploration.MemberFindings m : report.members()) {
            Optional<FamilyExploration.CoreClass> chosen = Optional.empty();
            for (FamilyExploration.CoreClass c : m.classes()) {
                if (shape.fits(c.core(), m.n())
                        && (chosen.isEmpty() || c.attempts().size() > chosen.get().attempts().size())) {
                    chosen = Optional.of(c);
                }
            }
            Optional<ExplicitMatroid> core = chosen.map(FamilyExploration.CoreClass::core);
            Optional<Boolean> iso = previous.isPresent() && core.isPresent()
                    ? Optional.of(new HyperplaneIsomorphismInspector(previous.get(), core.get()).find().isPresent())
                    : Optional.empty();
            rows.add(new Row(m.n(), chosen.isPresent() ? Status.FOUND
                    : absent(report.settings(), m, shape) ? Status.ABSENT : Status.UNKNOWN, chosen, chosen.map(c -> c.attempts().size()).orElse(0),
                    report.settings().runs(), iso));
            previous = core;
        }
        return rows;
    }

    /**
     * Whether no core of the shape exists at m's n: its rank is out of reach, or the runs were
     * steered to exactly its rank, with nothing kept or avoided, and proved that none exists.
     */
    private static boolean absent(FamilyExploration.Settings settings, FamilyExploration.MemberFindings m, Shape shape) {
        long rank = shape.rank().value(m.n(), 0);
        if (rank > m.rank() || rank < CoreConstraints.SMALLEST_CORE_RANK) {
            return true;
        }
        return m.noneExists().isPresent() && settings.keep().isEmpty() && settings.avoid().isEmpty()
                && settings.rank(m.n()).equals(OptionalInt.of((int) rank));
    }

    /** Writes {@link #FOLLOW_MD} and {@link #FOLLOW_JSON} into {@code dir}, atomically. */
    public static void write(Path dir, Shape shape, List<Row> rows) throws IOException {
        StringBuilder md = new StringBuilder("# Following the core shape " + shape.text() + "\n\n"
                + "| n | status | core | frequency | certificate | ≅ chosen core of n − 1 |\n|---|---|---|---|---|---|\n");
        List<Json> json = new ArrayList<>();
        for (Row r : rows) {
            String core = r.chosen().map(c -> "rank " + c.core().rank() + " on " + c.core().size() + " elements, "
                    + c.core().basisCount() + " bases").orElse(r.status() == Status.ABSENT ? "none of this shape exists"
                            : "no core of this shape among " + r.runs() + " runs");
            String certificate = r.chosen().flatMap(FamilyExploration.CoreClass::certificate).map(FamilyExploration.ClassCertificate.Verified::file)
                    .orElse("–");
            String iso = r.isomorphicToPrevious().map(b -> b ? "yes" : "no").orElse("–");
            md.append("| ").append(r.n()).append(" | ").append(r.status().text()).append(" | ").append(core).append(" | ").append(r.frequency()).append(" of ")
                    .append(r.runs()).append(" | ").append(certificate).append(" | ").append(iso).append(" |\n");
            Json.Obj.Builder row = Json.Obj.builder().put("n", r.n()).put("status", r.status().text())
                    .put("found", r.chosen().isPresent())
                    .put("frequency", r.frequency()).put("runs", r.runs()).put("certificate", certificate)
                    .put("isomorphicToPrevious", iso);
            r.chosen().ifPresent(c -> row.put("elements", c.core().size()).put("rank", c.core().rank())
                    .put("bases", c.core().basisCount()));
            json.add(row.build());
        }
        AtomicFiles.writeString(dir.resolve(FOLLOW_MD), md.toString());
        AtomicFiles.writeJson(dir.resolve(FOLLOW_JSON), Json.Obj.builder().put("shape", shape.text())
                .put("rows", new Json.Arr(json)).build());
    }
}
