-- A SHA-256 checksum with every row's stored values, so that a damaged database file or a changed
-- row is found when it is read, never given out as a wrong number. Each checksum is 64 hex digits
-- over the row's own id and values in a fixed encoding (org.kneepoint.db.RowChecksums); a curve's
-- also covers points_checksum, the SHA-256 of the points kept in its own row, so that a listing can
-- check a curve's temperature and kind without reading its points. Rows stored before this version
-- get their checksums from the Java migration 5 (org.kneepoint.db.FillRowChecksums) when the
-- library is next opened. Portable SQL: H2 2.5 and PostgreSQL 15.

ALTER TABLE import_record ADD COLUMN checksum CHAR(64);
ALTER TABLE material_family ADD COLUMN checksum CHAR(64);
ALTER TABLE grade ADD COLUMN checksum CHAR(64);
ALTER TABLE curve ADD COLUMN points_checksum CHAR(64);
ALTER TABLE curve ADD COLUMN checksum CHAR(64);
ALTER TABLE curve_piece ADD COLUMN checksum CHAR(64);
ALTER TABLE susceptibility_point ADD COLUMN checksum CHAR(64);
ALTER TABLE fit ADD COLUMN checksum CHAR(64);
