package org.chirocore.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The root command {@code chirocore}: only lists its subcommands. {@link #configure} installs
 * the error handling that gives the exit codes of {@link ExitCodes}; {@link Main} and the tests
 * both go through it.
 */
@Command(name = "chirocore", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Orientability of matroids and minor-minimal non-orientable minors of pulled affine cubes.",
        subcommands = {OrientCommand.class, ReduceCommand.class, VerifyCommand.class, ExportCommand.class,
                CubeCommand.class, BenchCommand.class, FamilyCommand.class, FamilyMergeCommand.class, SweepCommand.class,
                SweepMergeCommand.class,
                ExplainCommand.class, ReportCommand.class, EnumerateCommand.class,
                CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:a proved answer, or facts printed",
                "1:internal error (a bug; stack trace printed); for verify: a check failed",
                "2:bad usage or bad input (message on stderr)",
                "3:unknown: the budget ran out before an answer",
                "4:none exists: a constrained search (reduce --rank/--keep/--avoid) exhausted its space"})
public final class Chirocore implements Runnable {
    @Spec
    private CommandSpec spec;

    /**
     * Makes {@code commandLine} report bad usage and bad input as one line on its error stream
     * with {@link ExitCodes#BAD_INPUT}. Other exceptions are left to picocli, which prints them
     * with their stack trace and exits with {@link ExitCodes#INTERNAL_ERROR}.
     *
     * @return {@code commandLine}, for chaining
     */
    public static CommandLine configure(CommandLine commandLine) {
        return commandLine
                .setParameterExceptionHandler((ex, args) -> {
                    CommandLine cl = ex.getCommandLine();
                    cl.getErr().println("chirocore: " + ex.getMessage());
                    CommandLine.UnmatchedArgumentException.printSuggestions(ex, cl.getErr());
                    cl.getErr().println("Try '" + cl.getCommandSpec().qualifiedName() + " --help' for more information.");
                    return ExitCodes.BAD_INPUT;
                })
                .setExecutionExceptionHandler((ex, cl, parseResult) -> {
                    if (ex instanceof BadInputException) {
                        cl.getErr().println("chirocore: " + ex.getMessage());
                        return ExitCodes.BAD_INPUT;
                    }
                    throw ex;
                });
    }

    /** Without a subcommand there is nothing to do but explain the usage. */
    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(),
                "Missing command: use one of orient, reduce, verify, export, cube, bench, family, family-merge, explain, "
                        + "report, enumerate.");
    }
}
