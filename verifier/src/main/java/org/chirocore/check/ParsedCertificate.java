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
 * @param drat the inline DRAT proof, or empty when {@code dratFile} or {@code lrat} is given
 * @param lrat the inline LRAT proof (hints included), when given instead of a DRAT proof
 * @param provenance the provenance object, whose inside is checked by the provenance check
 */
record ParsedCertificate(String sha256, JsonTree.Obj content, int rank, List<String> labels, List<int[]> bases,
        List<int[]> normalised, List<Relation> relations, Optional<String> drat, String dratFile, String dratSha256,
        Optional<String> lrat, List<Witness> witnesses, JsonTree.Obj provenance) {

    /** A listed relation [[x...], a, b, c, d]. */
    record Relation(int[] x, int a, int b, int c, int d) {
        @Override
        public String toString() {
            return "[" + java.util.Arrays.toString(x) + ", " + a + ", " + b + ", " + c + ", " + d + "]";
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
        non.requireOnly(List.of("normalised", "relations", "drat", "dratFile", "dratSha256", "lrat"));
        List<int[]> normalised = sets(non.requireArray("normalised"), "nonOrientability.normalised", VerifierLimits.MAX_ELEMENTS + 1);
        List<Relation> relations = relations(non.requireArray("relations"));
        Optional<String> drat = non.find("drat").map(d -> d.asString("nonOrientability.drat"));
        Optional<String> lrat = non.find("lrat").map(d -> d.asString("nonOrientability.lrat"));
        int proofs = (drat.isPresent() ? 1 : 0) + (non.has("dratFile") ? 1 : 0) + (lrat.isPresent() ? 1 : 0);
        if (proofs != 1 || non.has("dratFile") != non.has("dratSha256")) {
            throw new JsonTree.Mistyped("nonOrientability must have exactly one of \"drat\", \"lrat\", or both "
                    + "\"dratFile\" and \"dratSha256\"");
        }
        String dratFile = non.has("dratFile") ? non.requireString("dratFile") : "";
        String dratSha256 = non.has("dratFile") ? non.requireString("dratSha256") : "";
        return new ParsedCertificate(sha256, content, rank, labels, bases, normalised, relations, drat, dratFile, dratSha256, lrat,
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

    private static List<Relation> relations(JsonTree.Arr array) {
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
