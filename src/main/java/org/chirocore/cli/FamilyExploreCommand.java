package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyExploration;
import org.chirocore.family.ShapeFollow;
import org.chirocore.family.VertexRule;
import org.chirocore.io.IoMessages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family explore}: K seeded reductions per n, the cores grouped up to
 * isomorphism, one verified certificate per class.
 */
@Command(name = "explore", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Run K seeded reductions per n = A..B (seeds S, S+1, ...; strategies alternating contract-first, "
                + "delete-first), group the cores up to isomorphism and certify one per class: DIR/n=K.core-J.cert.json, "
                + "DIR/explore.md, DIR/explore.json.")
final class FamilyExploreCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private FamilyOptions family;

    @Mixin
    private SeedOption seed;

    @Mixin
    private BudgetOptions budget;

    @Option(names = "--runs", paramLabel = "K", required = true, description = "The number of reductions per n.")
    private int runs;

    @Option(names = "--keep", paramLabel = "V1,V2,...", split = ",",
            description = "Accept only cores containing these vertices (0/1 labels or vertex rules without commas, "
                    + "e.g. \"all zeros\", \"weight 2\"); other cores are counted as filtered.")
    private List<String> keep = List.of();

    @Option(names = "--target-rank", paramLabel = "R",
            description = "Accept only cores of rank R; other cores are counted as filtered.")
    private Integer targetRank;

    @Option(names = "--follow", paramLabel = "SHAPE",
            description = "Follow one core shape across n, e.g. elements=n+4,rank=3 (expressions in n); writes "
                    + "DIR/follow.md and DIR/follow.json.")
    private String follow;

    @Override
    public Integer call() {
        int[] bounds = family.bounds();
        Path out = family.out();
        family.checkOut();
        if (runs < 1) {
            throw new ParameterException(spec.commandLine(), "--runs must be at least 1, not " + runs + ".");
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
        FamilyExploration.Findings report;
        Optional<ShapeFollow.Shape> shape;
        try {
            shape = follow == null ? Optional.empty() : Optional.of(ShapeFollow.Shape.parse(follow));
            FamilyExploration.Settings settings = new FamilyExploration.Settings(seed.seed(), runs, budget.budget(),
                    rules, targetRank == null ? OptionalInt.empty() : OptionalInt.of(targetRank));
            report = new FamilyExploration(family.definition(), out, settings, family.console())
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
        for (FamilyExploration.MemberFindings m : report.members()) {
            w.println("n = " + m.n() + ": " + m.classes().size() + " class" + (m.classes().size() == 1 ? "" : "es")
                    + " of cores, " + m.rejected().size() + " of " + runs + " runs filtered or without a core");
            for (FamilyExploration.CoreClass c : m.classes()) {
                w.println("  " + Format.core(c.core()) + " x "
                        + c.attempts().size() + "; " + c.status()
                        + c.certificate().map(f -> "; " + out.resolve(f.file())).orElse(""));
            }
        }
        w.println("wrote " + out.resolve(FamilyExploration.EXPLORE_MD) + " and "
                + out.resolve(FamilyExploration.EXPLORE_JSON)
                + shape.map(x -> ", " + out.resolve(ShapeFollow.FOLLOW_MD) + " and " + out.resolve(ShapeFollow.FOLLOW_JSON))
                        .orElse(""));
        boolean unknown = report.members().stream().anyMatch(m -> m.classes().stream()
                .anyMatch(c -> c.certification() instanceof FamilyExploration.ClassCertificate.Unknown) || m.rejected().stream()
                .anyMatch(r -> r instanceof FamilyExploration.Rejected.Unknown));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }
}
