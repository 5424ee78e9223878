package org.chirocore.sweep;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import org.chirocore.io.AtomicFiles;
import org.chirocore.matroid.CubeHyperplane;

/**
 * Writes a sweep's {@code sweep.json} (its {@link SweepResult#toJson}) and {@code sweep.md}: a
 * summary per n (orbits, hyperplanes, pairs, general-position pairs) and one row per decided
 * pair (H's equation and vertices, O, the pair's orbit size, both verdicts, the core and the
 * certificate files). An orientable pull is announced at the top of the Markdown file.
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
            s.append("| # | H | vertices of H | O | orbit size | pulled (").append(1 << l.n()).append(" elements, rank ")
                    .append(l.n() + 1).append(") | O contracted | core (elements, rank) | files |\n")
                    .append("|---|---|---|---|---|---|---|---|---|\n");
            for (PairResult p : l.pairs()) {
                s.append("| ").append(p.index()).append(" | ").append(equation(p)).append(" | ")
                        .append(String.join(" ", p.hyperplane())).append(" | ").append(p.pulled()).append(" | ")
                        .append(p.orbitSize()).append(" | ").append(verdict(p.pulledVerdict())).append(" | ")
                        .append(verdict(p.contractedVerdict())).append(" | ")
                        .append(p.core().map(c -> c.elements() + ", " + c.rank() + c.name().map(x -> " (" + x + ")")
                                .orElse("")).orElse("–"))
                        .append(" | ").append(files(p)).append(" |\n");
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

    private static String files(PairResult p) {
        return List.of(p.pulledVerdict().file(), p.contractedVerdict().file()).stream().filter(f -> !f.isEmpty())
                .map(f -> "`n=" + p.n() + "/" + f + "`").collect(Collectors.joining(" "));
    }
}
