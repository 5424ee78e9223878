package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.family.FamilyException;
import org.chirocore.family.FamilyPrediction;
import org.chirocore.io.IoMessages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore family predict}: checks a predicted core per n without searching, and
 * certifies and verifies the confirmed ones.
 */
@Command(name = "predict", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Check the predicted core of each n = A..B given in PREDICTION (JSON, see docs/families.md): "
                + "decide it non-orientable and minor-minimal, then certify and verify it as "
                + "DIR/n=K.predicted.cert.json.")
final class FamilyPredictCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private FamilyOptions family;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private ProofFormOptions proofForms;

    @Option(names = "--prediction", paramLabel = "PREDICTION", required = true,
            description = "The predicted cores (JSON, see docs/families.md).")
    private Path predict;

    @Override
    public Integer call() {
        int[] bounds = family.bounds();
        Path out = family.out();
        family.checkOut(predict);
        List<FamilyPrediction.Outcome> outcomes;
        try {
            FamilyPrediction.Prediction prediction = FamilyPrediction.Prediction.read(predict);
            outcomes = new FamilyPrediction(family.definition(), prediction, out, budget.budget(), proofForms.forms())
                    .run(bounds[0], bounds[1]);
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the prediction's certificates: " + IoMessages.plain(e), e);
        }
        PrintWriter w = spec.commandLine().getOut();
        int exit = ExitCodes.OK;
        for (FamilyPrediction.Outcome o : outcomes) {
            if (o instanceof FamilyPrediction.Confirmed c) {
                w.println("n = " + c.n() + ": prediction confirmed: core " + Format.core(c.facts().core()) + "; verified; "
                        + out.resolve(c.certificate()));
            } else if (o instanceof FamilyPrediction.Refuted r) {
                w.println("n = " + r.n() + ": prediction refuted: " + r.reason());
                exit = exit == ExitCodes.OK ? ExitCodes.CHECK_FAILED : exit;
            } else {
                w.println("n = " + o.n() + ": unknown: " + ((FamilyPrediction.Unknown) o).reason());
                exit = ExitCodes.UNKNOWN;
            }
        }
        return exit;
    }
}
