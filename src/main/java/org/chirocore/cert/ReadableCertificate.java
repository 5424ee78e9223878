package org.chirocore.cert;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import org.chirocore.io.Json;
import org.chirocore.io.JsonValueException;
import org.chirocore.proof.HumanProof;
import org.chirocore.proof.ReadableProof;

/**
 * A certificate's non-orientability claim explained as a {@link ReadableProof}, and the
 * certificate variant whose proof is that readable one: its {@code nonOrientability} lists
 * exactly the relations the proof uses and its {@code drat} is the proof's lemma sequence, and
 * its digest is recomputed, so {@code chirocore verify} checks the readable proof mechanically.
 * The rest of the content (core, provenance, minimality) is kept. Cost: one {@link HumanProof}
 * derivation on the certificate's core.
 */
public final class ReadableCertificate {
    private ReadableCertificate() {
    }

    /** The result of {@link #explain}. */
    public sealed interface Explanation {
    }

    /**
     * A readable proof.
     *
     * @param proof the proof
     * @param text its numbered text
     * @param certificate the certificate variant carrying it
     */
    public record Readable(ReadableProof proof, String text, Json.Obj certificate) implements Explanation {
    }

    /** No readable proof within the step limit. */
    public record Unreadable(HumanProof.TooLarge reason) implements Explanation {
    }

    /**
     * Explains the certificate in {@code file} with a proof of at most {@code maxSteps} steps.
     * The certificate is only read here (format, version, digest, core, normalisation); check it
     * with the independent verifier first.
     *
     * @throws IOException when the file cannot be read
     * @throws JsonValueException when it is not a certificate of this format or its digest is wrong
     * @throws IllegalArgumentException when its core or relations are malformed, the step limit is
     *     not positive, or the core turns out to be orientable
     */
    public static Explanation explain(Path file, int maxSteps) throws IOException {
        Json.Obj document = CertificateReader.readChecked(file);
        CertificateReader.Claim claim = CertificateReader.claim(document.requireObject("content"));
        HumanProof.Outcome outcome = new HumanProof(claim.index(), claim.normalised()).derive(maxSteps);
        if (outcome instanceof HumanProof.TooLarge t) {
            return new Unreadable(t);
        }
        ReadableProof proof = ((HumanProof.Derived) outcome).proof();
        return new Readable(proof, proof.text(claim.index()), variant(document, proof));
    }

    /**
     * {@code document} with its {@code nonOrientability} replaced by the relations and lemmas of
     * {@code proof} (the normalised bases kept), its digest recomputed, and a {@code run} section
     * describing the proof. The proof is not checked here: a wrong step gives a certificate that
     * the verifier rejects.
     */
    public static Json.Obj variant(Json.Obj document, ReadableProof proof) {
        Json.Obj content = document.requireObject("content");
        Json.Obj old = content.requireObject("nonOrientability");
        Json.Obj nonOrientability = Json.Obj.builder()
                .put("normalised", old.requireArray("normalised"))
                .put("relations", new Json.Arr(proof.relations().stream().<Json>map(CertificateWriter::relation).toList()))
                .put("drat", proof.drat())
                .build();
        Json.Obj newContent = replaced(content, "nonOrientability", nonOrientability);
        Json.Obj run = Json.Obj.builder()
                .put("readableProof", Json.Obj.builder()
                        .put("steps", proof.steps())
                        .put("relations", proof.relations().size())
                        .put("lemmas", proof.lemmas().size())
                        .build())
                .build();
        return replaced(replaced(replaced(document, "content", newContent), "sha256",
                new Json.Str(CertificateWriter.sha256(newContent))), "run", run);
    }

    /** {@code obj} with member {@code name} set to {@code value}, in its old place if it had one. */
    private static Json.Obj replaced(Json.Obj obj, String name, Json value) {
        Map<String, Json> members = new LinkedHashMap<>(obj.members());
        members.put(name, value);
        return new Json.Obj(members);
    }

}
