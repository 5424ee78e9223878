package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.chirocore.io.ResultJson;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.SolveStats;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code chirocore orient FILE}: decides whether the matroid in a file is orientable. */
@Command(name = "orient", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Decide whether the matroid in FILE is orientable.")
final class OrientCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private BudgetOptions budget;

    @Parameters(paramLabel = "FILE", description = "A matroid file (see docs/matroid-format.md).")
    private Path file;

    @Option(names = "--json", description = "Print the verdict as JSON instead of a summary.")
    private boolean json;

    @Override
    public Integer call() {
        Matroid m = Inputs.read(file).matroid();
        Orientability result = new LazySatDecider(budget.budget()).decide(m);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(ResultJson.orientability(m, result).toText());
        } else {
            SolveStats s = result.stats();
            out.println(result.verdict() + ": " + Format.shape(m.rank(), m.size(), s.bases()) + " (" + s.relations()
                    + " relations, " + s.millis() + " ms)");
            if (result instanceof Orientability.Unknown u) {
                out.println("reason: " + u.reason());
            }
        }
        return ExitCodes.of(result);
    }
}
