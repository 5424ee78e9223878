package org.chirocore.cli;

import org.chirocore.matroid.Limits;
import org.chirocore.matroid.TooLargeException;

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
                "1:internal error (a bug; set " + Chirocore.STACKTRACE_VARIABLE + "=1 for its stack trace); for verify: a check failed",
                "2:bad usage, bad input, an input beyond the limits, or out of memory (message on stderr)",
                "3:unknown: the budget ran out before an answer",
                "4:verify: no check failed, but some part was not checked",
                "5:none exists: a constrained search (reduce --rank/--keep/--avoid) exhausted its space"})
public final class Chirocore implements Runnable {
    @Spec
    private CommandSpec spec;

    /** Set (to anything) to print the stack trace of an internal error as well. */
    static final String STACKTRACE_VARIABLE = "CHIROCORE_STACKTRACE";

    /**
     * Makes {@code commandLine} report bad usage, bad input, inputs beyond {@link Limits} and
     * memory exhaustion as plain lines on its error stream with {@link ExitCodes#BAD_INPUT}, and
     * any other exception as one line with {@link ExitCodes#INTERNAL_ERROR}; the stack trace of
     * an internal error is printed only when the environment variable {@value #STACKTRACE_VARIABLE}
     * is set.
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
                .setExecutionStrategy(parseResult -> {
                    try {
                        return new CommandLine.RunLast().execute(parseResult);
                    } catch (OutOfMemoryError e) {
                        // What held the memory is unreachable now, so there is room to say so.
                        commandLine.getErr().println("chirocore: out of memory while running '"
                                + String.join(" ", parseResult.originalArgs()) + "': the input is too large for the "
                                + (Runtime.getRuntime().maxMemory() >> 20) + " MB the Java heap may use; give Java more "
                                + "memory (java -Xmx8g -jar chirocore.jar ...) or make the input smaller.");
                        return ExitCodes.BAD_INPUT;
                    }
                })
                .setExecutionExceptionHandler((ex, cl, parseResult) -> {
                    if (ex instanceof BadInputException || ex instanceof TooLargeException) {
                        cl.getErr().println("chirocore: " + ex.getMessage());
                        return ExitCodes.BAD_INPUT;
                    }
                    cl.getErr().println("chirocore: internal error: "
                            + (ex.getMessage() == null ? "an unexpected failure" : ex.getMessage())
                            + " This is a bug; run again with the environment variable " + STACKTRACE_VARIABLE
                            + "=1 to see where it happened.");
                    if (System.getenv(STACKTRACE_VARIABLE) != null) {
                        ex.printStackTrace(cl.getErr());
                    }
                    return ExitCodes.INTERNAL_ERROR;
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
