-- Long curves in pieces. A curve row keeps at most its first 4096 points; the rest follow in
-- rows of at most 4096 points each (32 KiB a column), numbered from 1 in point order. Rows of
-- megabytes made the embedded database fail at commit on large imports (H2 2.5.252 reads a page
-- past the end of its file); pieces of this size do not. Curves stored before this version keep
-- all their points in their own row and have no pieces. Portable SQL: H2 2.5 and PostgreSQL 15.

CREATE TABLE curve_piece (
    curve_id        BIGINT NOT NULL REFERENCES curve (id) ON DELETE CASCADE,
    piece           INTEGER NOT NULL CHECK (piece >= 1),
    h_values        BYTEA NOT NULL,
    measured_values BYTEA NOT NULL,
    CONSTRAINT curve_piece_key PRIMARY KEY (curve_id, piece)
);
