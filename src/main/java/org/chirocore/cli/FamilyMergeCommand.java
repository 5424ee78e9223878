package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyMerge;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.FamilyTable;
import org.chirocore.io.IoMessages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family-merge}: joins the output directories of {@code family --shard i/k}
 * runs into one directory with one family table, refusing inconsistent shards.
 */
@Command(name = "family-merge", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Join the output directories of the shards of one family run (family --shard i/k) into DIR: "
                + "the certificates, re-verified, and one table DIR/table.md and DIR/table.json.",
                "Refuses shards of another family or definition, seed or strategy, and a set of shards with one "
                        + "missing or given twice."})
final class FamilyMergeCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "The family definition the shards ran.")
    private Path file;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "SHARD", description = "The shards' output directories.")
    private List<Path> shards;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The merged directory (created if missing).")
    private Path out;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        List<Path> inputs = new ArrayList<>(List.of(file));
        for (Path shard : shards) {
            inputs.add(shard.resolve(FamilyRun.TABLE_JSON));
        }
        output.checkDirectory(out, inputs, List.of(FamilyRun.TABLE_MD, FamilyRun.TABLE_JSON));
        FamilyTable table;
        try {
            table = FamilyMerge.merge(FamilyDefinition.read(file), shards, out);
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException("cannot merge into " + out + ": " + IoMessages.plain(e), e);
        }
        PrintWriter w = spec.commandLine().getOut();
        w.println("merged " + table.rows().size() + " members from " + shards.size() + " shards; wrote "
                + out.resolve(FamilyRun.TABLE_MD) + " and " + out.resolve(FamilyRun.TABLE_JSON));
        return ExitCodes.OK;
    }
}
