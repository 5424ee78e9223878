package org.chirocore.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

import picocli.CommandLine;

/**
 * One run of the command line as {@link Main} does it, with standard output and error captured.
 *
 * @param exit the exit code
 * @param out what was printed on standard output
 * @param err what was printed on standard error
 */
record CliRun(int exit, String out, String err) {
    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Chirocore.configure(new CommandLine(new Chirocore()));
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int exit = cl.execute(args);
        return new CliRun(exit, out.toString(), err.toString());
    }
}
