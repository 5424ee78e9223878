package org.chirocore.cli;

import picocli.CommandLine.Option;

/** The seed of the search's element order, shared by every command that reduces. */
final class SeedOption {
    @Option(names = "--seed", paramLabel = "S", defaultValue = "0",
            description = "Seed of the search's element order (default: ${DEFAULT-VALUE}); the same seed gives the "
                    + "same core.")
    private long seed;

    long seed() {
        return seed;
    }
}
