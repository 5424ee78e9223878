package org.chirocore.cli;

import java.util.Optional;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.HyperplaneSpec;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The options describing a cube construction, shared by {@code cube} and {@link InputOptions}. */
final class ConstructionOptions {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    @Option(names = "--field", paramLabel = "FIELD", converter = Converters.FieldConverter.class,
            description = "Field of the cube: Q (default, the real cube) or a prime p, also written GF(p).")
    private Field field;

    @Option(names = "--hyperplane", paramLabel = "SPEC", converter = Converters.HyperplaneConverter.class,
            description = "The hyperplane H: an equation \"a1,...,an=b\" (e.g. 1,1,1=1) or vertex labels "
                    + "(e.g. 100,010,001).")
    private HyperplaneSpec hyperplane;

    @Option(names = "--pull", paramLabel = "VERTEX", description = "The vertex O pulled to H, e.g. 111.")
    private String pull;

    /** Whether any of these options was given. */
    boolean anyGiven() {
        return field != null || hyperplane != null || pull != null;
    }

    /** The field, the rationals unless given. */
    Field field() {
        return field == null ? Field.RATIONALS : field;
    }

    Optional<HyperplaneSpec> hyperplane() {
        return Optional.ofNullable(hyperplane);
    }

    /**
     * The pulled vertex; it only means something together with a hyperplane.
     *
     * @throws ParameterException when --pull is given without --hyperplane
     */
    Optional<String> pull() {
        if (pull != null && hyperplane == null) {
            throw new ParameterException(mixee.commandLine(), "--pull needs --hyperplane.");
        }
        return Optional.ofNullable(pull);
    }

    /**
     * The construction on the n-cube (not yet validated: {@link CubeConstruction#build} does that).
     *
     * @throws ParameterException when --hyperplane or --pull is missing
     */
    CubeConstruction construction(int n, boolean contractPulled) {
        if (hyperplane == null || pull == null) {
            throw new ParameterException(mixee.commandLine(), "--cube needs both --hyperplane and --pull.");
        }
        return new CubeConstruction(n, field(), hyperplane, pull, contractPulled);
    }
}
