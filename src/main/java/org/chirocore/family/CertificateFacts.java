package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

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
     *     construction (a member missing or of the wrong type, invalid bases)
     */
    static CertificateFacts read(Path file) throws IOException {
        Json.Obj doc = Json.parseUtf8(Files.readAllBytes(file)).asObject("the certificate");
        Json.Obj content = doc.requireObject("content");
        Json.Obj core = content.requireObject("core");
        List<String> labels = new ArrayList<>();
        Json.Arr labelArray = core.requireArray("labels");
        for (int k = 0; k < labelArray.size(); k++) {
            labels.add(labelArray.get(k).asString("core.labels[" + k + "]"));
        }
        List<int[]> bases = new ArrayList<>();
        Json.Arr basisArray = core.requireArray("bases");
        for (int k = 0; k < basisArray.size(); k++) {
            Json.Arr b = basisArray.get(k).asArray("core.bases[" + k + "]");
            int[] basis = new int[b.size()];
            for (int j = 0; j < basis.length; j++) {
                basis[j] = b.get(j).asInt("core.bases[" + k + "][" + j + "]");
            }
            bases.add(basis);
        }
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
                ExplicitMatroid.fromBases(labels, core.requireInt("rank"), bases),
                content.requireObject("provenance").requireObject("construction"), search,
                refutation.requireInt("relations"), refutation.requireLong("lemmas"),
                refutation.requireLong("dratBytes"), found.requireLong("millis"), refutation.requireLong("millis"));
    }
}
