package org.chirocore.cli;

import org.chirocore.orient.Budget;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The budget options shared by every command that decides orientability. */
final class BudgetOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    @Option(names = "--conflicts", paramLabel = "N", defaultValue = "0",
            description = "Conflicts allowed per SAT solver call; 0 (default) for no limit.")
    private int conflicts;

    @Option(names = "--time-limit", paramLabel = "SECONDS", defaultValue = "0",
            description = "Wall-clock limit of each orientability decision, in seconds; 0 (default) for no limit.")
    private double timeLimit;

    /**
     * The budget the options describe.
     *
     * @throws ParameterException when a limit is negative
     */
    Budget budget() {
        if (conflicts < 0 || timeLimit < 0 || Double.isNaN(timeLimit)) {
            throw new ParameterException(mixee.commandLine(), "--conflicts and --time-limit must not be negative; got "
                    + conflicts + " and " + timeLimit + ".");
        }
        return new Budget(conflicts, 0, Math.round(timeLimit * 1000));
    }
}
