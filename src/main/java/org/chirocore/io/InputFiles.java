package org.chirocore.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;

import org.chirocore.matroid.Limits;

/**
 * Reads input files whole, within {@link Limits#INPUT_BYTES}: only regular files (a directory or
 * a named pipe is refused before reading, so nothing blocks), and never more bytes than the
 * limit, even when the file grows while it is read.
 */
public final class InputFiles {
    private InputFiles() {
    }

    /**
     * The bytes of {@code file}.
     *
     * @throws IOException with a plain-word message (see {@link IoMessages#plain}) when the file
     *     does not exist, is not a regular file, is larger than {@link Limits#INPUT_BYTES}, or
     *     cannot be read
     */
    public static byte[] read(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException("it is a directory, not a file");
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            throw new IOException("it is not a regular file");
        }
        if (Files.exists(file, LinkOption.NOFOLLOW_LINKS) && !Files.exists(file)) {
            throw new IOException("it is a link to a file that does not exist");
        }
        long size = Files.size(file);
        if (size > Limits.INPUT_BYTES) {
            throw new IOException(tooLarge(size));
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes((int) Limits.INPUT_BYTES + 1);
            if (bytes.length > Limits.INPUT_BYTES) {
                throw new IOException(tooLarge(bytes.length));
            }
            return bytes;
        }
    }

    /**
     * The bytes of {@code in} (for example a decompressing stream), at most {@code limit} of them.
     *
     * @param what the data, as named in the message (e.g. "the proof file p.drat.gz")
     * @throws IOException when there are more than {@code limit} bytes, or reading fails
     */
    public static byte[] readUpTo(InputStream in, long limit, String what) throws IOException {
        byte[] bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, limit + 1));
        if (bytes.length > limit) {
            throw new IOException(what + " is too large: more than " + limit + " bytes");
        }
        return bytes;
    }

    private static String tooLarge(long size) {
        return "too large: " + size + " bytes; input files are read up to " + Limits.INPUT_BYTES + " bytes";
    }
}
