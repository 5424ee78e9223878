package org.chirocore.report;

/**
 * A report that cannot be written: the certificate does not verify, or a file is not a
 * certificate or family table. The message is a full sentence naming the file.
 */
public final class ReportException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** A report refused for the reason in {@code message}. */
    public ReportException(String message, Throwable cause) {
        super(message, cause);
    }
}
