package org.chirocore.orient;

import org.chirocore.matroid.Matroid;

/** Decides whether a matroid is orientable: one problem, one interface. */
public interface OrientabilityDecider {
    /**
     * Decides orientability of {@code m}.
     *
     * @return orientable with a checked witness, non-orientable, or unknown when the budget ran out
     */
    Orientability decide(Matroid m);
}
