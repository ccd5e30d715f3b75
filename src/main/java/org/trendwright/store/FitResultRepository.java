package org.trendwright.store;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Clock;
import java.util.HexFormat;
import java.util.Optional;

/**
 * Fit results stored per (series, version, model): a version never changes, so its result for a
 * given model never does either, and is computed once. The model is given as its canonical JSON
 * text; rows are keyed by its SHA-256. Two instances racing on the same pair both compute, the
 * first write wins and the second is ignored. Thread-safe.
 */
public final class FitResultRepository {

    private final Jdbc jdbc;
    private final Clock clock;

    public FitResultRepository(Database database, Clock clock) {
        this.jdbc = new Jdbc(database.dataSource());
        this.clock = clock;
    }

    /** The stored result JSON for this version and model, if any. */
    public Optional<String> find(long seriesId, int version, String model) {
        return jdbc.read("read a stored fit", c -> {
            try (PreparedStatement s = c.prepareStatement("SELECT result FROM fit_result WHERE series_id = ? AND"
                    + " version = ? AND model_key = ?")) {
                s.setLong(1, seriesId);
                s.setInt(2, version);
                s.setString(3, key(model));
                try (ResultSet rs = s.executeQuery()) {
                    return rs.next() ? Optional.of(rs.getString("result")) : Optional.empty();
                }
            }
        });
    }

    /** Stores a result unless one is already stored for the same version and model. */
    public void save(long seriesId, int version, String model, String result) {
        jdbc.transaction("store a fit", c -> {
            try (PreparedStatement s = c.prepareStatement("INSERT INTO fit_result (series_id, version, model_key,"
                    + " model, result, created_at) VALUES (?, ?, ?, ?, ?, ?) ON CONFLICT DO NOTHING")) {
                s.setLong(1, seriesId);
                s.setInt(2, version);
                s.setString(3, key(model));
                s.setString(4, model);
                s.setString(5, result);
                s.setLong(6, clock.millis());
                return s.executeUpdate();
            }
        });
    }

    static String key(String model) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(model.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("Every Java runtime has SHA-256", e);
        }
    }
}
