package org.chirocore.orient;

import org.chirocore.matroid.TooLargeException;

/**
 * A matroid is too large for a computation that enumerates its r-subsets: the message states the
 * number of subsets and the declared limit. Callers report it as an input beyond the tool's
 * limits, not as a bug.
 */
public final class EnumerationLimitException extends TooLargeException {
    private static final long serialVersionUID = 1L;

    EnumerationLimitException(String message) {
        super(message);
    }
}
