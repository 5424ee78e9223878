package org.chirocore.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;

import org.chirocore.matroid.Limits;
import org.chirocore.orient.Orientability;
import org.chirocore.search.Benchmark;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code chirocore bench}: times the corner construction for n = 3..N. */
@Command(name = "bench", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Time the corner construction for n = 3..N: H spanned by the unit vectors, the all-ones "
                + "vertex pulled to it and contracted, then decided (n <= " + Benchmark.MAX_DECIDED_DIMENSION
                + ") and reduced with seed 0, contract-first.",
                "With --orientable, times orientable instances instead; with --certificates, times the "
                        + "independent verifier on certificate files.",
                "Prints figures only; nothing is asserted."})
final class BenchCommand implements Callable<Integer> {
    private static final String ROW = "%2s %9s %5s %10s %10s %14s %10s %11s %10s%n";

    @Spec
    private CommandSpec spec;

    @Option(names = "--max-n", paramLabel = "N", defaultValue = "5",
            description = "Largest dimension to run, at most " + Limits.CUBE_DIMENSION + " (default: ${DEFAULT-VALUE}).")
    private int maxN;

    @Mixin
    private BudgetOptions budget;

    @Option(names = "--orientable",
            description = "Instead, time orientable instances: the real 4- and 5-cube as matrices over Q (determinant "
                    + "signs), the 5-cube by the SAT search alone (--time-limit, default "
                    + Benchmark.DEFAULT_SEARCH_MILLIS / 1000 + " s; unknown when it runs out) and the Vamos matroid.")
    private boolean orientable;

    @Option(names = "--certificates", arity = "1..*", paramLabel = "FILE",
            description = "Instead, verify each certificate FILE with the independent verifier and print its size, "
                    + "verdict, wall-clock time and the peak heap in use (all heap pools; a figure of this JVM, run it "
                    + "with the -Xmx of interest).")
    private List<Path> certificates;

    private static final String CERTIFICATE_ROW = "%-44s %12s %-9s %10s %12s%n";

    private static final String ORIENTABLE_ROW = "%-12s %9s %5s %12s %12s %10s %10s %10s%n";

    @Override
    public Integer call() {
        if (certificates != null) {
            return verifyCertificates(spec.commandLine().getOut());
        }
        if (orientable) {
            PrintWriter out = spec.commandLine().getOut();
            out.printf(ORIENTABLE_ROW, "instance", "elements", "rank", "method", "verdict", "bases", "relations", "ms");
            Benchmark.orientable(budget.budget(), r -> {
                out.printf(ORIENTABLE_ROW, r.name(), r.elements(), r.rank(), r.method(), r.verdict(), r.bases(),
                        r.relations(), r.millis());
                out.flush();
            });
            return ExitCodes.OK;
        }
        if (maxN < 3) {
            throw new ParameterException(spec.commandLine(), "--max-n must be at least 3, not " + maxN + ".");
        }
        Limits.requireCube(maxN, "--max-n");
        SearchSettings settings = new SearchSettings(0, Strategy.CONTRACT_FIRST, budget.budget());
        PrintWriter out = spec.commandLine().getOut();
        out.printf(ROW, "n", "elements", "rank", "decide ms", "reduce ms", "core elements", "core rank", "core bases",
                "decisions");
        for (int n = 3; n <= maxN; n++) {
            Benchmark.Row r = Benchmark.corner(n, settings);
            String decide = r.decision().map(BenchCommand::decideColumn).orElse("-");
            if (r.reduction() instanceof SearchResult.Found f) {
                MinimalCore c = f.core();
                out.printf(ROW, n, r.elements(), r.rank(), decide, r.reduceMillis(), c.core().size(), c.core().rank(),
                        c.core().basisCount(), c.stats().decisions());
            } else {
                out.printf(ROW, n, r.elements(), r.rank(), decide, r.reduceMillis(), reductionColumn(r.reduction()),
                        "-", "-", "-");
            }
            out.flush();
        }
        return ExitCodes.OK;
    }

    private int verifyCertificates(PrintWriter out) {
        for (Path file : certificates) {
            if (!Files.isRegularFile(file)) {
                throw new ParameterException(spec.commandLine(), file + (Files.isDirectory(file)
                        ? ": a directory, not a certificate file (--certificates takes files, e.g. DIR/*.cert.json)."
                        : ": no such certificate file (--certificates)."));
            }
        }
        out.printf(CERTIFICATE_ROW, "certificate", "bytes", "verdict", "ms", "peak heap MB");
        for (Path file : certificates) {
            System.gc();
            List<MemoryPoolMXBean> heap = ManagementFactory.getMemoryPoolMXBeans().stream()
                    .filter(p -> p.getType() == MemoryType.HEAP).toList();
            heap.forEach(MemoryPoolMXBean::resetPeakUsage);
            VerificationReport report = CertificateVerifier.verify(file);
            long peak = heap.stream().mapToLong(p -> p.getPeakUsage().getUsed()).sum();
            out.printf(CERTIFICATE_ROW, file, file.toFile().length(), report.word().equals("verified") ? "verified" : report.word(),
                    report.millis(), peak / (1024 * 1024));
            out.flush();
        }
        return ExitCodes.OK;
    }

    /** The "decide ms" cell: the decision's time, or "unknown" when its budget ran out (no time is a verdict's). */
    static String decideColumn(Orientability decision) {
        return decision instanceof Orientability.Unknown ? "unknown" : String.valueOf(decision.stats().millis());
    }

    /** The "core elements" cell of a reduction that found no core: orientable, or unknown when the budget ran out. */
    static String reductionColumn(SearchResult reduction) {
        if (reduction instanceof SearchResult.Orientable) {
            return "orientable";
        }
        if (reduction instanceof SearchResult.Unknown) {
            return "unknown";
        }
        throw new IllegalArgumentException("a found core has its own columns");
    }
}
