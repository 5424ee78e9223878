package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Bounded reading of input files and of decompressed streams. */
class InputFilesTest {
    @TempDir
    Path dir;

    @Test
    void aRegularFileIsReadWhole() throws IOException {
        Path f = Files.write(dir.resolve("a.json"), new byte[] {1, 2, 3});
        assertArrayEquals(new byte[] {1, 2, 3}, InputFiles.read(f));
    }

    @Test
    void aDirectoryIsRefusedInPlainWords() throws IOException {
        IOException e = assertThrows(IOException.class, () -> InputFiles.read(dir));
        assertEquals("it is a directory, not a file", e.getMessage());
    }

    @Test
    void aStreamWithinTheLimitIsReadWhole() throws IOException {
        byte[] data = new byte[1000];
        assertEquals(1000, InputFiles.readUpTo(new ByteArrayInputStream(data), 1000, "the data").length);
    }

    @Test
    void aGzipThatInflatesPastTheLimitIsRefusedWithoutReadingItAll() throws IOException {
        // 1 MB of zeros compresses to about a kilobyte: the bound must apply to the inflated bytes.
        ByteArrayOutputStream packed = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(packed)) {
            gz.write(new byte[1 << 20]);
        }
        assertTrue(packed.size() < 10_000, "the test's input is small on disk");
        try (InputStream in = new GZIPInputStream(new ByteArrayInputStream(packed.toByteArray()))) {
            IOException e = assertThrows(IOException.class, () -> InputFiles.readUpTo(in, 64 * 1024, "the proof file p.drat.gz"));
            assertEquals("the proof file p.drat.gz is too large: more than 65536 bytes", e.getMessage());
        }
    }
}
