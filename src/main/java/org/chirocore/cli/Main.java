package org.chirocore.cli;

import picocli.CommandLine;

/** Entry point of {@code java -jar chirocore.jar}: runs the {@link Chirocore} command and exits with its code. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(Chirocore.configure(new CommandLine(new Chirocore())).execute(args));
    }
}
