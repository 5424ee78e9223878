package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Path;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.IoMessages;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.pipeline.Subject;


/**
 * Reading and building inputs, and writing outputs, for the commands: each turns the library's
 * rejection of the input into a {@link BadInputException}, so every command reports bad input
 * the same way.
 */
final class Inputs {
    private Inputs() {
    }

    /** The matroid in {@code file}, with the digest of its bytes. */
    static Subject read(Path file) {
        try {
            MatroidFiles.Hashed read = MatroidFiles.readHashed(file);
            return Subject.given(read.matroid(), read.sha256());
        } catch (MatroidFileException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /** The matroid {@code construction} builds, built once. */
    static Subject build(CubeConstruction construction) {
        try {
            return Subject.of(construction);
        } catch (IllegalArgumentException e) {
            // CubeConstruction.build reports every invalid part (dimension, vertex label,
            // hyperplane, general position) as an IllegalArgumentException with a full sentence.
            throw new BadInputException("cannot build the " + construction.n() + "-cube construction: " + e.getMessage(),
                    e);
        }
    }

    /** Writes {@code json} to {@code file} atomically. */
    static void write(Path file, Json json) {
        try {
            AtomicFiles.writeJson(file, json);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot write the file: " + IoMessages.plain(e), e);
        }
    }

    /** Writes {@code text} to {@code file} atomically. */
    static void writeText(Path file, String text) {
        try {
            AtomicFiles.writeString(file, text);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot write the file: " + IoMessages.plain(e), e);
        }
    }
}
