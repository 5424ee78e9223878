package org.chirocore.sweep;

import org.chirocore.io.Json;

/**
 * The sweep's optional search for a core of rank n per pair (deletions only from M'/O, the steered
 * search of {@code reduce --rank n}), and its budget. Recorded in sweep.json, so that a resumed run
 * and {@code sweep-merge} can tell sweeps made with other settings apart.
 *
 * @param millisPerPair wall-clock limit of the search for one pair, in milliseconds; 0 for none
 *     (a minor too large to enumerate then gets a single grown restriction)
 */
public record RankCoreSearch(long millisPerPair) {
    public RankCoreSearch {
        if (millisPerPair < 0) {
            throw new IllegalArgumentException("The per-pair time limit of the rank-n core search must not be "
                    + "negative, not " + millisPerPair + " ms.");
        }
    }

    /** The member {@code rankNCores} of sweep.json. */
    Json.Obj toJson() {
        return Json.Obj.builder().put("timeLimitMillis", millisPerPair).build();
    }

    /**
     * Reads a member written by {@link #toJson}.
     *
     * @throws IllegalArgumentException when the member is missing, of the wrong type or negative
     */
    static RankCoreSearch fromJson(Json.Obj o) {
        return new RankCoreSearch(o.requireLong("timeLimitMillis"));
    }

    /** In words, for messages: "120 s per pair" or "no time limit". */
    public String describe() {
        return millisPerPair == 0 ? "no time limit" : RankCore.seconds(millisPerPair) + " s per pair";
    }

    /**
     * Whether an unknown answer found under the limit {@code earlierMillis} stands for a new search
     * under this one: the same limit, or a time limit at least as long. (No limit is not more
     * generous than a limit: without one, a minor too large to enumerate gets one grown
     * restriction; with one, further ones while time remains.)
     */
    boolean coveredBy(long earlierMillis) {
        return earlierMillis == millisPerPair || (millisPerPair != 0 && earlierMillis >= millisPerPair);
    }
}
