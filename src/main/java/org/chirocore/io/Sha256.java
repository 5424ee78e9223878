package org.chirocore.io;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SHA-256 digests as 64 lower-case hex digits, the one producer-side helper for the digests of
 * matroid files, certificate content, proofs and family definitions. (The verifier keeps its
 * own, so that it shares no code with the producer.) Cost linear in the input.
 */
public final class Sha256 {
    private Sha256() {
    }

    /** The digest of {@code bytes}. */
    public static String hex(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("Every Java platform provides SHA-256 (MessageDigest's specification).", e);
        }
    }

    /** The digest of the UTF-8 bytes of {@code value}'s canonical text ({@link Json#toText}). */
    public static String hex(Json value) {
        return hex(value.toText().getBytes(StandardCharsets.UTF_8));
    }
}
