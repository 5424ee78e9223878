package org.chirocore.cli;

import java.io.PrintWriter;

import org.chirocore.search.Progress;

/**
 * Progress of a reduction on a terminal: one line, rewritten in place at most every 200 ms,
 * with the stage, the current minor's size and rank, the decisions so far and the elapsed time.
 * Only for interactive use; when output goes to a file or pipe the commands stay quiet.
 */
final class ConsoleProgress implements Progress {
    private static final long INTERVAL_NANOS = 200_000_000L;

    private final PrintWriter err;
    private final boolean enabled;
    private final long started = System.nanoTime();
    private long lastShown = Long.MIN_VALUE;
    private int width;

    private ConsoleProgress(PrintWriter err, boolean enabled) {
        this.err = err;
        this.enabled = enabled;
    }

    /** Progress on {@code err} when the JVM has a terminal; silent otherwise. */
    static ConsoleProgress ifInteractive(PrintWriter err) {
        return new ConsoleProgress(err, System.console() != null);
    }

    @Override
    public synchronized void report(String stage, int elements, int rank, int decisions) {
        if (!enabled) {
            return;
        }
        long now = System.nanoTime();
        if (lastShown != Long.MIN_VALUE && now - lastShown < INTERVAL_NANOS) {
            return;
        }
        lastShown = now;
        String line = String.format("%7.1f s  %s: %d elements, rank %d, %d decisions", (now - started) / 1e9, stage,
                elements, rank, decisions);
        // Pad to the previous line's width so a shorter line fully overwrites it.
        err.print("\r" + line + " ".repeat(Math.max(0, width - line.length())));
        err.flush();
        width = line.length();
    }

    /** Ends the progress line so that later output starts on a fresh line. */
    synchronized void finish() {
        if (width > 0) {
            err.println();
            err.flush();
        }
    }
}
