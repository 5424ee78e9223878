package org.chirocore.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.Optional;

/**
 * Checks made on an output path before any long work, so that a run is neither wasted on an
 * output that cannot be written nor allowed to destroy data: an output is never one of the
 * command's inputs (compared by real path, so a link or "./" does not hide it), an existing file
 * is replaced only when the caller allows it, and the directory must exist (or be creatable)
 * and accept a new file, which is tried by creating and removing a probe file. Every refusal is
 * an {@link OutputRefusedException} whose message names the path and says what to do, in plain
 * words.
 */
public final class OutputCheck {
    private OutputCheck() {
    }

    /**
     * Checks that {@code output} may be written as a file.
     *
     * @param inputs the files the command reads (those that do not exist are ignored)
     * @param overwrite whether an existing file may be replaced
     * @throws OutputRefusedException when {@code output} is an input, a directory, an existing
     *     file without {@code overwrite}, or its directory is missing or not writable
     */
    public static void file(Path output, Collection<Path> inputs, boolean overwrite) {
        notAnInput(output, inputs);
        if (Files.isDirectory(output)) {
            throw new OutputRefusedException(output + ": is a directory; give the name of a file to write.");
        }
        if (Files.exists(output) && !overwrite) {
            throw new OutputRefusedException(output + ": the file already exists; give --force to replace it, or "
                    + "choose another name.");
        }
        Path parent = output.toAbsolutePath().getParent();
        if (parent == null || !Files.isDirectory(parent)) {
            throw new OutputRefusedException(output + ": cannot be written: the directory " + parent
                    + " does not exist.");
        }
        writable(parent, output);
    }

    /**
     * Checks that {@code dir} may be used as an output directory (created when missing) into
     * which the files {@code names} are written.
     *
     * @param inputs the files the command reads
     * @param names the files the command writes into {@code dir} that must not silently replace
     *     existing ones
     * @param overwrite whether existing files among {@code names} may be replaced
     * @throws OutputRefusedException as {@link #file}, for the directory and each name
     */
    public static void directory(Path dir, Collection<Path> inputs, Collection<String> names, boolean overwrite) {
        notAnInput(dir, inputs);
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new OutputRefusedException(dir + ": is a file, not a directory; give a directory for the output.");
        }
        Path existing = dir.toAbsolutePath();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null || !Files.isDirectory(existing)) {
            throw new OutputRefusedException(dir + ": cannot be created: " + existing + " is not a directory.");
        }
        writable(existing, dir);
        for (String name : names) {
            notAnInput(dir.resolve(name), inputs);
        }
        for (String name : names) {
            Path file = dir.resolve(name);
            if (Files.exists(file) && !overwrite) {
                throw new OutputRefusedException(file + ": the file already exists; give --force to replace it, or "
                        + "choose another directory.");
            }
        }
    }

    /**
     * Checks that two outputs of one command are different files.
     *
     * @throws OutputRefusedException when {@code a} and {@code b} name the same file
     */
    public static void distinct(Path a, Path b) {
        if (real(a).equals(real(b))) {
            throw new OutputRefusedException(b + ": names the same file as " + a + "; give each output its own name.");
        }
    }

    private static void notAnInput(Path output, Collection<Path> inputs) {
        Optional<Path> real = real(output);
        for (Path input : inputs) {
            if (input != null && real.isPresent() && real.equals(real(input)) && Files.exists(input)) {
                throw new OutputRefusedException(output + ": is also an input of this command (" + input
                        + "); writing it would destroy the input. Choose another output name.");
            }
        }
    }

    /** The real path of {@code p}, or of its directory joined with its name when it does not exist yet. */
    private static Optional<Path> real(Path p) {
        try {
            if (Files.exists(p)) {
                return Optional.of(p.toRealPath());
            }
            Path absolute = p.toAbsolutePath().normalize();
            Path parent = absolute.getParent();
            if (parent != null && Files.exists(parent)) {
                return Optional.of(parent.toRealPath().resolve(absolute.getFileName()));
            }
            return Optional.of(absolute);
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    /** Creates and removes a probe file in {@code dir}, the one reliable test that a file can be created there. */
    private static void writable(Path dir, Path output) {
        try {
            Path probe = Files.createTempFile(dir, AtomicFiles.PREFIX + "probe.", AtomicFiles.SUFFIX);
            Files.delete(probe);
        } catch (IOException e) {
            throw new OutputRefusedException(output + ": cannot be written: the directory " + dir
                    + " does not accept new files (" + IoMessages.plain(e) + ").", e);
        }
    }
}
