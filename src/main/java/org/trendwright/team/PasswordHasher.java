package org.trendwright.team;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Base64;
import org.bouncycastle.crypto.generators.Argon2BytesGenerator;
import org.bouncycastle.crypto.params.Argon2Parameters;

/**
 * Hashes passwords with Argon2id (RFC 9106) through Bouncy Castle and checks them. Parameters follow
 * the OWASP Password Storage Cheat Sheet's first Argon2id line: 19 MiB of memory, 2 passes, 1 lane,
 * a 16-byte random salt and a 32-byte hash. The result is a PHC string
 * ({@code $argon2id$v=19$m=19456,t=2,p=1$salt$hash}) that names its parameters, so they can be raised
 * later without breaking stored hashes. Thread-safe.
 */
public final class PasswordHasher {

    private static final int MEMORY_KIB = 19 * 1024;
    private static final int ITERATIONS = 2;
    private static final int LANES = 1;
    private static final int SALT_BYTES = 16;
    private static final int HASH_BYTES = 32;
    private static final Base64.Encoder B64 = Base64.getEncoder().withoutPadding();
    private static final Base64.Decoder B64D = Base64.getDecoder();

    /**
     * What an unknown username is checked against: a PHC string with the same parameters, a random
     * salt and random hash bytes. Checking a password against it costs one full Argon2id run, like a
     * real stored hash, yet building it costs none (it used to be the hash of a random password,
     * which spent an Argon2id run at every start-up for bytes no password could reproduce anyway).
     */
    private final String decoy = phc(Secrets.bytes(SALT_BYTES), Secrets.bytes(HASH_BYTES));

    /** The PHC string of a new salted Argon2id hash of {@code password}. */
    public String hash(String password) {
        byte[] salt = Secrets.bytes(SALT_BYTES);
        return phc(salt, argon2(password, salt, MEMORY_KIB, ITERATIONS, LANES, HASH_BYTES));
    }

    private static String phc(byte[] salt, byte[] hash) {
        return "$argon2id$v=19$m=" + MEMORY_KIB + ",t=" + ITERATIONS + ",p=" + LANES + "$" + B64.encodeToString(salt)
                + "$" + B64.encodeToString(hash);
    }

    /**
     * True when {@code password} matches the stored PHC string; a null {@code stored} (unknown
     * username) is checked against a decoy so that it takes as long as a wrong password
     * (common practice: do not reveal which usernames exist through timing).
     */
    public boolean matches(String password, String stored) {
        String[] parts = (stored == null ? decoy : stored).split("\\$");
        if (parts.length != 6 || !parts[1].equals("argon2id")) {
            return false;
        }
        int memory = 0;
        int iterations = 0;
        int lanes = 0;
        for (String kv : parts[3].split(",")) {
            int value = Integer.parseInt(kv.substring(2));
            switch (kv.charAt(0)) {
                case 'm' -> memory = value;
                case 't' -> iterations = value;
                default -> lanes = value;
            }
        }
        byte[] expected = B64D.decode(parts[5]);
        byte[] actual = argon2(password, B64D.decode(parts[4]), memory, iterations, lanes, expected.length);
        return MessageDigest.isEqual(expected, actual) && stored != null;
    }

    private static byte[] argon2(String password, byte[] salt, int memoryKib, int iterations, int lanes,
                                 int length) {
        Argon2Parameters parameters = new Argon2Parameters.Builder(Argon2Parameters.ARGON2_id)
                .withVersion(Argon2Parameters.ARGON2_VERSION_13).withMemoryAsKB(memoryKib)
                .withIterations(iterations).withParallelism(lanes).withSalt(salt).build();
        Argon2BytesGenerator generator = new Argon2BytesGenerator();
        generator.init(parameters);
        byte[] out = new byte[length];
        generator.generateBytes(password.getBytes(StandardCharsets.UTF_8), out);
        return out;
    }
}
