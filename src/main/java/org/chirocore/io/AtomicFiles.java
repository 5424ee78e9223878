package org.chirocore.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes files so that readers see either the old content or the complete new content, never a
 * prefix: the bytes go to a temporary file in the target's directory, are forced to disk, and
 * the temporary file is renamed over the target (an atomic move where the file system offers
 * one, else a plain replacing move).
 *
 * <p>No temporary file outlives its writer: on any failure it is deleted; when the JVM is
 * stopped (Ctrl-C, a cluster's SIGTERM) a shutdown hook deletes those still being written; and
 * since a killed process (SIGKILL) runs no hook, a temporary file's name carries the writer's
 * process id ({@code .chirocore.NAME.PID.RANDOM.tmp}), so the first write into a directory
 * removes the leftovers of writers that are no longer running.
 */
public final class AtomicFiles {
    /** How the names of this class's temporary files (and output probes) begin. */
    static final String PREFIX = ".chirocore.";
    /** How the names of this class's temporary files end. */
    static final String SUFFIX = ".tmp";

    private static final long PID = ProcessHandle.current().pid();
    private static final Set<Path> PENDING = ConcurrentHashMap.newKeySet();
    private static final Set<Path> SWEPT = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            for (Path temp : PENDING) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException e) {
                    // the JVM is stopping: nothing more can be done, and the next run sweeps it
                }
            }
        }, "chirocore-temporary-files"));
    }

    private AtomicFiles() {
    }

    /**
     * Replaces {@code target} with {@code content}.
     *
     * @throws IOException when the directory is not writable, the disk is full, the target is a
     *     non-empty directory, …; the target is then unchanged
     */
    public static void write(Path target, byte[] content) throws IOException {
        replace(target, temp -> {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                ByteBuffer buffer = ByteBuffer.wrap(content);
                while (buffer.hasRemaining()) {
                    channel.write(buffer);
                }
                channel.force(true);
            }
        });
    }

    /**
     * Replaces {@code target} with a copy of {@code source}.
     *
     * @throws IOException as {@link #write(Path, byte[])}, or when {@code source} cannot be read
     */
    public static void copy(Path source, Path target) throws IOException {
        replace(target, temp -> {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
                    InputStream in = Files.newInputStream(source)) {
                byte[] buffer = new byte[1 << 16];
                for (int read = in.read(buffer); read >= 0; read = in.read(buffer)) {
                    ByteBuffer b = ByteBuffer.wrap(buffer, 0, read);
                    while (b.hasRemaining()) {
                        channel.write(b);
                    }
                }
                channel.force(true);
            }
        });
    }

    /** Replaces {@code target} with {@code text} in UTF-8; throws as {@link #write(Path, byte[])}. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Replaces {@code target} with {@code value} as {@link Json#toText()} plus a final newline. */
    public static void writeJson(Path target, Json value) throws IOException {
        writeString(target, value.toText() + "\n");
    }

    /** Fills a temporary file. */
    @FunctionalInterface
    private interface Filler {
        void fill(Path temp) throws IOException;
    }

    private static void replace(Path target, Filler filler) throws IOException {
        Path absolute = target.toAbsolutePath();
        sweep(absolute.getParent());
        // Same directory as the target, so the rename never crosses file systems. Not
        // Files.createTempFile: its owner-only permissions would be carried over to the target.
        Path temp = absolute.resolveSibling(PREFIX + absolute.getFileName() + "." + PID + "."
                + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36) + SUFFIX);
        PENDING.add(temp);
        try {
            filler.fill(temp);
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
        } finally {
            PENDING.remove(temp);
        }
    }

    /**
     * Once per directory and run: deletes the temporary files of writers that are no longer
     * running (their process id, in the name, names no live process).
     */
    private static void sweep(Path dir) {
        if (dir == null || !SWEPT.add(dir)) {
            return;
        }
        try (DirectoryStream<Path> leftovers = Files.newDirectoryStream(dir, PREFIX + "*" + SUFFIX)) {
            for (Path leftover : leftovers) {
                if (ownerGone(leftover.getFileName().toString())) {
                    Files.deleteIfExists(leftover);
                }
            }
        } catch (IOException e) {
            // Sweeping is tidying only; the write itself reports a directory that cannot be used.
        }
    }

    /** Whether the temporary file {@code name} (PREFIX NAME.PID.RANDOM SUFFIX) belongs to no live process. */
    static boolean ownerGone(String name) {
        String[] parts = name.substring(0, name.length() - SUFFIX.length()).split("\\.");
        if (parts.length < 3) {
            return false;
        }
        try {
            long pid = Long.parseLong(parts[parts.length - 2]);
            return pid != PID && ProcessHandle.of(pid).map(p -> !p.isAlive()).orElse(true);
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
