package org.chirocore.search;

import org.chirocore.orient.Chirotope;

/** The outcome of a reduction: a minimal core, a proof that the input is orientable, or no answer. */
public sealed interface SearchResult {

    /** A minor-minimal non-orientable minor with its minimality witnesses. */
    record Found(MinimalCore core) implements SearchResult {
    }

    /** The input itself is orientable; nothing to reduce. */
    record Orientable(Chirotope witness) implements SearchResult {
    }

    /** A budget ran out before an answer; nothing is claimed. */
    record Unknown(String reason) implements SearchResult {
    }
}
