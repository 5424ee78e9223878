package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyExploration;
import org.chirocore.family.ShapeFollow;
import org.chirocore.family.FamilyPrediction;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.FamilyTable;
import org.chirocore.family.MemberResult;
import org.chirocore.family.Shard;
import org.chirocore.family.VertexRule;
import org.chirocore.io.IoMessages;
import org.chirocore.search.Strategy;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family}: runs a family definition (docs/families.md) over a range of n,
 * writing one verified certificate per n and the family table; members whose certificate is
 * already in the directory and verifies are not recomputed.
 */
@Command(name = "family", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Reduce, certify and verify every member n = A..B of a family of cube constructions, "
                + "writing DIR/n=K.cert.json and the family table DIR/table.md and DIR/table.json.",
                "A member whose certificate already exists in DIR and verifies is not recomputed."})
final class FamilyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", description = "The family definition (JSON, see docs/families.md).")
    private Path file;

    @Option(names = "--n", paramLabel = "A..B", required = true, description = "The cube dimensions to run, e.g. 3..8 or 5.")
    private String range;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The output directory (created if missing).")
    private Path out;

    @Option(names = "--threads", paramLabel = "T", defaultValue = "1",
            description = "How many members run at once (default: ${DEFAULT-VALUE}); the certificates do not depend on it.")
    private int threads;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "0",
            description = "Seed of every member's search (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--follow", paramLabel = "SHAPE",
            description = "With --explore: follow one core shape across n, e.g. elements=n+4,rank=3 (expressions in n); "
                    + "writes DIR/follow.md and DIR/follow.json.")
    private String follow;

    @Option(names = "--explore", paramLabel = "K",
            description = "Instead of one reduction per n, run K seeded reductions (seeds S, S+1, ...; strategies "
                    + "alternating contract-first, delete-first), group the cores up to isomorphism and certify one "
                    + "per class: DIR/n=K.core-J.cert.json, DIR/explore.md, DIR/explore.json.")
    private Integer explore;

    @Option(names = "--keep", paramLabel = "V1,V2,...", split = ",",
            description = "With --explore: accept only cores containing these vertices (0/1 labels or vertex rules "
                    + "without commas, e.g. \"all zeros\", \"weight 2\"); other cores are counted as filtered.")
    private List<String> keep = List.of();

    @Option(names = "--target-rank", paramLabel = "R",
            description = "With --explore: accept only cores of rank R; other cores are counted as filtered.")
    private Integer targetRank;

    @Option(names = "--predict", paramLabel = "PREDICTION",
            description = "Instead of searching, check the predicted core of each n given in PREDICTION (JSON, see "
                    + "docs/families.md): decide it non-orientable and minor-minimal, then certify and verify it "
                    + "as DIR/n=K.predicted.cert.json.")
    private Path predict;

    @Option(names = "--shard", paramLabel = "i/k",
            description = "Run only the n of A..B with n mod k = i (0 <= i < k); join the shards' directories with "
                    + "family-merge.")
    private String shard;

    @Option(names = "--progress", description = "Print progress lines on standard error even when it is not a "
            + "terminal (e.g. a batch job's log file).")
    private boolean progress;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        int[] bounds = bounds();
        OutputOptions.checkRunDirectory(out, Arrays.asList(file, predict));
        if (threads < 1) {
            throw new ParameterException(spec.commandLine(), "--threads must be at least 1, not " + threads + ".");
        }
        if (explore != null && predict != null) {
            throw new ParameterException(spec.commandLine(), "--explore and --predict exclude each other.");
        }
        if (threads != 1 && (explore != null || predict != null)) {
            throw new ParameterException(spec.commandLine(), "--threads applies to a family run; --explore and "
                    + "--predict run on one thread.");
        }
        if (shard != null && (explore != null || predict != null)) {
            throw new ParameterException(spec.commandLine(), "--shard splits a family run; it does not combine with "
                    + "--explore or --predict.");
        }
        if (follow != null && explore == null) {
            throw new ParameterException(spec.commandLine(), "--follow picks cores among those of --explore; "
                    + "give --explore K as well.");
        }
        if (explore != null) {
            return explore(bounds);
        }
        if (predict != null) {
            return predict(bounds);
        }
        if (!keep.isEmpty() || targetRank != null) {
            throw new ParameterException(spec.commandLine(), "--keep and --target-rank filter the cores of --explore; "
                    + "give --explore K as well.");
        }
        FamilyTable table;
        try {
            FamilyDefinition family = FamilyDefinition.read(file);
            FamilyRun.Settings settings = new FamilyRun.Settings(seed, Strategy.CONTRACT_FIRST, budget.budget(), threads);
            FamilyRun run = new FamilyRun(family, out, settings, console());
            output.checkReplacing(run.otherRun());
            table = run.run(bounds[0], bounds[1], shard());
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the family's files: " + IoMessages.plain(e), e);
        }
        // The member lines were printed by the console as each member completed.
        PrintWriter w = spec.commandLine().getOut();
        boolean unknown = table.rows().stream().anyMatch(row -> row.member() instanceof MemberResult.NoCore c
                && c.reason().startsWith("unknown"));
        w.println("wrote " + out.resolve(FamilyRun.TABLE_MD) + " and " + out.resolve(FamilyRun.TABLE_JSON));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    /** --explore: K reductions per n, classes up to isomorphism, one certificate per class. */
    private int explore(int[] bounds) {
        if (explore < 1) {
            throw new ParameterException(spec.commandLine(), "--explore must be at least 1, not " + explore + ".");
        }
        if (targetRank != null && targetRank < 1) {
            throw new ParameterException(spec.commandLine(), "--target-rank must be at least 1, not " + targetRank + ".");
        }
        List<VertexRule> rules = new ArrayList<>();
        for (String text : keep) {
            try {
                rules.add(VertexRule.parse(text.trim()));
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--keep: " + e.getMessage());
            }
        }
        FamilyExploration.Report report;
        Optional<ShapeFollow.Shape> shape;
        try {
            shape = follow == null ? Optional.empty() : Optional.of(ShapeFollow.Shape.parse(follow));
            FamilyDefinition family = FamilyDefinition.read(file);
            FamilyExploration.Settings settings = new FamilyExploration.Settings(seed, explore, budget.budget(), rules,
                    targetRank == null ? OptionalInt.empty() : OptionalInt.of(targetRank));
            report = new FamilyExploration(family, out, settings, console())
                    .run(bounds[0], bounds[1]);
            if (shape.isPresent()) {
                ShapeFollow.write(out, shape.get(), ShapeFollow.follow(report, shape.get()));
            }
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the exploration's files: " + IoMessages.plain(e), e);
        }
        PrintWriter w = spec.commandLine().getOut();
        for (FamilyExploration.Member m : report.members()) {
            w.println("n = " + m.n() + ": " + m.classes().size() + " class" + (m.classes().size() == 1 ? "" : "es")
                    + " of cores, " + m.rejected().size() + " of " + explore + " runs filtered or without a core");
            for (FamilyExploration.CoreClass c : m.classes()) {
                w.println("  " + Format.shape(c.core().rank(), c.core().size(), c.core().basisCount()) + " x "
                        + c.attempts().size() + "; " + c.status()
                        + c.certificate().map(f -> "; " + out.resolve(f.getKey())).orElse(""));
            }
        }
        w.println("wrote " + out.resolve(FamilyExploration.EXPLORE_MD) + " and "
                + out.resolve(FamilyExploration.EXPLORE_JSON)
                + shape.map(x -> ", " + out.resolve(ShapeFollow.FOLLOW_MD) + " and " + out.resolve(ShapeFollow.FOLLOW_JSON))
                        .orElse(""));
        boolean unknown = report.members().stream().anyMatch(m -> m.classes().stream()
                .anyMatch(c -> c.certificate().isEmpty()) || m.rejected().stream()
                .anyMatch(r -> r.reason().startsWith("unknown")));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    /** --predict: checks the predicted cores, certifying the confirmed ones. */
    private int predict(int[] bounds) {
        List<FamilyPrediction.Outcome> outcomes;
        try {
            FamilyDefinition family = FamilyDefinition.read(file);
            FamilyPrediction.Prediction prediction = FamilyPrediction.Prediction.read(predict);
            outcomes = new FamilyPrediction(family, prediction, out, budget.budget()).run(bounds[0], bounds[1]);
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the prediction's certificates: " + IoMessages.plain(e), e);
        }
        PrintWriter w = spec.commandLine().getOut();
        int exit = ExitCodes.OK;
        for (FamilyPrediction.Outcome o : outcomes) {
            if (o instanceof FamilyPrediction.Confirmed c) {
                w.println("n = " + c.n() + ": prediction confirmed: core " + Format.shape(c.facts().core().rank(),
                        c.facts().core().size(), c.facts().core().basisCount()) + "; verified; "
                        + out.resolve(c.certificate()));
            } else if (o instanceof FamilyPrediction.Refuted r) {
                w.println("n = " + r.n() + ": prediction refuted: " + r.reason());
                exit = exit == ExitCodes.OK ? ExitCodes.CHECK_FAILED : exit;
            } else {
                w.println("n = " + o.n() + ": unknown: " + ((FamilyPrediction.Unknown) o).reason());
                exit = ExitCodes.UNKNOWN;
            }
        }
        return exit;
    }

    /** Member lines on standard output as they complete; progress on standard error. */
    private FamilyConsole console() {
        return FamilyConsole.of(spec.commandLine().getOut(), spec.commandLine().getErr(), progress, out);
    }

    /** The part of --n to run: --shard, or all of it. */
    private Shard shard() {
        try {
            return shard == null ? Shard.ALL : Shard.parse(shard);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--shard: " + e.getMessage());
        }
    }

    /** The bounds of --n: "A..B" or "A". */
    private int[] bounds() {
        String[] parts = range.trim().split("\\.\\.", -1);
        try {
            int a = Integer.parseInt(parts[0].trim());
            int b = parts.length == 2 ? Integer.parseInt(parts[1].trim()) : a;
            if (parts.length <= 2 && a <= b) {
                return new int[] {a, b};
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ParameterException(spec.commandLine(), "--n must be A..B with integers A <= B, or one integer; got \""
                + range + "\".");
    }
}
