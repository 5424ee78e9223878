package org.chirocore.search;

/** A single-element minor operation. */
public enum Operation {
    /** M \ e. */
    DELETION,
    /** M / e. */
    CONTRACTION
}
