-- A version's points packed into one value (see store/PackedPoints: 16 bytes per point, the period
-- index then the value, both big-endian), and uploads with ids (POST /api/jobs takes an uploadId).
-- SQLite cannot write a REAL's exact IEEE 754 bytes in SQL, so the existing observation rows are
-- packed by the Java migration V5 (store/PackObservationsMigration), which also drops the table.
ALTER TABLE series_version ADD COLUMN points BLOB;

CREATE TABLE upload (
    id           INTEGER PRIMARY KEY AUTOINCREMENT,
    created_at   INTEGER NOT NULL,
    series_count INTEGER NOT NULL
);

ALTER TABLE series ADD COLUMN upload_id INTEGER REFERENCES upload (id);
CREATE INDEX series_by_upload ON series (upload_id);
