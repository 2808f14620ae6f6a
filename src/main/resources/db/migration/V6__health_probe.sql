-- One row the health check rewrites on every call: health is UP only when the database takes a write
-- (a read-only data folder or a full disk turn it DOWN). Portable SQL (H2 2.x, PostgreSQL).
CREATE TABLE health_probe (
    id INTEGER NOT NULL PRIMARY KEY,
    checked_at TIMESTAMP WITH TIME ZONE NOT NULL
);

INSERT INTO health_probe (id, checked_at) VALUES (1, CURRENT_TIMESTAMP);
