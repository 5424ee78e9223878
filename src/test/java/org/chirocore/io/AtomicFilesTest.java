package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void createsAndReplacesWithoutLeavingTemporaries(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out.json");
        AtomicFiles.writeString(target, "first");
        AtomicFiles.writeJson(target, Json.parse("{\"é\": [1, 2]}"));
        assertEquals("{\n  \"é\": [1, 2]\n}\n", Files.readString(target, StandardCharsets.UTF_8));
        assertEquals(List.of("out.json"), names(dir));
    }

    @Test
    void failedMoveDeletesTheTemporary(@TempDir Path dir) throws IOException {
        // A non-empty directory cannot be replaced by a file, so the final rename fails.
        Path target = dir.resolve("busy");
        Files.createDirectory(target);
        Files.writeString(target.resolve("keep"), "x");
        assertThrows(IOException.class, () -> AtomicFiles.writeString(target, "new"));
        assertEquals(List.of("busy"), names(dir));
        assertEquals("x", Files.readString(target.resolve("keep")));
    }

    @Test
    void missingDirectoryIsAnError(@TempDir Path dir) {
        assertThrows(IOException.class, () -> AtomicFiles.writeString(dir.resolve("no/such/out.json"), "x"));
    }
}
