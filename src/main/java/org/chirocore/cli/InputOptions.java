package org.chirocore.cli;

import java.nio.file.Path;

import org.chirocore.pipeline.Subject;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * The input of a command that takes a matroid file or a cube construction ({@code reduce},
 * {@code enumerate}): FILE, or --cube N with the construction options and --[no-]contract-pulled.
 */
final class InputOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    @Parameters(paramLabel = "FILE", arity = "0..1", description = "A matroid file (instead of --cube).")
    private Path file;

    @Option(names = "--cube", paramLabel = "N", description = "Start from the affine N-cube (instead of FILE).")
    private Integer cube;

    @Mixin
    private ConstructionOptions construction;

    @Option(names = "--contract-pulled", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "Contract the pulled vertex first (default: yes).")
    private boolean contractPulled;

    /** The matroid file, or null when the input is a construction (an input of the output checks). */
    Path file() {
        return file;
    }

    /**
     * The input: exactly one of FILE and --cube N, and the construction options only with --cube.
     *
     * @throws ParameterException when both or neither are given, or construction options go with FILE
     */
    Subject choose() {
        if ((file == null) == (cube == null)) {
            throw new ParameterException(mixee.commandLine(), "Give exactly one of FILE or --cube N; "
                    + (file == null ? "neither was given." : "both were given."));
        }
        if (file == null) {
            return Inputs.build(construction.construction(cube, contractPulled));
        }
        if (construction.anyGiven() || mixee.commandLine().getParseResult().hasMatchedOption("--contract-pulled")) {
            throw new ParameterException(mixee.commandLine(),
                    "--field, --hyperplane, --pull and --[no-]contract-pulled only go with --cube, not with FILE.");
        }
        return Inputs.read(file);
    }
}
