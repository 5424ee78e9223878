package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
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
 * {@code chirocore family explore}: K seeded reductions per n (steered searches when a rank, kept
 * or avoided vertices are given), the cores grouped up to isomorphism, one verified certificate
 * per class.
 */
@Command(name = "explore", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Run K seeded reductions per n = A..B (seeds S, S+1, ...; strategies alternating contract-first, "
                + "delete-first), steered by --rank, --keep and --avoid when given, group the cores up to isomorphism "
                + "and certify one per class: DIR/n=K.core-J.cert.json, DIR/explore.md, DIR/explore.json.")
final class FamilyExploreCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private FamilyOptions family;

    @Mixin
    private SeedOption seed;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private ProofFormOptions proofForms;

    @Option(names = "--runs", paramLabel = "K", required = true, description = "The number of reductions per n.")
    private int runs;

    @Option(names = "--keep", paramLabel = "V1,V2,...", split = ",",
            description = "Steer: the core contains these vertices (0/1 labels or vertex rules without commas, "
                    + "e.g. \"all zeros\", \"weight 2\"); they are neither deleted nor contracted.")
    private List<String> keep = List.of();

    @Option(names = "--avoid", paramLabel = "V1,V2,...", split = ",",
            description = "Steer: these vertices (labels or vertex rules, as for --keep) are deleted.")
    private List<String> avoid = List.of();

    @Option(names = "--rank", paramLabel = "EXPR",
            description = "Steer: the core has rank EXPR, an expression in n (e.g. n, n-1, 4); exactly "
                    + "rank(M) - EXPR elements are contracted. With --follow and no --rank, the shape's rank steers.")
    private String rank;

    @Option(names = "--total-time", paramLabel = "SECONDS", defaultValue = "0",
            description = "Wall-clock limit of each steered run, after which it answers unknown; 0 (default) for none.")
    private double totalTime;

    @Option(names = "--follow", paramLabel = "SHAPE",
            description = "Follow one core shape across n, e.g. elements=2*n,rank=n (expressions in n): found, none "
                    + "exists or unknown at each n; writes DIR/follow.md and DIR/follow.json.")
    private String follow;

    @Override
    public Integer call() {
        int[] bounds = family.bounds();
        Path out = family.out();
        family.checkOut();
        if (runs < 1) {
            throw new ParameterException(spec.commandLine(), "--runs must be at least 1, not " + runs + ".");
        }
        if (totalTime < 0 || Double.isNaN(totalTime)) {
            throw new ParameterException(spec.commandLine(), "--total-time must not be negative; got " + totalTime + ".");
        }
        List<VertexRule> kept = rules("--keep", keep);
        List<VertexRule> avoided = rules("--avoid", avoid);
        FamilyExploration.Findings report;
        Optional<ShapeFollow.Shape> shape;
        List<ShapeFollow.Row> rows = List.of();
        try {
            shape = follow == null ? Optional.empty() : Optional.of(ShapeFollow.Shape.parse(follow));
            Optional<FamilyExploration.RankRule> steer = rank != null
                    ? Optional.of(FamilyExploration.RankRule.parse(rank))
                    : shape.map(s -> new FamilyExploration.RankRule(s.rankText(), s.rank()));
            FamilyExploration.Settings settings = new FamilyExploration.Settings(seed.seed(), runs, budget.budget(),
                    kept, avoided, steer, Math.round(totalTime * 1000), proofForms.forms());
            report = new FamilyExploration(family.definition(), out, settings, family.console())
                    .run(bounds[0], bounds[1]);
            if (shape.isPresent()) {
                rows = ShapeFollow.follow(report, shape.get());
                ShapeFollow.write(out, shape.get(), rows);
            }
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the exploration's files: " + IoMessages.plain(e), e);
        }
        PrintWriter w = spec.commandLine().getOut();
        w.println("wrote " + out.resolve(FamilyExploration.EXPLORE_MD) + " and "
                + out.resolve(FamilyExploration.EXPLORE_JSON)
                + shape.map(x -> ", " + out.resolve(ShapeFollow.FOLLOW_MD) + " and " + out.resolve(ShapeFollow.FOLLOW_JSON))
                        .orElse(""));
        for (ShapeFollow.Row r : rows) {
            w.println("shape " + shape.orElseThrow().text() + " at n = " + r.n() + ": " + r.status().text());
        }
        boolean unknown = report.members().stream().anyMatch(m -> m.classes().stream()
                .anyMatch(c -> c.certification() instanceof FamilyExploration.ClassCertificate.Unknown) || m.rejected().stream()
                .anyMatch(r -> r instanceof FamilyExploration.Rejected.Unknown));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    private List<VertexRule> rules(String option, List<String> texts) {
        List<VertexRule> rules = new ArrayList<>();
        for (String text : texts) {
            try {
                rules.add(VertexRule.parse(text.trim()));
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), option + ": " + e.getMessage());
            }
        }
        return rules;
    }
}
