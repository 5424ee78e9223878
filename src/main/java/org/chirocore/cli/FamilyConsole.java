package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

import org.chirocore.family.FamilyExploration;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.MemberResult;

/**
 * The console of a family run or exploration. Each member's lines go to standard output, flushed, as soon as
 * the member is complete, so that a batch job stopped by its time limit still leaves every
 * finished member in its log. Progress goes to standard error, one line per stage of a member
 * ("  12.3 s  n = 5: certifying") so that members running on several threads do not overwrite
 * each other: on a terminal, or always with {@code --progress} (for a log file).
 */
final class FamilyConsole implements FamilyRun.Listener {
    private final PrintWriter out;
    private final PrintWriter err;
    private final boolean progress;
    private final Path dir;
    private final long started = System.nanoTime();

    private FamilyConsole(PrintWriter out, PrintWriter err, boolean progress, Path dir) {
        this.out = out;
        this.err = err;
        this.progress = progress;
        this.dir = dir;
    }

    /**
     * Member lines on {@code out}; progress on {@code err} when the JVM has a terminal or
     * {@code forceProgress} is set.
     *
     * @param dir the run's directory, to name the certificates in member lines
     */
    static FamilyConsole of(PrintWriter out, PrintWriter err, boolean forceProgress, Path dir) {
        return new FamilyConsole(out, err, forceProgress || System.console() != null, dir);
    }

    @Override
    public synchronized void stage(int n, String stage) {
        if (progress) {
            err.println(String.format("%7.1f s  n = %d: %s", (System.nanoTime() - started) / 1e9, n, stage));
            err.flush();
        }
    }

    @Override
    public synchronized void finished(MemberResult m) {
        if (m instanceof MemberResult.Certified c) {
            out.println("n = " + m.n() + ": core " + Format.core(c.facts().core()) + "; " + c.status() + (c.reused() ? " (reused)" : "") + "; "
                    + dir.resolve(c.certificate()));
        } else {
            out.println("n = " + m.n() + ": " + m.status());
        }
        out.flush();
    }

    @Override
    public synchronized void explored(FamilyExploration.MemberFindings m) {
        int runs = m.rejected().size() + m.classes().stream().mapToInt(c -> c.attempts().size()).sum();
        out.println("n = " + m.n() + ": " + m.classes().size() + " class" + (m.classes().size() == 1 ? "" : "es")
                + " of cores" + m.noneExists().map(x -> "; " + x.reason()).orElse(", " + m.rejected().size()
                        + " of " + runs + " runs without a core"));
        for (FamilyExploration.CoreClass c : m.classes()) {
            out.println("  " + Format.core(c.core()) + " x " + c.attempts().size() + "; " + c.status()
                    + c.certificate().map(f -> "; " + dir.resolve(f.file())).orElse(""));
        }
        out.flush();
    }
}
