package org.chirocore.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.chirocore.io.AtomicFiles;

/** Writes a rendered report and its side files, each atomically. */
public final class ReportWriter {
    private ReportWriter() {
    }

    /**
     * Renders {@code doc} in {@code format} to {@code out}, side files (pictures of a Markdown
     * report) beside it, named after {@code out} without its extension.
     *
     * @return the files written, {@code out} first
     * @throws IOException when a file cannot be written
     */
    public static List<Path> write(Document doc, ReportFormat format, Path out) throws IOException {
        String name = out.getFileName().toString();
        int dot = name.lastIndexOf('.');
        Rendered rendered = format.render(doc, dot > 0 ? name.substring(0, dot) : name);
        List<Path> written = new ArrayList<>();
        AtomicFiles.writeString(out, rendered.text());
        written.add(out);
        for (Map.Entry<String, String> f : rendered.sideFiles().entrySet()) {
            Path side = out.resolveSibling(f.getKey());
            AtomicFiles.writeString(side, f.getValue());
            written.add(side);
        }
        return written;
    }
}
