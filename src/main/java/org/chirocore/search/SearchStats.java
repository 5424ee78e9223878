package org.chirocore.search;

/**
 * Figures of one reduction.
 *
 * @param decisions orientability decisions and restricted solves made
 * @param grownTo size of the non-orientable restriction grown before minimising (the input's
 *     size when no growth was needed)
 * @param millis wall-clock time
 */
public record SearchStats(int decisions, int grownTo, long millis) {
}
