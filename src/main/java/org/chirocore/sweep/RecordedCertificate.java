package org.chirocore.sweep;

import java.io.IOException;
import java.nio.file.Path;

import org.chirocore.cert.CertificateReader;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;

/**
 * What a sweep needs from a certificate file it wrote earlier, read back after the format,
 * version and digest check of {@link CertificateReader#readChecked}: the construction it records,
 * the search's seed and strategy, and the core.
 *
 * @param construction the {@code provenance.construction} member
 * @param seed the search's seed recorded in {@code run.search}
 * @param strategy the search's strategy recorded in {@code run.search}
 * @param core the core
 */
record RecordedCertificate(Json.Obj construction, long seed, String strategy, ExplicitMatroid core) {

    /**
     * Reads {@code file}.
     *
     * @throws IOException when it cannot be read
     * @throws IllegalArgumentException when it is not a certificate of a searched construction
     *     (format, version or digest wrong, a member missing or of the wrong type)
     */
    static RecordedCertificate read(Path file) throws IOException {
        Json.Obj doc = CertificateReader.readChecked(file);
        Json.Obj content = doc.requireObject("content");
        Json.Obj search = doc.requireObject("run").requireObject("search");
        return new RecordedCertificate(content.requireObject("provenance").requireObject("construction"),
                search.requireLong("seed"), search.requireString("strategy"),
                CertificateReader.core(content.requireObject("core")));
    }
}
