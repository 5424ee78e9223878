package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.family.Shard;
import org.chirocore.io.IoMessages;
import org.chirocore.search.Strategy;
import org.chirocore.sweep.HyperplaneOrbits;
import org.chirocore.sweep.PairResult;
import org.chirocore.sweep.RankCore;
import org.chirocore.sweep.RankCoreSearch;
import org.chirocore.sweep.SweepLevel;
import org.chirocore.sweep.SweepResult;
import org.chirocore.sweep.SweepRun;
import org.chirocore.sweep.Verdict;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore sweep}: decides every general-position pull of the real n-cube up to symmetry
 * for a range of n, writing verified certificates, DIR/sweep.json and DIR/sweep.md.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Decide every general-position pull of the real n-cube, n = A..B, up to the cube's symmetry: "
                + "for each hyperplane orbit H and each vertex O off H in general position, the pulled cube and the "
                + "pulled cube with O contracted, each with a verified certificate (DIR/n=K/...). Writes "
                + "DIR/sweep.json and DIR/sweep.md.",
                "Resumable: a pair whose certificates are in DIR and verify is not recomputed, whatever their witness "
                        + "and relation forms. Progress lines go to standard error. An orientable pull is written as a "
                        + "witness and announced loudly."})
final class SweepCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--n", paramLabel = "A..B", required = true, description = "The cube dimensions, e.g. 3..6 or 5.")
    private String range;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The output directory (created if missing).")
    private Path out;

    @Mixin
    private ThreadsOption threads;

    @Mixin
    private SeedOption seed;

    @Option(names = "--shard", paramLabel = "i/k", defaultValue = "0/1",
            description = "Decide only the pairs whose index is i mod k (0 <= i < k); join the shards with sweep-merge.")
    private String shard;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private ProofFormOptions proofForms;

    @Option(names = "--rank-n-cores",
            description = "Also search, for every pair, a core of rank n of the pulled cube with O contracted (deletions "
                    + "only, the search of reduce --rank n), certify it (DIR/n=K/ID.rank-n.cert.json) and record it, or "
                    + "that none exists, or unknown when --rank-n-time ran out. Never changes a verdict.")
    private boolean rankNCores;

    @Option(names = "--rank-n-time", paramLabel = "SECONDS", defaultValue = "120",
            description = "With --rank-n-cores: wall-clock limit of the search for one pair (default: ${DEFAULT-VALUE}); "
                    + "0 for none. Recorded in sweep.json; sweep-merge refuses shards run with another.")
    private double rankNTime;

    @Override
    public Integer call() {
        int[] bounds = Converters.range(spec, "--n", range);
        int threadCount = threads.threads();
        Shard part;
        try {
            part = Shard.parse(shard);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--shard: " + e.getMessage());
        }
        if (bounds[0] < SweepRun.MIN_DIMENSION || bounds[1] > HyperplaneOrbits.MAX_DIMENSION) {
            throw new ParameterException(spec.commandLine(), "--n must lie within " + SweepRun.MIN_DIMENSION + ".."
                    + HyperplaneOrbits.MAX_DIMENSION + "; got \"" + range + "\".");
        }
        if (rankNTime < 0 || Double.isNaN(rankNTime) || Double.isInfinite(rankNTime)) {
            throw new ParameterException(spec.commandLine(), "--rank-n-time must be a number of seconds, 0 or more; got "
                    + rankNTime + ".");
        }
        if (!rankNCores && spec.commandLine().getParseResult().hasMatchedOption("--rank-n-time")) {
            throw new ParameterException(spec.commandLine(), "--rank-n-time applies only with --rank-n-cores.");
        }
        Optional<RankCoreSearch> rankCores = rankNCores
                ? Optional.of(new RankCoreSearch(Math.round(rankNTime * 1000))) : Optional.empty();
        OutputOptions.checkRunDirectory(out, List.of());
        PrintWriter err = spec.commandLine().getErr();
        long started = System.nanoTime();
        SweepRun.Listener progress = line -> {
            synchronized (err) {
                // whole lines, flushed at once: readable on a terminal and in a log file alike
                err.println(String.format("%8.1f s  %s", (System.nanoTime() - started) / 1e9, line));
                err.flush();
            }
        };
        SweepResult result;
        try {
            result = new SweepRun(out, new SweepRun.Settings(seed.seed(), Strategy.CONTRACT_FIRST, budget.budget(), threadCount,
                    part, rankCores, proofForms.forms()), progress).run(bounds[0], bounds[1]);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the sweep's files: " + IoMessages.plain(e), e);
        }
        return report(spec.commandLine().getOut(), result, out);
    }

    /** Prints the summary and returns the exit code: UNKNOWN when some verdict is missing. */
    static int report(PrintWriter w, SweepResult result, Path out) {
        boolean unknown = false;
        for (SweepLevel l : result.levels()) {
            long nonOrientable = 0;
            for (PairResult p : l.pairs()) {
                unknown |= p.pulledVerdict() instanceof Verdict.Unknown || p.contractedVerdict() instanceof Verdict.Unknown;
                nonOrientable += p.pulledVerdict() instanceof Verdict.NonOrientable
                        && p.contractedVerdict() instanceof Verdict.NonOrientable ? 1 : 0;
            }
            w.println("n = " + l.n() + ": " + l.orbits() + " hyperplane orbits, " + l.hyperplanes() + " hyperplanes, "
                    + l.generalPositionPairs() + " general-position pairs up to symmetry; " + l.pairs().size()
                    + " decided here, " + nonOrientable + " with both matroids non-orientable (certified and verified)");
            result.rankCores().ifPresent(r -> w.println("n = " + l.n() + ": cores of rank " + l.n() + ": "
                    + count(l, RankCore.Found.class) + " found (certified and verified), "
                    + count(l, RankCore.NoneExists.class) + " none exists, " + count(l, RankCore.Unknown.class)
                    + " unknown (limit: " + r.describe() + ")"));
        }
        for (PairResult p : result.discoveries()) {
            w.println("!!! ORIENTABLE PULL: " + p.id() + " (pulled " + p.pulledVerdict().text() + ", contracted "
                    + p.contractedVerdict().text() + ") !!!");
        }
        // an unknown rank-n core is no unknown verdict: the exit code speaks of the verdicts only
        w.println("wrote " + out.resolve(SweepRun.SWEEP_MD) + " and " + out.resolve(SweepRun.SWEEP_JSON));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    private static long count(SweepLevel l, Class<? extends RankCore> kind) {
        return l.pairs().stream().filter(p -> p.rankCore().filter(kind::isInstance).isPresent()).count();
    }
}
