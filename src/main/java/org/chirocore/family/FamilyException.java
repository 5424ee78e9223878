package org.chirocore.family;

/**
 * A family definition that cannot be read, or that fails at some cube dimension. The message is
 * a full sentence that starts with the definition file's name and names the member and the n at
 * which it fails, e.g. {@code families/x.json: hyperplane at n = 7: ...}.
 */
public final class FamilyException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public FamilyException(String message) {
        super(message);
    }

    public FamilyException(String message, Throwable cause) {
        super(message, cause);
    }
}
