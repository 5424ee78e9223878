package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

class Sha256Test {
    @Test
    void digestsOfTheStandardsExamples() {
        // FIPS 180-2, Secure Hash Standard, Appendix B.1 (one-block message "abc").
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                Sha256.hex("abc".getBytes(StandardCharsets.US_ASCII)));
        // The empty message (common practice; the value every SHA-256 implementation lists).
        assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", Sha256.hex(new byte[0]));
    }
}
