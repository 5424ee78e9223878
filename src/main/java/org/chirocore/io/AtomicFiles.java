package org.chirocore.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes files so that readers see either the old content or the complete new content, never a
 * prefix: the bytes go to a temporary file in the target's directory, are forced to disk, and
 * the temporary file is renamed over the target (an atomic move where the file system offers
 * one, else a plain replacing move). On any failure the temporary file is deleted.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /**
     * Replaces {@code target} with {@code content}.
     *
     * @throws IOException when the directory is not writable, the disk is full, the target is a
     *     non-empty directory, …; the target is then unchanged
     */
    public static void write(Path target, byte[] content) throws IOException {
        Path absolute = target.toAbsolutePath();
        // Same directory as the target, so the rename never crosses file systems. Not
        // Files.createTempFile: its owner-only permissions would be carried over to the target.
        Path temp = absolute.resolveSibling("." + absolute.getFileName() + "."
                + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36) + ".tmp");
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                ByteBuffer buffer = ByteBuffer.wrap(content);
                while (buffer.hasRemaining()) {
                    channel.write(buffer);
                }
                channel.force(true);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException notAtomic) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException | RuntimeException e) {
            try {
                Files.deleteIfExists(temp);
            } catch (IOException cleanup) {
                e.addSuppressed(cleanup);
            }
            throw e;
        }
    }

    /** Replaces {@code target} with {@code text} in UTF-8; throws as {@link #write(Path, byte[])}. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Replaces {@code target} with {@code value} as {@link Json#toText()} plus a final newline. */
    public static void writeJson(Path target, Json value) throws IOException {
        writeString(target, value.toText() + "\n");
    }
}
