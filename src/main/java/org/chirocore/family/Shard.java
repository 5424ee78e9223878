package org.chirocore.family;

import java.util.ArrayList;
import java.util.List;

/**
 * Part {@code index} of {@code count} of a family run: the n of a range with n ≡ index (mod count).
 * Round-robin rather than contiguous blocks, so that the costly large n are spread over the parts.
 * Every n of a range lies in exactly one part, and the parts do not depend on the range.
 *
 * @param index the part, 0 ≤ index < count
 * @param count the number of parts, at least 1
 */
public record Shard(int index, int count) {
    /** The one part that is the whole range. */
    public static final Shard ALL = new Shard(0, 1);

    public Shard {
        if (count < 1 || index < 0 || index >= count) {
            throw new IllegalArgumentException("A shard i/k needs k >= 1 and 0 <= i < k, not " + index + "/" + count
                    + ".");
        }
    }

    /**
     * The shard written "i/k".
     *
     * @throws IllegalArgumentException naming the text when it is not of that form
     */
    public static Shard parse(String text) {
        String[] parts = text.trim().split("/", -1);
        if (parts.length == 2) {
            try {
                return new Shard(Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim()));
            } catch (NumberFormatException e) {
                // reported below
            }
        }
        throw new IllegalArgumentException("A shard is written i/k with integers 0 <= i < k, e.g. 0/3; got \"" + text
                + "\".");
    }

    /** The n of {@code from..to} in this part, in increasing order. */
    public List<Integer> select(int from, int to) {
        List<Integer> ns = new ArrayList<>();
        for (int n = from; n <= to; n++) {
            if (Math.floorMod(n, count) == index) {
                ns.add(n);
            }
        }
        return ns;
    }
}
