package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.io.Json;
import org.chirocore.io.ReductionJson;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore reduce}: reduces a matroid file or a cube construction to a minor-minimal
 * non-orientable minor and writes the reduction file (docs/reduction-format.md).
 */
@Command(name = "reduce", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Reduce a matroid to a minor-minimal non-orientable minor, with a witness that every "
                + "single-element deletion and contraction of it is orientable.",
                "The matroid is FILE, or the n-cube of --cube with the vertex of --pull pulled to the hyperplane "
                        + "of --hyperplane (and, by default, then contracted)."})
final class ReduceCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "0..1", description = "A matroid file (instead of --cube).")
    private Path file;

    @Option(names = "--cube", paramLabel = "N", description = "Start from the affine N-cube (instead of FILE).")
    private Integer cube;

    @Mixin
    private ConstructionOptions construction;

    @Option(names = "--contract-pulled", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "Contract the pulled vertex before reducing (default: yes).")
    private boolean contractPulled;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "0",
            description = "Seed of the element order (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--strategy", paramLabel = "STRATEGY", defaultValue = "contract-first",
            converter = Converters.StrategyConverter.class, completionCandidates = Converters.StrategyNames.class,
            description = "Which single-element minors to try first: ${COMPLETION-CANDIDATES} "
                    + "(default: ${DEFAULT-VALUE}).")
    private Strategy strategy;

    @Option(names = "--focus", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "For a construction too large to enumerate, contract the elements of the pulled hyperplane "
                    + "first (default: yes).")
    private boolean focus;

    @Mixin
    private BudgetOptions budget;

    @Option(names = "--out", paramLabel = "FILE", required = true,
            description = "Where to write the reduction file (written atomically).")
    private Path out;

    @Option(names = "--json", description = "Print the reduction file's content instead of a summary.")
    private boolean json;

    @Override
    public Integer call() {
        Inputs.Input input = input();
        Inputs.requireDirectoryOf(out);
        SearchSettings settings = new SearchSettings(seed, strategy, budget.budget(),
                focus ? input.focus() : List.of());
        ConsoleProgress progress = ConsoleProgress.ifInteractive(spec.commandLine().getErr());
        SearchResult result = new UnsatCoreSearch(settings, progress).reduce(input.matroid());
        progress.finish();
        Json.Obj reduction = ReductionJson.reduction(input.source(), settings, result);
        Inputs.write(out, reduction);
        PrintWriter w = spec.commandLine().getOut();
        if (json) {
            w.println(reduction.toText());
        } else {
            summarise(w, input, result);
        }
        return ExitCodes.of(result);
    }

    /** The input chosen by exactly one of FILE and --cube. */
    private Inputs.Input input() {
        if ((file == null) == (cube == null)) {
            throw new ParameterException(spec.commandLine(), "Give exactly one of FILE or --cube N; "
                    + (file == null ? "neither was given." : "both were given."));
        }
        if (file == null) {
            return Inputs.build(construction.construction(cube, contractPulled));
        }
        if (construction.anyGiven() || spec.commandLine().getParseResult().hasMatchedOption("--contract-pulled")) {
            throw new ParameterException(spec.commandLine(),
                    "--field, --hyperplane, --pull and --[no-]contract-pulled only go with --cube, not with FILE.");
        }
        return Inputs.read(file);
    }

    private void summarise(PrintWriter w, Inputs.Input input, SearchResult result) {
        String from = Format.shape(input.matroid().rank(), input.matroid().size());
        if (result instanceof SearchResult.Found f) {
            MinimalCore core = f.core();
            w.println("non-orientable core: " + Format.shape(core.core().rank(), core.core().size(),
                    core.core().basisCount()) + " (from " + from + ")");
            w.println("contracted: " + Format.labels(core.contracted()));
            w.println("deleted: " + Format.labels(core.deleted()));
            w.println("witnesses: " + core.witnesses().size()
                    + " (every single-element deletion and contraction is orientable)");
            w.println("time: " + core.stats().millis() + " ms, " + core.stats().decisions() + " decisions");
        } else if (result instanceof SearchResult.Orientable) {
            w.println("orientable: " + from + "; no non-orientable minor to find (witness signs in the file)");
        } else if (result instanceof SearchResult.Unknown u) {
            w.println("unknown: " + u.reason());
        }
        w.println("wrote " + out);
    }
}
