package org.chirocore.sweep;

import org.chirocore.io.Json;

/**
 * The sweep's answer for one matroid of a pair (the pulled cube, or the pulled cube with O
 * contracted): non-orientable with a verified certificate, orientable with a checked witness
 * (a discovery), or no answer.
 */
public sealed interface Verdict {

    /** How sweep.json and sweep.md state it. */
    String text();

    /** The file backing the verdict, if any. */
    String file();

    /** The member of sweep.json describing it. */
    default Json.Obj toJson() {
        Json.Obj.Builder b = Json.Obj.builder().put("verdict", text());
        if (this instanceof NonOrientable) {
            b.put("certificate", file());
        } else if (this instanceof Orientable) {
            b.put("witness", file());
        }
        return b.build();
    }

    /**
     * Reads a verdict written by {@link #toJson}.
     *
     * @throws IllegalArgumentException when the member is not one
     */
    static Verdict fromJson(Json.Obj o) {
        String text = o.requireString("verdict");
        if (text.equals(NonOrientable.TEXT)) {
            return new NonOrientable(o.requireString("certificate"));
        }
        if (text.equals(Orientable.TEXT)) {
            return new Orientable(o.requireString("witness"));
        }
        if (text.startsWith(Unknown.PREFIX)) {
            return new Unknown(text.substring(Unknown.PREFIX.length()));
        }
        throw new IllegalArgumentException("\"" + text + "\" is not a verdict.");
    }

    /**
     * Not orientable: the certificate, whose path starts from this very matroid, was written and
     * passed the independent verifier.
     *
     * @param certificate its file name in the n's directory
     */
    record NonOrientable(String certificate) implements Verdict {
        static final String TEXT = "non-orientable";

        @Override
        public String text() {
            return TEXT;
        }

        @Override
        public String file() {
            return certificate;
        }
    }

    /**
     * ORIENTABLE: a chirotope whose support is exactly the bases and which satisfies every 3-term
     * Grassmann–Plücker relation was found and re-checked. The sweep has found none for n = 3..7;
     * one would be a new orientable cube, so it is reported loudly.
     *
     * @param witness the witness's file name in the n's directory
     */
    record Orientable(String witness) implements Verdict {
        static final String TEXT = "ORIENTABLE";

        @Override
        public String text() {
            return TEXT;
        }

        @Override
        public String file() {
            return witness;
        }
    }

    /**
     * No answer: a budget ran out. Nothing is claimed.
     *
     * @param reason why
     */
    record Unknown(String reason) implements Verdict {
        static final String PREFIX = "unknown: ";

        @Override
        public String text() {
            return PREFIX + reason;
        }

        @Override
        public String file() {
            return "";
        }
    }
}
