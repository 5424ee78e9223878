package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Memory exhaustion is reported at the command line's boundary as one plain line with exit code 2. */
class OutOfMemoryTest {
    @Test
    void aHeapTooSmallForTheInputGivesAPlainMessage(@TempDir Path dir) throws IOException, InterruptedException {
        // U(4, 40): 91390 bases, within the limits, but far more than a 16 MB heap holds as explicit bases.
        Path file = dir.resolve("u440.json");
        Files.writeString(file, "{\"rank\":4,\"elements\":40,\"nonbases\":[]}");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx16m",
                "-cp", System.getProperty("java.class.path"), Main.class.getName(), "orient", file.toString())
                .redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        assertEquals(2, p.exitValue(), output);
        assertTrue(output.contains("out of memory while running 'orient " + file + "'"), output);
        assertFalse(output.contains("Exception") || output.contains("Error") || output.contains("\tat "), output);
    }
}
