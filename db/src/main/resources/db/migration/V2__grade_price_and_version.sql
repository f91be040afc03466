-- A grade's price, for ranking the grades that pass a check by cost, and a row version for edits
-- by several people at once (optimistic locking: an edit names the version it was made from and
-- is refused when the row has changed since). Portable SQL: runs unchanged on H2 2.5 and PostgreSQL 15.

-- Price per kilogram in the team's one currency; null when not known.
ALTER TABLE grade ADD COLUMN price DOUBLE PRECISION CHECK (price >= 0);

-- 1 for a new grade; every edit of the grade's details adds one.
ALTER TABLE grade ADD COLUMN row_version INTEGER DEFAULT 1 NOT NULL;
