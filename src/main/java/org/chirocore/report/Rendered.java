package org.chirocore.report;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

/**
 * A rendered report: the main file's text and the files to write beside it (file name to text),
 * such as the SVG pictures a Markdown report links to.
 *
 * @param text the main file's text
 * @param sideFiles file name to text, in name order
 */
public record Rendered(String text, Map<String, String> sideFiles) {
    public Rendered {
        sideFiles = Collections.unmodifiableMap(new TreeMap<>(sideFiles));
    }
}
