package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.io.IoMessages;
import org.chirocore.sweep.SweepException;
import org.chirocore.sweep.SweepMerge;
import org.chirocore.sweep.SweepResult;
import org.chirocore.sweep.SweepRun;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code chirocore sweep-merge}: joins the shard directories of one sweep, refusing missing, duplicated or inconsistent shards. */
@Command(name = "sweep-merge", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Join the output directories of the shards of one sweep (sweep --shard i/k) into DIR: the "
                + "certificates, re-verified, and one DIR/sweep.json and DIR/sweep.md.",
                "Refuses a missing or repeated shard, shards of another range, seed, strategy, shard count or "
                        + "rank-n core search (--rank-n-cores, --rank-n-time), "
                        + "differing counts, and a pair missing, repeated or outside its shard."})
final class SweepMergeCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "SHARD", description = "The shards' output directories.")
    private List<Path> shards;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The merged directory (created if missing).")
    private Path out;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        List<Path> inputs = new ArrayList<>();
        for (Path shard : shards) {
            inputs.add(shard.resolve(SweepRun.SWEEP_JSON));
        }
        output.checkDirectory(out, inputs, List.of(SweepRun.SWEEP_MD, SweepRun.SWEEP_JSON));
        SweepResult result;
        try {
            result = SweepMerge.merge(shards, out);
        } catch (SweepException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException("cannot merge into " + out + ": " + IoMessages.plain(e), e);
        }
        return SweepCommand.report(spec.commandLine().getOut(), result, out);
    }
}
