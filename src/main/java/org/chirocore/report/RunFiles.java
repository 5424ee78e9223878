package org.chirocore.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.chirocore.io.InputFiles;
import org.chirocore.io.Json;

/** Reading a run directory's record and listing its certificates, for the {@link RunKind}s. */
final class RunFiles {
    private RunFiles() {
    }

    /**
     * The JSON object in {@code file}.
     *
     * @throws ReportException naming the file when it cannot be read or is not an object
     */
    static Json.Obj object(Path file, String what) {
        try {
            return Json.parseUtf8(InputFiles.read(file)).asObject(what);
        } catch (IOException | IllegalArgumentException e) {
            throw new ReportException(file + ": cannot be read as " + what + ": " + e.getMessage(), e);
        }
    }

    /** The files in {@code dir} whose names end with {@code suffix}, by the number after "n=" then by name. */
    static List<Path> withSuffix(Path dir, String suffix) {
        try (Stream<Path> files = Files.list(dir)) {
            return files.filter(p -> p.getFileName().toString().endsWith(suffix))
                    .sorted(Comparator.comparingLong(RunFiles::n).thenComparing(p -> p.getFileName().toString())).toList();
        } catch (IOException e) {
            throw new ReportException(dir + ": cannot be listed: " + e.getMessage(), e);
        }
    }

    /** K in a file name "n=K..." (−1 for another name). */
    static long n(Path file) {
        String name = file.getFileName().toString();
        int end = 2;
        while (end < name.length() && Character.isDigit(name.charAt(end))) {
            end++;
        }
        return name.startsWith("n=") && end > 2 && end <= 20 ? Long.parseLong(name.substring(2, end)) : -1;
    }

    /** The command that re-checks every certificate of a run, with the directory shown relative. */
    static Document.Code verifyCommand(Path dir, String pattern) {
        return new Document.Code("java -jar chirocore.jar verify " + RelativePaths.shown(dir.resolve(pattern)));
    }
}
