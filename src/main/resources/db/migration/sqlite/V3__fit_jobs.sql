-- Batch fitting jobs (SQLite). A job is a list of series versions; each item is claimed by one
-- worker at a time with a lease (claimed_until, epoch milliseconds) and holds its result once done.
-- SQLite has one writer at a time: a claim is one UPDATE ... RETURNING, atomic by itself.
CREATE TABLE fit_job (
    id         INTEGER PRIMARY KEY AUTOINCREMENT,
    total      INTEGER NOT NULL,
    created_at BIGINT  NOT NULL
);

CREATE TABLE fit_job_item (
    job_id             BIGINT  NOT NULL REFERENCES fit_job (id) ON DELETE CASCADE,
    series_id          BIGINT  NOT NULL,
    version            INTEGER NOT NULL,
    status             TEXT    NOT NULL CHECK (status IN ('pending', 'claimed', 'done', 'failed')),
    claimed_by         TEXT,
    claimed_until      BIGINT,
    attempts           INTEGER NOT NULL DEFAULT 0,
    finished_at        BIGINT,
    recommended_model  TEXT,
    serial_correlation INTEGER,
    unit_root          INTEGER,
    trend_break        INTEGER,
    next_forecast      REAL,
    failure            TEXT,
    PRIMARY KEY (job_id, series_id)
);

CREATE INDEX fit_job_item_claimable ON fit_job_item (status, job_id, series_id);
