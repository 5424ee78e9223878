package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.FamilyTable;
import org.chirocore.family.MemberResult;
import org.chirocore.search.Strategy;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family}: runs a family definition (docs/families.md) over a range of n,
 * writing one verified certificate per n and the family table; members whose certificate is
 * already in the directory and verifies are not recomputed.
 */
@Command(name = "family", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Reduce, certify and verify every member n = A..B of a family of cube constructions, "
                + "writing DIR/n=K.cert.json and the family table DIR/table.md and DIR/table.json.",
                "A member whose certificate already exists in DIR and verifies is not recomputed."})
final class FamilyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", description = "The family definition (JSON, see docs/families.md).")
    private Path file;

    @Option(names = "--n", paramLabel = "A..B", required = true, description = "The cube dimensions to run, e.g. 3..8 or 5.")
    private String range;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The output directory (created if missing).")
    private Path out;

    @Option(names = "--threads", paramLabel = "T", defaultValue = "1",
            description = "How many members run at once (default: ${DEFAULT-VALUE}); the certificates do not depend on it.")
    private int threads;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "0",
            description = "Seed of every member's search (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Mixin
    private BudgetOptions budget;

    @Override
    public Integer call() {
        int[] bounds = bounds();
        if (threads < 1) {
            throw new ParameterException(spec.commandLine(), "--threads must be at least 1, not " + threads + ".");
        }
        FamilyTable table;
        try {
            FamilyDefinition family = FamilyDefinition.read(file);
            FamilyRun.Settings settings = new FamilyRun.Settings(seed, Strategy.CONTRACT_FIRST, budget.budget(), threads);
            table = new FamilyRun(family, out, settings, FamilyConsole.ifInteractive(spec.commandLine().getErr()))
                    .run(bounds[0], bounds[1]);
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the family's files: " + e, e);
        }
        PrintWriter w = spec.commandLine().getOut();
        boolean unknown = false;
        for (FamilyTable.Row row : table.rows()) {
            MemberResult m = row.member();
            if (m instanceof MemberResult.Certified c) {
                w.println("n = " + m.n() + ": core " + Format.shape(c.facts().core().rank(), c.facts().core().size(),
                        c.facts().core().basisCount()) + "; " + c.verification().text()
                        + (c.reused() ? " (reused)" : "") + "; " + out.resolve(c.certificate()));
            } else {
                String reason = ((MemberResult.NoCore) m).reason();
                unknown |= reason.startsWith("unknown");
                w.println("n = " + m.n() + ": " + reason);
            }
        }
        w.println("wrote " + out.resolve(FamilyRun.TABLE_MD) + " and " + out.resolve(FamilyRun.TABLE_JSON));
        return unknown ? ExitCodes.UNKNOWN : ExitCodes.OK;
    }

    /** The bounds of --n: "A..B" or "A". */
    private int[] bounds() {
        String[] parts = range.trim().split("\\.\\.", -1);
        try {
            int a = Integer.parseInt(parts[0].trim());
            int b = parts.length == 2 ? Integer.parseInt(parts[1].trim()) : a;
            if (parts.length <= 2 && a <= b) {
                return new int[] {a, b};
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ParameterException(spec.commandLine(), "--n must be A..B with integers A <= B, or one integer; got \""
                + range + "\".");
    }
}
