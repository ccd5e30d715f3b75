package org.trendwright.team;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Argon2id hashing of passwords. */
class PasswordHasherTest {

    private final PasswordHasher hasher = new PasswordHasher();

    @Test
    void writes_a_phc_string_with_the_owasp_parameters() {
        // OWASP Password Storage Cheat Sheet: Argon2id, m=19 MiB, t=2, p=1.
        assertTrue(hasher.hash("correct horse battery").startsWith("$argon2id$v=19$m=19456,t=2,p=1$"));
    }

    @Test
    void accepts_the_password_and_refuses_any_other() {
        String stored = hasher.hash("correct horse battery");
        assertTrue(hasher.matches("correct horse battery", stored));
        assertFalse(hasher.matches("correct horse batterz", stored));
        assertFalse(hasher.matches("", stored));
    }

    @Test
    void salts_each_hash_so_equal_passwords_store_differently() {
        assertNotEquals(hasher.hash("same password here"), hasher.hash("same password here"));
    }

    @Test
    void refuses_an_unknown_user_even_with_the_decoys_own_secret_shape() {
        assertFalse(hasher.matches("anything at all", null));
    }
}
