package org.chirocore.search;

/** Receives progress of a long reduction (stage, elements and rank of the current minor, decisions so far). */
@FunctionalInterface
public interface Progress {
    /** A listener that ignores everything. */
    Progress SILENT = (stage, elements, rank, decisions) -> { };

    void report(String stage, int elements, int rank, int decisions);
}
