package org.chirocore.cli;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** How many independent members (family members, sweep pairs) run at once; the files do not depend on it. */
final class ThreadsOption {
    /**
     * Most threads accepted: each runs its own SAT solver and may hold a large matroid, so far
     * more threads than cores only multiplies memory; 64 leaves room for any machine we target.
     */
    static final int MAX_THREADS = 64;

    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    @Option(names = "--threads", paramLabel = "T", defaultValue = "1",
            description = "How many members run at once, 1.." + MAX_THREADS + " (default: ${DEFAULT-VALUE}); "
                    + "the certificates do not depend on it.")
    private int threads;

    /** The number of threads, checked to be in 1..{@value #MAX_THREADS}. */
    int threads() {
        if (threads < 1 || threads > MAX_THREADS) {
            throw new ParameterException(mixee.commandLine(),
                    "--threads must be between 1 and " + MAX_THREADS + ", not " + threads + ".");
        }
        return threads;
    }
}
