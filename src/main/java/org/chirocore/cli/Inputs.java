package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.Source;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.IoMessages;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Matroid;

/**
 * Reading and building inputs, and writing outputs, for the commands: each turns the library's
 * rejection of the input into a {@link BadInputException}, so every command reports bad input
 * the same way.
 */
final class Inputs {
    private Inputs() {
    }

    /**
     * A matroid to work on and where it came from.
     *
     * @param matroid the matroid
     * @param source its description in certificates
     * @param focus labels to contract first when the matroid is too large to enumerate
     */
    record Input(Matroid matroid, Source source, List<String> focus) {
    }

    /** The matroid in {@code file}, with the digest of its bytes. */
    static Input read(Path file) {
        try {
            MatroidFiles.Hashed read = MatroidFiles.readHashed(file);
            return new Input(read.matroid(), new Source.Given(read.sha256(), read.matroid().size(),
                    read.matroid().rank()), List.of());
        } catch (MatroidFileException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /** The matroid {@code construction} builds. */
    static Input build(CubeConstruction construction) {
        try {
            // The pulled hyperplane is where the obstruction sits: its elements are contracted first.
            return new Input(construction.build(), new Source.Constructed(construction),
                    construction.hyperplaneVertices());
        } catch (IllegalArgumentException e) {
            // CubeConstruction.build reports every invalid part (dimension, vertex label,
            // hyperplane, general position) as an IllegalArgumentException with a full sentence.
            throw new BadInputException("cannot build the " + construction.n() + "-cube construction: " + e.getMessage(),
                    e);
        }
    }

    /** Writes {@code certificate} to {@code file} atomically (and its proof beside it when large). */
    static CertificateWriter.Written write(Path file, Certificate certificate) {
        try {
            return CertificateWriter.write(certificate, file);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot write the certificate: " + IoMessages.plain(e), e);
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
