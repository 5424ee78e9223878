package org.chirocore.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family}: the family commands (docs/families.md), one subcommand each:
 * {@code run} (one certified core per n and the family table), {@code explore} (several seeded
 * reductions per n, one certified core per isomorphism class) and {@code predict} (check and
 * certify predicted cores without searching). Every certificate goes through the certified
 * pipeline and is verified before it is reported.
 */
@Command(name = "family", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Reduce, explore or check predicted cores of a family of cube constructions, one member per n.",
        subcommands = {FamilyRunCommand.class, FamilyExploreCommand.class, FamilyPredictCommand.class})
final class FamilyCommand implements Runnable {
    @Spec
    private CommandSpec spec;

    /** Without a subcommand there is nothing to do but explain the usage. */
    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(),
                "Missing subcommand: use one of run, explore, predict (e.g. family run FILE --n 3..8 --out DIR).");
    }
}
