package org.chirocore.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.List;
import java.util.Map;

/**
 * Plain-word descriptions of file errors for messages to people: what went wrong ("permission
 * denied", "no such file or directory", "no space left on device"), without Java exception
 * class names and without the names of temporary files, which mean nothing to the reader.
 */
public final class IoMessages {
    /** Words for the exceptions whose reason is often missing, the general file-system failure last. */
    private static final List<Map.Entry<Class<? extends IOException>, String>> KINDS = List.of(
            Map.entry(NoSuchFileException.class, "no such file or directory"),
            Map.entry(AccessDeniedException.class, "permission denied"),
            Map.entry(FileAlreadyExistsException.class, "the file already exists"),
            Map.entry(DirectoryNotEmptyException.class, "it is a directory that is not empty"),
            Map.entry(NotDirectoryException.class, "not a directory"),
            Map.entry(FileSystemException.class, "the file system refused it"));

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
        for (Map.Entry<Class<? extends IOException>, String> kind : KINDS) {
            if (kind.getKey().isInstance(e)) {
                return kind.getValue();
            }
        }
        String message = e.getMessage();
        return message == null || message.isBlank() ? "input or output failed" : message;
    }
}
