package org.chirocore.io;

/**
 * Thrown when text is not valid JSON (RFC 8259) or exceeds a parser limit. The message has the
 * form {@code "line 3, column 14: expected ',' or ']' but found '}'"}; lines and columns count
 * from 1, columns in Unicode code points.
 */
public final class JsonFormatException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final int line;
    private final int column;
    private final String detail;

    /**
     * @param line 1-based line of the offending character
     * @param column 1-based column of the offending character
     * @param detail what was expected and what was found, without the position
     */
    public JsonFormatException(int line, int column, String detail) {
        super("line " + line + ", column " + column + ": " + detail);
        this.line = line;
        this.column = column;
        this.detail = detail;
    }

    /** The 1-based line of the offending character. */
    public int line() {
        return line;
    }

    /** The 1-based column (in code points) of the offending character. */
    public int column() {
        return column;
    }

    /** The message without the position prefix. */
    public String detail() {
        return detail;
    }
}
