package org.chirocore.cert;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.chirocore.io.InputFiles;
import org.chirocore.io.Json;
import org.chirocore.io.JsonValueException;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.GpRelation;

/**
 * The producer side's one reader of certificate files (docs/certificate-format.md): the
 * document after its format, version and content digest are checked, the core, and the
 * non-orientability claim on the core's bases. Export, explain and the family facts read
 * certificates through here. It checks form only; whether a certificate is true is the
 * independent verifier's question ({@code org.chirocore.check}). Cost: linear in the file, plus
 * enumerating the core's r-subsets for the claim.
 */
public final class CertificateReader {
    private CertificateReader() {
    }

    /**
     * The non-orientability claim of a certificate's content, on the core's bases.
     *
     * @param index the core's bases as variables
     * @param normalised the variables of the normalised bases, in listed order
     * @param relations the listed relations, in order
     */
    public record Claim(BasisIndex index, List<Integer> normalised, List<GpRelation> relations) {
        public Claim {
            normalised = List.copyOf(normalised);
            relations = List.copyOf(relations);
        }
    }

    /**
     * The certificate document in {@code certificate}, after checking its format, version and digest.
     *
     * @throws IOException when the file cannot be read
     * @throws JsonValueException when it is not of this format or its digest does not match
     */
    public static Json.Obj readChecked(Path certificate) throws IOException {
        return parseChecked(InputFiles.read(certificate));
    }

    /**
     * The certificate document in {@code bytes} (UTF-8), after checking its format, version and digest.
     *
     * @throws JsonValueException when it is not of this format or its digest does not match
     */
    public static Json.Obj parseChecked(byte[] bytes) {
        Json.Obj doc = Json.parseUtf8(bytes).asObject("the certificate");
        if (!CertificateWriter.FORMAT.equals(doc.requireString("format"))
                || doc.requireInt("version") != CertificateWriter.VERSION) {
            throw new JsonValueException("the file is not a " + CertificateWriter.FORMAT + " of version "
                    + CertificateWriter.VERSION);
        }
        Json.Obj content = doc.requireObject("content");
        String digest = CertificateWriter.sha256(content);
        if (!digest.equals(doc.requireString("sha256"))) {
            throw new JsonValueException("field \"sha256\" is " + doc.requireString("sha256")
                    + ", but the content's digest is " + digest);
        }
        return doc;
    }

    /**
     * The claim of {@code content}.
     *
     * @throws JsonValueException when a member is missing or malformed, or a normalised set is no basis
     * @throws org.chirocore.matroid.InvalidMatroidException when the bases are not a matroid's
     * @throws IllegalArgumentException when a relation is malformed
     */
    public static Claim claim(Json.Obj content) {
        BasisIndex index = BasisIndex.of(core(content.requireObject("core")));
        Json.Obj proof = content.requireObject("nonOrientability");
        List<Integer> normalised = new ArrayList<>();
        Json.Arr normalisedBases = proof.requireArray("normalised");
        for (int i = 0; i < normalisedBases.size(); i++) {
            int v = index.variable(ElementSet.of(ints(normalisedBases.get(i), "normalised[" + i + "]")));
            if (v == 0) {
                throw new JsonValueException("normalised[" + i + "] is not a basis of the core");
            }
            normalised.add(v);
        }
        List<GpRelation> relations = new ArrayList<>();
        Json.Arr relationArray = proof.requireArray("relations");
        for (int i = 0; i < relationArray.size(); i++) {
            String where = "relations[" + i + "]";
            Json.Arr r = relationArray.get(i).asArray(where);
            if (r.size() != 5) {
                throw new JsonValueException(where + " must be [[X...], a, b, c, d]");
            }
            relations.add(new GpRelation(ElementSet.of(ints(r.get(0), where + "[0]")), r.get(1).asInt(where),
                    r.get(2).asInt(where), r.get(3).asInt(where), r.get(4).asInt(where)));
        }
        return new Claim(index, normalised, relations);
    }

    /**
     * The core of a certificate's content ({@code content.core}): labels, rank and bases.
     *
     * @throws JsonValueException when a member is missing or malformed
     * @throws org.chirocore.matroid.InvalidMatroidException when the bases are not a matroid's
     */
    public static ExplicitMatroid core(Json.Obj core) {
        Json.Arr labelArray = core.requireArray("labels");
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < labelArray.size(); i++) {
            labels.add(labelArray.get(i).asString("labels[" + i + "]"));
        }
        Json.Arr basisArray = core.requireArray("bases");
        List<int[]> bases = new ArrayList<>();
        for (int i = 0; i < basisArray.size(); i++) {
            bases.add(ints(basisArray.get(i), "bases[" + i + "]"));
        }
        return ExplicitMatroid.fromBases(labels, core.requireInt("rank"), bases);
    }

    private static int[] ints(Json json, String where) {
        Json.Arr a = json.asArray(where);
        int[] out = new int[a.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = a.get(i).asInt(where + "[" + i + "]");
            if (out[i] < 0 || out[i] >= 64) {
                throw new JsonValueException(where + "[" + i + "] must be an element index in 0..63, found " + out[i]);
            }
        }
        return out;
    }

}
