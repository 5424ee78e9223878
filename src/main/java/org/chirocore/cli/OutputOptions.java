package org.chirocore.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.chirocore.io.OutputCheck;
import org.chirocore.io.OutputRefusedException;

import picocli.CommandLine.Option;

/**
 * The {@code --force} option of every command that writes files, and the checks made with it
 * before any long work ({@link OutputCheck}): no output is an input, an existing file is replaced
 * only with {@code --force}, and the output's directory accepts new files. A refusal is bad
 * input (exit code 2).
 */
final class OutputOptions {
    @Option(names = "--force", description = "Replace output files that already exist (an input file is never "
            + "replaced).")
    private boolean force;

    /** Whether --force was given: files written after the first checks (pictures, a run's reports) may replace existing ones. */
    boolean force() {
        return force;
    }

    /**
     * Checks the output files {@code outputs} (null entries are options not given) against the
     * input files {@code inputs} (null entries likewise).
     *
     * @throws BadInputException naming the output when it may not be written
     */
    void checkFiles(Collection<Path> inputs, Path... outputs) {
        List<Path> given = new ArrayList<>();
        for (Path output : outputs) {
            if (output == null) {
                continue;
            }
            try {
                OutputCheck.file(output, present(inputs), force);
                // Two outputs under one name would overwrite each other.
                for (Path earlier : given) {
                    OutputCheck.distinct(earlier, output);
                }
            } catch (OutputRefusedException e) {
                throw new BadInputException(e.getMessage(), e);
            }
            given.add(output);
        }
    }

    /**
     * Checks the output directory {@code dir} and the files {@code names} to be written into it.
     *
     * @throws BadInputException naming the directory or file when it may not be written
     */
    void checkDirectory(Path dir, Collection<Path> inputs, Collection<String> names) {
        directory(dir, inputs, names, force);
    }

    /**
     * Checks a family run's (or sweep's) directory, which is resumable: the run's own files in it are replaced
     * by design, so only the directory itself is checked (not an input, creatable, writable).
     *
     * @throws BadInputException naming the directory when it cannot be used
     */
    static void checkRunDirectory(Path dir, Collection<Path> inputs) {
        directory(dir, inputs, List.of(), true);
    }

    private static void directory(Path dir, Collection<Path> inputs, Collection<String> names, boolean overwrite) {
        try {
            OutputCheck.directory(dir, present(inputs), names, overwrite);
        } catch (OutputRefusedException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /**
     * Refuses, unless --force was given, to replace files that belong to something else.
     *
     * @param other why existing files would be replaced, if they would
     * @throws BadInputException with that reason when {@code other} is present and --force was not given
     */
    void checkReplacing(Optional<String> other) {
        if (other.isPresent() && !force) {
            throw new BadInputException(other.get() + "; its files would be replaced: give --force to replace them, "
                    + "or choose another output directory.", null);
        }
    }

    private static List<Path> present(Collection<Path> paths) {
        return paths.stream().filter(Objects::nonNull).toList();
    }
}
