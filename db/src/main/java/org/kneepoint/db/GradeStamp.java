package org.kneepoint.db;

/**
 * What changes whenever a grade's stored data change, read in one small query ({@link LibraryReader#gradeStamps}):
 * the grade's row id and edit version, and the number and highest id of its curves (curves are only ever added, with
 * ids that only grow). Values computed from a grade's data stay valid while its stamp is equal, in any process.
 */
public record GradeStamp(long gradeId, int version, int curves, long lastCurveId) {
}
