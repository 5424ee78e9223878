package org.chirocore.cli;

import java.io.PrintWriter;

import org.chirocore.family.FamilyRun;

/**
 * Progress of a family run on a terminal: one line per stage of a member ("  12.3 s  n = 5:
 * certifying"), so that members running on several threads do not overwrite each other. Silent
 * when the JVM has no terminal.
 */
final class FamilyConsole implements FamilyRun.Listener {
    private final PrintWriter err;
    private final long started = System.nanoTime();

    private FamilyConsole(PrintWriter err) {
        this.err = err;
    }

    /** Progress on {@code err} when the JVM has a terminal; silent otherwise. */
    static FamilyRun.Listener ifInteractive(PrintWriter err) {
        return System.console() != null ? new FamilyConsole(err) : FamilyRun.Listener.SILENT;
    }

    @Override
    public synchronized void stage(int n, String stage) {
        err.println(String.format("%7.1f s  n = %d: %s", (System.nanoTime() - started) / 1e9, n, stage));
        err.flush();
    }
}
