package org.chirocore.sweep;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.chirocore.io.AtomicFiles;
import org.chirocore.matroid.CubeHyperplane;

/**
 * Writes a sweep's {@code sweep.json} (its {@link SweepResult#toJson}) and {@code sweep.md}: a
 * summary per n (orbits, hyperplanes, pairs, general-position pairs) and one row per decided
 * pair (H's equation and vertices, O, the pair's orbit size, both verdicts, the core, the core of
 * rank n when the run searched one, and the certificate files). An orientable pull is announced at the top of the Markdown file.
 */
public final class SweepReport {
    private SweepReport() {
    }

    /** Writes both files into {@code dir}, each atomically. */
    public static void write(Path dir, SweepResult result) throws IOException {
        AtomicFiles.writeJson(dir.resolve(SweepRun.SWEEP_JSON), result.toJson());
        AtomicFiles.writeString(dir.resolve(SweepRun.SWEEP_MD), markdown(result));
    }

    /** The Markdown text of {@code result}. */
    public static String markdown(SweepResult result) {
        StringBuilder s = new StringBuilder();
        s.append("# Sweep of general-position pulls of the real n-cube, n = ").append(result.from()).append("..")
                .append(result.to()).append("\n\n");
        List<PairResult> found = result.discoveries();
        if (!found.isEmpty()) {
            s.append("**!!! ORIENTABLE PULLS FOUND: ").append(found.stream().map(PairResult::id)
                    .collect(Collectors.joining(", "))).append(". No orientable pull of an n-cube with n >= 3 was "
                    + "known (at n = 2 every pull is orientable); check the witness files. !!!**\n\n");
        }
        s.append("Pairs (H, O) up to the symmetry group of the cube (order 2^n·n!): H a hyperplane spanned by "
                + "vertices, O a vertex off H in general position. Seed ").append(result.seed())
                .append(", strategy ").append(result.strategy());
        if (result.shard().count() > 1) {
            s.append(", shard ").append(result.shard().index()).append('/').append(result.shard().count())
                    .append(" (only this shard's pairs are listed)");
        }
        result.rankCores().ifPresent(r -> s.append(". A core of rank n of M'/O (deletions only) was searched for "
                + "every pair with ").append(r.describe()).append("; \"unknown\" there is no verdict, only a budget "
                + "that ran out"));
        s.append(".\n\n| n | hyperplane orbits | hyperplanes | pairs (H, O ∉ H) up to symmetry | in general position "
                + "up to symmetry | in general position |\n|---|---|---|---|---|---|\n");
        for (SweepLevel l : result.levels()) {
            s.append("| ").append(l.n()).append(" | ").append(l.orbits()).append(" | ").append(l.hyperplanes())
                    .append(" | ").append(l.candidates()).append(" | ").append(l.generalPositionPairs()).append(" | ")
                    .append(l.generalPositionPulls()).append(" |\n");
        }
        for (SweepLevel l : result.levels()) {
            s.append("\n## n = ").append(l.n()).append("\n\n");
            if (l.pairs().isEmpty()) {
                s.append("No pair decided here.\n");
                continue;
            }
            boolean rankN = result.rankCores().isPresent();
            s.append("| # | H | vertices of H | O | orbit size | pulled (").append(1 << l.n()).append(" elements, rank ")
                    .append(l.n() + 1).append(") | O contracted | core (elements, rank) | ")
                    .append(rankN ? "core of rank " + l.n() + " (elements, rank, bases) | " : "").append("files |\n")
                    .append(rankN ? "|---|---|---|---|---|---|---|---|---|---|\n" : "|---|---|---|---|---|---|---|---|---|\n");
            List<String> details = new ArrayList<>();
            for (PairResult p : l.pairs()) {
                s.append("| ").append(p.index()).append(" | ").append(equation(p)).append(" | ")
                        .append(String.join(" ", p.hyperplane())).append(" | ").append(p.pulled()).append(" | ")
                        .append(p.orbitSize()).append(" | ").append(verdict(p.pulledVerdict())).append(" | ")
                        .append(verdict(p.contractedVerdict())).append(" | ")
                        .append(p.core().map(c -> c.elements() + ", " + c.rank() + c.name().map(x -> " (" + x + ")")
                                .orElse("")).orElse("–"))
                        .append(" | ");
                if (rankN) {
                    s.append(p.rankCore().map(SweepReport::rankCore).orElse("not searched")).append(" | ");
                    p.rankCore().filter(r -> !(r instanceof RankCore.Found))
                            .ifPresent(r -> details.add("- #" + p.index() + ": " + r.text() + "\n"));
                }
                s.append(files(p)).append(" |\n");
            }
            if (!details.isEmpty()) {
                s.append("\nRank-n core searches without a core:\n\n");
                details.forEach(s::append);
            }
        }
        return s.toString();
    }

    private static String equation(PairResult p) {
        return CubeHyperplane.of(p.normal().stream().mapToInt(Integer::intValue).toArray(), p.offset()).equation();
    }

    private static String verdict(Verdict v) {
        return v instanceof Verdict.Orientable ? "**" + v.text() + "**" : v.text();
    }

    /** The short form of a rank-n core outcome for a table cell; the long reasons are listed below the table. */
    private static String rankCore(RankCore r) {
        if (r instanceof RankCore.Found f) {
            return f.elements() + ", " + f.rank() + ", " + f.bases() + f.name().map(x -> " (" + x + ")").orElse("");
        }
        if (r instanceof RankCore.Unknown u) {
            return "unknown (" + (u.millis() == 0 ? "no time limit" : RankCore.seconds(u.millis()) + " s") + ")";
        }
        return "none exists";
    }

    private static String files(PairResult p) {
        List<String> files = new ArrayList<>(List.of(p.pulledVerdict().file(), p.contractedVerdict().file()));
        if (p.rankCore().orElse(null) instanceof RankCore.Found f) {
            files.add(f.certificate());
        }
        return files.stream().filter(f -> !f.isEmpty()).map(f -> "`n=" + p.n() + "/" + f + "`")
                .collect(Collectors.joining(" "));
    }
}
