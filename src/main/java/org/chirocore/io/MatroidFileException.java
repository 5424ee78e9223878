package org.chirocore.io;

/**
 * A matroid file could not be read: it is unreadable, not JSON, not in the matroid format, or
 * its data do not form a matroid. The message starts with the source (the path as given) and
 * names the offending item, e.g. {@code f7.json: bases[3] names element 9, but there are only 7
 * elements (0..6)}.
 */
public final class MatroidFileException extends Exception {
    private static final long serialVersionUID = 1L;

    private final String source;
    private final String detail;

    /**
     * @param source the file path as given, or a name for text read from elsewhere
     * @param detail what is wrong, without the source prefix
     */
    public MatroidFileException(String source, String detail, Throwable cause) {
        super(source + ": " + detail, cause);
        this.source = source;
        this.detail = detail;
    }

    /** The file path as given, or the name passed with text. */
    public String source() {
        return source;
    }

    /** The message without the source prefix. */
    public String detail() {
        return detail;
    }
}
