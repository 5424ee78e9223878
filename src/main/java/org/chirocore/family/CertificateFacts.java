package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.chirocore.cert.CertificateReader;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;

/**
 * What a family table reports about one written certificate, read back from the file, so that a
 * member computed now and one reused from an earlier run are tabulated the same way.
 *
 * @param sha256 the content digest
 * @param core the core
 * @param construction the {@code provenance.construction} member
 * @param search the seed and strategy recorded in {@code run}, empty for a predicted core
 * @param relations the number of 3-term relations of the proof
 * @param lemmas the DRAT lemmas
 * @param dratBytes the size of the DRAT proof
 * @param searchMillis the wall-clock time of finding the core (the reduction's, or the check of
 *     a predicted core), as recorded when it was written
 * @param refutationMillis the proof-logging refutation's wall-clock time, as recorded
 */
public record CertificateFacts(String sha256, ExplicitMatroid core, Json.Obj construction, Optional<Search> search,
        int relations, long lemmas, long dratBytes, long searchMillis, long refutationMillis) {

    /**
     * The search that found a core, as recorded.
     *
     * @param seed its seed
     * @param strategy its strategy's name
     */
    public record Search(long seed, String strategy) {
    }

    /**
     * Reads the facts of the certificate in {@code file}.
     *
     * @throws IOException when the file cannot be read
     * @throws IllegalArgumentException when it is not a certificate written by this tool for a
     *     construction (format, version or digest wrong, a member missing or of the wrong type,
     *     invalid bases)
     */
    static CertificateFacts read(Path file) throws IOException {
        Json.Obj doc = CertificateReader.readChecked(file);
        Json.Obj content = doc.requireObject("content");
        Json.Obj run = doc.requireObject("run");
        Json.Obj refutation = run.requireObject("refutation");
        Optional<Search> search = Optional.empty();
        Json.Obj found;
        if (run.has("search")) {
            found = run.requireObject("search");
            search = Optional.of(new Search(found.requireLong("seed"), found.requireString("strategy")));
        } else {
            found = run.requireObject("prediction");
        }
        return new CertificateFacts(doc.requireString("sha256"),
                CertificateReader.core(content.requireObject("core")),
                content.requireObject("provenance").requireObject("construction"), search,
                refutation.requireInt("relations"), refutation.requireLong("lemmas"),
                refutation.requireLong("dratBytes"), found.requireLong("millis"), refutation.requireLong("millis"));
    }
}
