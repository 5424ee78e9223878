package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
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

    @Test
    void leftoversOfDeadWritersAreSweptAndOthersKept(@TempDir Path dir) throws IOException, InterruptedException {
        Process finished = new ProcessBuilder(java(), "-version").redirectErrorStream(true).start();
        finished.getInputStream().readAllBytes();
        finished.waitFor();
        Path dead = dir.resolve(AtomicFiles.PREFIX + "a.json." + finished.pid() + ".x1" + AtomicFiles.SUFFIX);
        long live = ProcessHandle.current().parent().orElseThrow().pid();
        Path alive = dir.resolve(AtomicFiles.PREFIX + "a.json." + live + ".x2" + AtomicFiles.SUFFIX);
        Path foreign = dir.resolve(".a.json.tmp");
        for (Path p : List.of(dead, alive, foreign)) {
            Files.writeString(p, "partial");
        }
        AtomicFiles.writeString(dir.resolve("a.json"), "whole");
        assertEquals(List.of(foreign.getFileName().toString(), alive.getFileName().toString(), "a.json"), names(dir));
    }

    /** A writer stopped by SIGTERM (a cluster's time limit, Ctrl-C) leaves no temporary file behind. */
    @Test
    void stoppedWriterLeavesNoTemporary(@TempDir Path dir) throws IOException, InterruptedException {
        Path fifo = dir.resolve("pipe");
        Process mkfifo;
        try {
            mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).start();
        } catch (IOException e) {
            assumeTrue(false, "mkfifo is not available");
            return;
        }
        assumeTrue(mkfifo.waitFor() == 0, "mkfifo failed");
        Path out = dir.resolve("out");
        Files.createDirectory(out);
        Process writer = new ProcessBuilder(java(), "-cp", System.getProperty("java.class.path"),
                BlockedWriter.class.getName(), fifo.toString(), out.resolve("cert.json").toString())
                .redirectErrorStream(true).start();
        long deadline = System.nanoTime() + 30_000_000_000L;
        while (names(out).isEmpty() && System.nanoTime() < deadline) {
            Thread.sleep(50);
        }
        assertEquals(1, names(out).size(), "the writer has its temporary file open");
        writer.destroy();
        assertTrue(writer.waitFor(30, TimeUnit.SECONDS));
        assertEquals(List.of(), names(out));
    }

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }
}
