package org.chirocore.report;

import java.nio.file.Path;

/**
 * How a report writes a file's path: relative, so that no absolute path of the author's machine
 * ends up in a paper. A path below the working directory is written relative to it; any other
 * absolute path by its file name alone (the referee has the file beside the report).
 */
final class RelativePaths {
    private RelativePaths() {
    }

    /** {@code path} as a report shows it. */
    static String shown(Path path) {
        if (!path.isAbsolute()) {
            return path.normalize().toString();
        }
        Path cwd = Path.of("").toAbsolutePath().normalize();
        Path p = path.normalize();
        return p.startsWith(cwd) ? cwd.relativize(p).toString() : String.valueOf(p.getFileName());
    }
}
