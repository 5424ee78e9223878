package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.io.ResultJson;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.EnumerationLimitException;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.OrientabilityDecider;
import org.chirocore.orient.RealisationCheck;
import org.chirocore.orient.Realised;
import org.chirocore.orient.RepairingDecider;
import org.chirocore.orient.SolveStats;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore orient FILE}: decides whether the matroid in a file is orientable, from the
 * determinant signs when the file gives a matrix over Q, else by the lazy SAT search.
 */
@Command(name = "orient", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Decide whether the matroid in FILE is orientable.",
                "A matrix over Q is orientable by its determinant signs: the matrix is the witness, checked "
                        + "against every r-subset; other inputs are decided by the SAT search."})
final class OrientCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private BudgetOptions budget;

    @Parameters(paramLabel = "FILE", description = "A matroid file (see docs/matroid-format.md).")
    private Path file;

    @Option(names = "--json", description = "Print the verdict as JSON instead of a summary.")
    private boolean json;

    @Option(names = "--witness-out", paramLabel = "WITNESS",
            description = "When orientable, write the witness: the realisation matrix for a matrix over Q, "
                    + "else the chirotope (signs per basis).")
    private Path witnessOut;

    @Option(names = "--witness-signs",
            description = "Write the witness as signs per basis even when a realisation is at hand.")
    private boolean witnessSigns;

    @Option(names = "--start", paramLabel = "REALISATION",
            description = "For the SAT search: start from the determinant signs of this realisation (a matroid file "
                    + "with a matrix over Q of exactly rank rows, on the same labels) and repair them locally; the "
                    + "search runs only when the repair does not reach a chirotope.")
    private Path start;

    @Option(names = "--no-realisation",
            description = "Decide a matrix over Q by the SAT search too, ignoring its determinant signs.")
    private boolean noRealisation;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        if (witnessSigns && witnessOut == null) {
            throw new ParameterException(spec.commandLine(),
                    "--witness-signs chooses the form of the witness file: it needs --witness-out.");
        }
        output.checkFiles(Arrays.asList(file, start), witnessOut);
        Matroid m = Inputs.read(file).matroid();
        OrientabilityDecider search = new LazySatDecider(budget.budget());
        if (start != null) {
            search = new RepairingDecider(RepairingDecider.of(startRealisation(m)), search);
        }
        try {
            Optional<Realised> realised = noRealisation ? Optional.empty() : Realised.decide(m);
            return realised.isPresent() ? report(m, realised.get()) : report(m, search.decide(m));
        } catch (EnumerationLimitException e) {
            throw new BadInputException(file + ": " + e.getMessage(), e);
        }
    }

    private Realisation startRealisation(Matroid m) {
        Matroid s = Inputs.read(start).matroid();
        if (!(s instanceof MatrixMatroid matrix) || !matrix.field().isRational() || matrix.rows() != matrix.rank()) {
            throw new BadInputException(start + ": a start must be a realisation: a matrix over Q with exactly \"rank\" "
                    + "rows", null);
        }
        if (!s.labels().equals(m.labels()) || s.rank() != m.rank()) {
            throw new BadInputException(start + ": the start has rank " + s.rank() + " on " + s.labels()
                    + ", but " + file + " has rank " + m.rank() + " on " + m.labels(), null);
        }
        return Realisation.of(matrix).orElseThrow();
    }

    private int report(Matroid m, Realised r) {
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(ResultJson.realised(m, r).toText());
        } else {
            out.println("orientable: " + Format.shape(m.rank(), m.size(), r.bases())
                    + " (realised over Q: the determinant signs of the matrix, checked on every " + m.rank()
                    + "-subset; " + r.millis() + " ms)");
        }
        if (witnessOut != null) {
            Inputs.write(witnessOut, witnessSigns ? ResultJson.chirotope(RealisationCheck.chirotope(r.witness()))
                    : ResultJson.realisation(r.witness()));
            if (!json) {
                out.println("wrote the witness to " + witnessOut);
            }
        }
        return ExitCodes.OK;
    }

    private int report(Matroid m, Orientability result) {
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
        if (witnessOut != null && result instanceof Orientability.Orientable o) {
            Inputs.write(witnessOut, ResultJson.chirotope(o.witness()));
            if (!json) {
                out.println("wrote the witness to " + witnessOut);
            }
        }
        return ExitCodes.of(result);
    }
}
