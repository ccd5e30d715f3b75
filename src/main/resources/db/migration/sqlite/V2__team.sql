-- Team use: members, sign-in sessions, API tokens, published forecast briefs and the audit log (sqlite).
-- Timestamps are epoch milliseconds (UTC). Secrets that grant access (session ids, API tokens) are
-- stored only as their SHA-256 hex digest; passwords only as Argon2id PHC strings.
CREATE TABLE member (
    id            INTEGER PRIMARY KEY AUTOINCREMENT,
    username      TEXT    NOT NULL UNIQUE,
    role          TEXT    NOT NULL,
    password_hash TEXT    NOT NULL,
    created_at    INTEGER    NOT NULL,
    updated_at    INTEGER    NOT NULL
);

CREATE TABLE member_session (
    id_hash      TEXT    PRIMARY KEY,
    member_id    INTEGER    NOT NULL REFERENCES member (id) ON DELETE CASCADE,
    csrf_token   TEXT    NOT NULL,
    created_at   INTEGER    NOT NULL,
    last_seen_at INTEGER    NOT NULL
);

CREATE TABLE api_token (
    id           INTEGER PRIMARY KEY AUTOINCREMENT,
    member_id    INTEGER    NOT NULL REFERENCES member (id) ON DELETE CASCADE,
    name         TEXT    NOT NULL,
    token_hash   TEXT    NOT NULL UNIQUE,
    scope        TEXT    NOT NULL,
    created_at   INTEGER    NOT NULL,
    last_used_at INTEGER,
    revoked_at   INTEGER
);

-- A brief outlives its series and its author: no foreign keys, the author's name is kept.
CREATE TABLE brief (
    id             INTEGER PRIMARY KEY AUTOINCREMENT,
    token          TEXT    NOT NULL UNIQUE,
    series_id      INTEGER    NOT NULL,
    series_version INTEGER NOT NULL,
    author_id      INTEGER,
    author_name    TEXT    NOT NULL,
    content        TEXT    NOT NULL,
    published_at   INTEGER    NOT NULL,
    expires_at     INTEGER,
    revoked_at     INTEGER,
    superseded_by  INTEGER
);

CREATE INDEX brief_series ON brief (series_id);

CREATE TABLE audit_entry (
    id        INTEGER PRIMARY KEY AUTOINCREMENT,
    member_id INTEGER,
    actor     TEXT    NOT NULL,
    action    TEXT    NOT NULL,
    target    TEXT    NOT NULL,
    at        INTEGER    NOT NULL
);
