package org.chirocore.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A process for {@link AtomicFilesTest}: copies {@code args[0]} to {@code args[1]} through
 * {@link AtomicFiles}; with a named pipe as the source it blocks mid-write, temporary file open,
 * until it is killed.
 */
public final class BlockedWriter {
    private BlockedWriter() {
    }

    public static void main(String[] args) throws IOException {
        AtomicFiles.copy(Path.of(args[0]), Path.of(args[1]));
    }
}
