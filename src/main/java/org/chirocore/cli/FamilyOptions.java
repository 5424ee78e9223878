package org.chirocore.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyException;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** The family definition, the range of n and the output directory, shared by the family subcommands. */
final class FamilyOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    @Parameters(index = "0", paramLabel = "FILE", description = "The family definition (JSON, see docs/families.md).")
    private Path file;

    @Option(names = "--n", paramLabel = "A..B", required = true, description = "The cube dimensions, e.g. 3..8 or 5.")
    private String range;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "The output directory (created if missing).")
    private Path out;

    @Option(names = "--progress", description = "Print progress lines on standard error even when it is not a "
            + "terminal (e.g. a batch job's log file).")
    private boolean progress;

    /** The output directory. */
    Path out() {
        return out;
    }

    /**
     * Checks the output directory before any work: not an input, creatable, writable.
     *
     * @param otherInputs input files besides the definition (e.g. a prediction)
     * @throws BadInputException naming the directory when it cannot be used
     */
    void checkOut(Path... otherInputs) {
        List<Path> inputs = new ArrayList<>(Arrays.asList(otherInputs));
        inputs.add(file);
        OutputOptions.checkRunDirectory(out, inputs);
    }

    /** Member lines on standard output as they complete; progress on standard error (terminal or --progress). */
    FamilyConsole console() {
        return FamilyConsole.of(mixee.commandLine().getOut(), mixee.commandLine().getErr(), progress, out);
    }

    /**
     * The definition in FILE.
     *
     * @throws BadInputException naming the file and the offending field
     */
    FamilyDefinition definition() {
        try {
            return FamilyDefinition.read(file);
        } catch (FamilyException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /**
     * The bounds of --n: "A..B" or "A".
     *
     * @throws ParameterException when --n is neither
     */
    int[] bounds() {
        return Converters.range(mixee, "--n", range);
    }
}
