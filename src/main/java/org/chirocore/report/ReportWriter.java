package org.chirocore.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.OutputCheck;

/**
 * Writes rendered reports and their side files, each atomically. Every file is rendered and
 * checked before the first one is written, so that a refusal (a picture's name already taken)
 * leaves nothing half-written.
 */
public final class ReportWriter {
    private ReportWriter() {
    }

    /**
     * Renders {@code doc} in {@code format} to {@code out}, side files (pictures of a Markdown
     * report) beside it, named after {@code out} without its extension.
     *
     * @param overwrite whether existing files may be replaced
     * @return the files written, {@code out} first
     * @throws org.chirocore.io.OutputRefusedException before anything is written, naming a file that
     *     exists (without {@code overwrite}) or cannot be written
     * @throws IOException when a file cannot be written
     */
    public static List<Path> write(Document doc, ReportFormat format, Path out, boolean overwrite) throws IOException {
        return write(render(doc, format, out), overwrite);
    }

    /**
     * The files of {@code doc} rendered in {@code format} for {@code out}: {@code out} first, then
     * its side files beside it, named after {@code out} without its extension.
     */
    static Map<Path, String> render(Document doc, ReportFormat format, Path out) {
        String name = out.getFileName().toString();
        int dot = name.lastIndexOf('.');
        Rendered rendered = format.render(doc, dot > 0 ? name.substring(0, dot) : name);
        Map<Path, String> files = new LinkedHashMap<>();
        files.put(out, rendered.text());
        rendered.sideFiles().forEach((side, text) -> files.put(out.resolveSibling(side), text));
        return files;
    }

    /**
     * Writes {@code files} (path to text) after checking all of them.
     *
     * @param overwrite whether existing files may be replaced
     * @return the files written, in the map's order
     * @throws org.chirocore.io.OutputRefusedException before anything is written, naming a file that
     *     exists (without {@code overwrite}) or cannot be written
     * @throws IOException when a file cannot be written
     */
    static List<Path> write(Map<Path, String> files, boolean overwrite) throws IOException {
        for (Path file : files.keySet()) {
            OutputCheck.file(file, List.of(), overwrite);
        }
        List<Path> written = new ArrayList<>();
        for (Map.Entry<Path, String> f : files.entrySet()) {
            AtomicFiles.writeString(f.getKey(), f.getValue());
            written.add(f.getKey());
        }
        return written;
    }
}
