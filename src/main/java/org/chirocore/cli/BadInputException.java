package org.chirocore.cli;

/**
 * Input that the library rejected (a file that cannot be read or is not a matroid, a
 * construction that cannot be built, an output file that cannot be written). {@link Chirocore}
 * prints the message as one line and exits with {@link ExitCodes#BAD_INPUT}, without a stack
 * trace: the message already names the file or item.
 */
final class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
