package org.chirocore.check;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;


/**
 * A certificate file read into plain values, with its structure and sizes checked (check 1 of the
 * spec) but nothing mathematical yet: sets are kept as the integer arrays written in the file so
 * that later checks can name them.
 *
 * @param drat the inline DRAT proof, when given
 * @param lrat the inline LRAT proof (hints included), when given
 * @param proofFile the proof in a file beside the certificate, when given; exactly one of the three is present
 * @param provenance the provenance object, whose inside is checked by the provenance check
 */
record ParsedCertificate(String sha256, JsonTree.Obj content, int rank, List<String> labels, List<int[]> bases,
        List<int[]> normalised, List<Relation> relations, Optional<String> drat, Optional<String> lrat,
        Optional<ProofFile> proofFile, List<Witness> witnesses, JsonTree.Obj provenance) {

    /** A listed relation [[x...], a, b, c, d]. */
    record Relation(int[] x, int a, int b, int c, int d) {
        @Override
        public String toString() {
            return "[" + java.util.Arrays.toString(x) + ", " + a + ", " + b + ", " + c + ", " + d + "]";
        }
    }

    /**
     * A proof in a file beside the certificate, named by {@code dratFile} or {@code lratFile}, with
     * the SHA-256 of its uncompressed bytes from {@code dratSha256} or {@code lratSha256}.
     */
    record ProofFile(String name, boolean lrat, String sha256) {
        /** The member that names the file, for messages. */
        String member() {
            return lrat ? "lratFile" : "dratFile";
        }
    }

    /**
     * One minimality entry: the element's label and the witnesses of core\e and core/e, each a
     * sign string or an object naming its kind (checked by the minimality check).
     */
    record Witness(String element, JsonTree.Value deletion, JsonTree.Value contraction) {
    }

    /**
     * Reads a parsed certificate.
     *
     * @throws JsonTree.Mistyped naming the first member of the wrong type, missing, unknown or too large
     */
    static ParsedCertificate read(JsonTree.Value json) {
        JsonTree.Obj top = json.asObject("the certificate");
        top.requireOnly(List.of("format", "version", "tool", "sha256", "content", "run"));
        if (!top.requireString("format").equals("chirocore-certificate")) {
            throw new JsonTree.Mistyped("field \"format\" must be \"chirocore-certificate\", found \"" + top.requireString("format") + "\"");
        }
        int version = top.requireInt("version");
        if (version != 1) {
            throw new JsonTree.Mistyped("unknown version " + version + "; this verifier reads version 1");
        }
        String sha256 = top.requireString("sha256");
        JsonTree.Obj content = top.requireObject("content");
        content.requireOnly(List.of("statement", "core", "provenance", "nonOrientability", "minimality"));
        if (!content.requireString("statement").equals("minor-minimal non-orientable")) {
            throw new JsonTree.Mistyped("content.statement must be \"minor-minimal non-orientable\"");
        }
        JsonTree.Obj core = content.requireObject("core");
        core.requireOnly(List.of("rank", "labels", "bases"));
        List<String> labels = labels(core.requireArray("labels"));
        int rank = core.requireInt("rank");
        if (rank < 0 || rank > labels.size()) {
            throw new JsonTree.Mistyped("core.rank must be between 0 and the number of labels " + labels.size() + ", found " + rank);
        }
        List<int[]> bases = sets(core.requireArray("bases"), "core.bases", VerifierLimits.MAX_BASES);
        JsonTree.Obj non = content.requireObject("nonOrientability");
        non.requireOnly(List.of("normalised", "relations", "drat", "lrat", "dratFile", "dratSha256", "lratFile", "lratSha256"));
        List<int[]> normalised = sets(non.requireArray("normalised"), "nonOrientability.normalised", VerifierLimits.MAX_ELEMENTS + 1);
        List<Relation> relations = relations(non.requireArray("relations"));
        Optional<String> drat = non.find("drat").map(d -> d.asString("nonOrientability.drat"));
        Optional<String> lrat = non.find("lrat").map(d -> d.asString("nonOrientability.lrat"));
        Optional<ProofFile> proofFile = Optional.empty();
        for (String kind : List.of("drat", "lrat")) {
            String file = kind + "File";
            String hash = kind + "Sha256";
            if (non.has(file) != non.has(hash)) {
                throw new JsonTree.Mistyped("nonOrientability has \"" + (non.has(file) ? file : hash) + "\" without \""
                        + (non.has(file) ? hash : file) + "\"; a proof file needs both its name and the hash of its uncompressed bytes");
            }
            if (non.has(file)) {
                proofFile = Optional.of(new ProofFile(non.requireString(file), kind.equals("lrat"), non.requireString(hash)));
            }
        }
        int proofs = (drat.isPresent() ? 1 : 0) + (lrat.isPresent() ? 1 : 0) + (non.has("dratFile") ? 1 : 0) + (non.has("lratFile") ? 1 : 0);
        if (proofs != 1) {
            throw new JsonTree.Mistyped("nonOrientability must have exactly one of \"drat\", \"lrat\", \"dratFile\" (with \"dratSha256\") "
                    + "and \"lratFile\" (with \"lratSha256\"), found " + proofs);
        }
        return new ParsedCertificate(sha256, content, rank, labels, bases, normalised, relations, drat, lrat, proofFile,
                witnesses(content.requireArray("minimality"), labels.size()), content.requireObject("provenance"));
    }

    private static List<String> labels(JsonTree.Arr array) {
        if (array.size() > VerifierLimits.MAX_ELEMENTS) {
            throw new JsonTree.Mistyped("core.labels has " + array.size() + " elements; at most " + VerifierLimits.MAX_ELEMENTS + " are allowed");
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String label = array.get(i).asString("core.labels[" + i + "]");
            if (label.isEmpty() || label.length() > VerifierLimits.MAX_LABEL) {
                throw new JsonTree.Mistyped("core.labels[" + i + "] must have 1 to " + VerifierLimits.MAX_LABEL + " characters");
            }
            out.add(label);
        }
        if (new HashSet<>(out).size() != out.size()) {
            throw new JsonTree.Mistyped("core.labels are not distinct");
        }
        return List.copyOf(out);
    }

    /** An array of at most {@code max} arrays of at most {@link VerifierLimits#MAX_ELEMENTS} ints each. */
    static List<int[]> sets(JsonTree.Arr array, String what, int max) {
        if (array.size() > max) {
            throw new JsonTree.Mistyped(what + " has " + array.size() + " entries; at most " + max + " are allowed");
        }
        List<int[]> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            out.add(ints(array.get(i).asArray(what + "[" + i + "]"), what + "[" + i + "]"));
        }
        return out;
    }

    /** An array of at most 64 ints. */
    static int[] ints(JsonTree.Arr array, String what) {
        if (array.size() > VerifierLimits.MAX_ELEMENTS) {
            throw new JsonTree.Mistyped(what + " has " + array.size() + " entries; at most " + VerifierLimits.MAX_ELEMENTS + " are allowed");
        }
        int[] out = new int[array.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = array.get(i).asInt(what + "[" + i + "]");
        }
        return out;
    }

    static List<Relation> relations(JsonTree.Arr array) {
        if (array.size() > VerifierLimits.MAX_RELATIONS) {
            throw new JsonTree.Mistyped("nonOrientability.relations has " + array.size() + " entries; at most " + VerifierLimits.MAX_RELATIONS + " are allowed");
        }
        List<Relation> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String what = "nonOrientability.relations[" + i + "]";
            JsonTree.Arr r = array.get(i).asArray(what);
            if (r.size() != 5) {
                throw new JsonTree.Mistyped(what + " must be [[x...], a, b, c, d], found " + r.size() + " entries");
            }
            out.add(new Relation(ints(r.get(0).asArray(what + "[0]"), what + "[0]"), r.get(1).asInt(what + "[1]"),
                    r.get(2).asInt(what + "[2]"), r.get(3).asInt(what + "[3]"), r.get(4).asInt(what + "[4]")));
        }
        return out;
    }

    private static List<Witness> witnesses(JsonTree.Arr array, int elements) {
        if (array.size() != elements) {
            throw new JsonTree.Mistyped("content.minimality has " + array.size() + " entries; it needs one per core element, " + elements);
        }
        List<Witness> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String what = "content.minimality[" + i + "]";
            JsonTree.Obj w = array.get(i).asObject(what);
            w.requireOnly(List.of("element", "deletion", "contraction"));
            out.add(new Witness(w.require("element").asString(what + ".element"), witness(w, "deletion", what),
                    witness(w, "contraction", what)));
        }
        return out;
    }

    /** A witness member: a sign string or an object. */
    private static JsonTree.Value witness(JsonTree.Obj entry, String name, String what) {
        JsonTree.Value v = entry.require(name);
        if (!(v instanceof JsonTree.Str) && !(v instanceof JsonTree.Obj)) {
            throw new JsonTree.Mistyped(what + "." + name + " must be a sign string or an object, found " + v.kind());
        }
        return v;
    }
}
