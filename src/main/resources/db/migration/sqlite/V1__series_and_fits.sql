-- Series, their immutable versions and observations, and cached fit results (SQLite).
-- Timestamps are epoch milliseconds (UTC); period_index is Period.index() for the series' frequency.
CREATE TABLE series (
    id              INTEGER PRIMARY KEY AUTOINCREMENT,
    name            TEXT    NOT NULL,
    frequency       TEXT    NOT NULL,
    current_version INTEGER NOT NULL,
    created_at      INTEGER NOT NULL,
    updated_at      INTEGER NOT NULL
);

CREATE TABLE series_version (
    series_id         INTEGER NOT NULL REFERENCES series (id) ON DELETE CASCADE,
    version           INTEGER NOT NULL,
    created_at        INTEGER NOT NULL,
    observation_count INTEGER NOT NULL,
    first_period      INTEGER NOT NULL,
    last_period       INTEGER NOT NULL,
    PRIMARY KEY (series_id, version)
);

CREATE TABLE observation (
    series_id    INTEGER NOT NULL,
    version      INTEGER NOT NULL,
    period_index INTEGER NOT NULL,
    value        REAL    NOT NULL,
    PRIMARY KEY (series_id, version, period_index),
    FOREIGN KEY (series_id, version) REFERENCES series_version (series_id, version) ON DELETE CASCADE
);

CREATE TABLE fit_result (
    series_id  INTEGER NOT NULL,
    version    INTEGER NOT NULL,
    model_key  TEXT    NOT NULL,
    model      TEXT    NOT NULL,
    result     TEXT    NOT NULL,
    created_at INTEGER NOT NULL,
    PRIMARY KEY (series_id, version, model_key),
    FOREIGN KEY (series_id, version) REFERENCES series_version (series_id, version) ON DELETE CASCADE
);
