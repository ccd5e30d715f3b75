package org.trendwright.team;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;

/**
 * Random secrets (session ids, API tokens, brief links, CSRF tokens, setup codes) and their
 * digests. Each secret carries 256 random bits from {@link SecureRandom}, written URL-safe
 * base64 without padding (43 characters).
 *
 * <p>Why a plain SHA-256 is enough to store a token (common practice; OWASP Password Storage Cheat
 * Sheet): slow, salted hashes exist to make guessing low-entropy passwords expensive. A 256-bit
 * random token cannot be guessed, so its digest cannot be reversed by search either, and a fast
 * digest lets every request be checked with one indexed look-up. Thread-safe.
 */
public final class Secrets {

    private static final SecureRandom RANDOM = new SecureRandom();
    private static final int SECRET_BYTES = 32;

    private Secrets() {
    }

    /** A new 256-bit random secret, URL-safe base64 without padding, after {@code prefix}. */
    public static String random(String prefix) {
        byte[] bytes = new byte[SECRET_BYTES];
        RANDOM.nextBytes(bytes);
        return prefix + Base64.getUrlEncoder().withoutPadding().encodeToString(bytes);
    }

    /** Random bytes (salts). */
    public static byte[] bytes(int count) {
        byte[] bytes = new byte[count];
        RANDOM.nextBytes(bytes);
        return bytes;
    }

    /** The SHA-256 digest of a secret, as lower-case hex: what the store keeps. */
    public static String digest(String secret) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(secret.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("Every Java runtime has SHA-256", e);
        }
    }

    /** Compares two secrets in time independent of where they differ. */
    public static boolean same(String a, String b) {
        return a != null && b != null
                && MessageDigest.isEqual(a.getBytes(StandardCharsets.UTF_8), b.getBytes(StandardCharsets.UTF_8));
    }
}
