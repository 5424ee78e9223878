package org.chirocore.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/**
 * Plain-word descriptions of file errors for messages to people: what went wrong ("permission
 * denied", "no such file or directory", "no space left on device"), without Java exception
 * class names and without the names of temporary files, which mean nothing to the reader.
 */
public final class IoMessages {
    private IoMessages() {
    }

    /** What went wrong in {@code e}, in plain words, for a message that already names the file. */
    public static String plain(IOException e) {
        String reason = null;
        if (e instanceof FileSystemException f) {
            reason = f.getReason();
        }
        if (reason == null || reason.isBlank()) {
            reason = kind(e);
        }
        return reason;
    }

    private static String kind(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileAlreadyExistsException) {
            return "the file already exists";
        }
        if (e instanceof DirectoryNotEmptyException) {
            return "it is a directory that is not empty";
        }
        if (e instanceof NotDirectoryException) {
            return "not a directory";
        }
        if (e instanceof FileSystemException) {
            return "the file system refused it";
        }
        String message = e.getMessage();
        return message == null || message.isBlank() ? "input or output failed" : message;
    }
}
