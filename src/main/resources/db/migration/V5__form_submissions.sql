-- One row per page form that created a record, keyed by the one-time token the form carried: a second
-- submit of the same form (a double click, a resend after a slow answer) finds the first's record
-- instead of creating another. Rows older than a day are removed. Portable SQL (H2 2.x, PostgreSQL).
CREATE TABLE form_submission (
    token VARCHAR(36) NOT NULL PRIMARY KEY,
    kind VARCHAR(16) NOT NULL,
    record_id BIGINT NOT NULL,
    created_at TIMESTAMP WITH TIME ZONE NOT NULL
);

CREATE INDEX form_submission_created_ix ON form_submission (created_at);
