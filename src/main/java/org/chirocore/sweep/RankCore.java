package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.io.Json;

/**
 * The outcome of the search for a core of rank n of one pair's M'/O (the pulled n-cube with O
 * contracted, rank n): a minor-minimal non-orientable minor obtained by deletions only. Unlike
 * the pair's verdicts this is not a decision about M'/O: "unknown" only says that the per-pair
 * budget ran out, and no verdict is ever read from it.
 */
public sealed interface RankCore {

    /** How sweep.md and the progress lines state it. */
    String text();

    /** The member {@code rankNCore} of a pair in sweep.json. */
    Json.Obj toJson();

    /**
     * A core of rank n, certified from M'/O (deletions only) and passed by the independent verifier.
     *
     * @param elements its number of elements
     * @param rank its rank (n)
     * @param bases its number of bases
     * @param labels the cube vertices it keeps
     * @param name its catalogue name when it is isomorphic to a known matroid
     * @param certificate the certificate's file name in the n's directory
     */
    record Found(int elements, int rank, long bases, List<String> labels, Optional<String> name, String certificate)
            implements RankCore {
        static final String STATUS = "found";

        public Found {
            labels = List.copyOf(labels);
        }

        @Override
        public String text() {
            return elements + " elements, rank " + rank + ", " + bases + " bases" + name.map(x -> " (" + x + ")").orElse("");
        }

        @Override
        public Json.Obj toJson() {
            Json.Obj.Builder b = Json.Obj.builder().put("status", STATUS).put("elements", elements).put("rank", rank)
                    .put("bases", bases).put("labels", Json.Arr.ofStrings(labels));
            name.ifPresent(x -> b.put("name", x));
            return b.put("certificate", certificate).build();
        }
    }

    /**
     * No core of rank n exists: every minimal non-orientable restriction of M'/O was enumerated and
     * each has a non-orientable single-element contraction, or M'/O is orientable. Rests on the
     * producer's SAT answers; no certificate.
     *
     * @param enumerated what was enumerated, in words
     */
    record NoneExists(String enumerated) implements RankCore {
        static final String STATUS = "none exists";

        @Override
        public String text() {
            return "none exists (" + enumerated + ")";
        }

        @Override
        public Json.Obj toJson() {
            return Json.Obj.builder().put("status", STATUS).put("enumerated", enumerated).build();
        }
    }

    /**
     * The per-pair budget ran out, or part of M'/O was too large to enumerate; nothing is claimed.
     *
     * @param reason why, in words
     * @param millis the per-pair wall-clock limit the search ran under, 0 for none
     */
    record Unknown(String reason, long millis) implements RankCore {
        static final String STATUS = "unknown";

        @Override
        public String text() {
            return "unknown " + (millis == 0 ? "without a time limit" : "within " + seconds(millis) + " s") + ": "
                    + reason;
        }

        @Override
        public Json.Obj toJson() {
            return Json.Obj.builder().put("status", STATUS).put("reason", reason).put("timeLimitMillis", millis).build();
        }
    }

    /** Milliseconds as seconds, without a fraction when whole. */
    static String seconds(long millis) {
        return millis % 1000 == 0 ? Long.toString(millis / 1000) : Double.toString(millis / 1000.0);
    }

    /**
     * Reads a member written by {@link #toJson}.
     *
     * @throws IllegalArgumentException naming the member when it is missing or of the wrong type
     */
    static RankCore fromJson(Json.Obj o) {
        String status = o.requireString("status");
        switch (status) {
            case Found.STATUS -> {
                Json.Arr a = o.requireArray("labels");
                List<String> labels = new ArrayList<>();
                for (int i = 0; i < a.size(); i++) {
                    labels.add(a.get(i).asString("labels[" + i + "]"));
                }
                return new Found(o.requireInt("elements"), o.requireInt("rank"), o.requireLong("bases"), labels,
                        o.has("name") ? Optional.of(o.requireString("name")) : Optional.empty(),
                        o.requireString("certificate"));
            }
            case NoneExists.STATUS -> {
                return new NoneExists(o.requireString("enumerated"));
            }
            case Unknown.STATUS -> {
                return new Unknown(o.requireString("reason"), o.requireLong("timeLimitMillis"));
            }
            default -> throw new IllegalArgumentException("status \"" + status + "\" is none of \"" + Found.STATUS
                    + "\", \"" + NoneExists.STATUS + "\" and \"" + Unknown.STATUS + "\".");
        }
    }
}
