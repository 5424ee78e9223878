package org.chirocore.search;

import org.chirocore.matroid.Matroid;

/** Reduces a matroid to a minor-minimal non-orientable minor: one problem, one interface. */
public interface CoreSearch {
    /**
     * Reduces {@code m}.
     *
     * @return a minimal core with its witnesses, a witness that {@code m} is orientable, or unknown
     */
    SearchResult reduce(Matroid m);
}
