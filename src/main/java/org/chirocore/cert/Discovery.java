package org.chirocore.cert;

import org.chirocore.search.SearchStats;
import org.chirocore.search.Strategy;

/**
 * How a certified core was found, for the certificate's unhashed {@code run} section: by a
 * seeded search, or as a predicted core checked directly. It never enters the hashed content.
 */
public sealed interface Discovery {

    /**
     * A reduction found the core.
     *
     * @param seed the seed of the element order
     * @param strategy the order of single-element minors tried
     * @param stats the search's figures
     */
    record Searched(long seed, Strategy strategy, SearchStats stats) implements Discovery {
    }

    /**
     * The core was named in advance (a prediction) and checked minimal directly: one decision of
     * the core and one per single-element minor, in element order.
     *
     * @param decisions the orientability decisions made
     * @param millis their wall-clock time
     */
    record Predicted(int decisions, long millis) implements Discovery {
    }
}
