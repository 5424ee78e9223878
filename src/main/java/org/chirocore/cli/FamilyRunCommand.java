package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.FamilyTable;
import org.chirocore.family.MemberResult;
import org.chirocore.family.Shard;
import org.chirocore.io.IoMessages;
import org.chirocore.search.Strategy;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family run}: runs a family definition over a range of n, writing one verified
 * certificate per n and the family table; members whose certificate is already in the directory
 * and verifies are not recomputed.
 */
@Command(name = "run", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Reduce, certify and verify every member n = A..B of a family of cube constructions, "
                + "writing DIR/n=K.cert.json and the family table DIR/table.md and DIR/table.json.",
                "A member whose certificate already exists in DIR and verifies is not recomputed."})
final class FamilyRunCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private FamilyOptions family;

    @Mixin
    private SeedOption seed;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private OutputOptions output;

    @Mixin
    private ThreadsOption threads;

    @Mixin
    private ProofFormOptions proofForms;

    @Option(names = "--shard", paramLabel = "i/k",
            description = "Run only the n of A..B with n mod k = i (0 <= i < k); join the shards' directories with "
                    + "family-merge.")
    private String shard;

    @Override
    public Integer call() {
        int[] bounds = family.bounds();
        family.checkOut();
        int threadCount = threads.threads();
        FamilyTable table;
        try {
            FamilyRun.Settings settings = new FamilyRun.Settings(seed.seed(), Strategy.CONTRACT_FIRST, budget.budget(),
                    threadCount, proofForms.forms());
            FamilyRun run = new FamilyRun(family.definition(), family.out(), settings, family.console());
            output.checkReplacing(run.otherRun());
            table = run.run(bounds[0], bounds[1], shard());
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(family.out() + ": cannot write the family's files: " + IoMessages.plain(e), e);
        }
        // The member lines were printed by the console as each member completed.
        PrintWriter w = spec.commandLine().getOut();
        boolean unknown = table.rows().stream().anyMatch(row -> row.member() instanceof MemberResult.Unknown);
        w.println("wrote " + family.out().resolve(FamilyRun.TABLE_MD) + " and "
                + family.out().resolve(FamilyRun.TABLE_JSON));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    /** The part of --n to run: --shard, or all of it. */
    private Shard shard() {
        try {
            return shard == null ? Shard.ALL : Shard.parse(shard);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--shard: " + e.getMessage());
        }
    }
}
