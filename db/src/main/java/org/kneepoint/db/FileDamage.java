package org.kneepoint.db;

import java.sql.SQLException;
import java.util.Optional;
import org.h2.mvstore.MVStoreException;

/**
 * An embedded library's file that its database engine finds damaged (H2 reports a corrupted file,
 * a missing chunk or page, or fails inside while reading its pages): told as
 * {@link DamagedDataException}, like a row that fails its checksum, never as an internal error.
 */
final class FileDamage {

    /**
     * H2 errors a damaged file causes while it is read: file corrupted (90030), a general internal
     * error (50000), a row missing from its table's primary index (90143) or while deleting (90112),
     * reading failed (90028, 90031; read-only and full disks are told as such before), a table
     * or column of the migrated schema that the file no longer holds (42102, 42103, 42104, 42122),
     * and a stored value of another type than its column's (22018: every value is bound typed, so
     * only a damaged type tag in the file makes H2 convert, e.g. a name where a number belongs).
     */
    private static final java.util.Set<Integer> H2_DAMAGE = java.util.Set.of(90030, 50000, 90143, 90112, 90028, 90031,
            42102, 42103, 42104, 42122, 22018);
    /** MVStore codes that are not damage: writing failed (read-only, full), store closed, file locked. */
    private static final int MV_WRITING_FAILED = 2;
    private static final int MV_CLOSED = 4;
    private static final int MV_FILE_LOCKED = 7;
    /** MVStore codes of transactions that wait for each other (a row locked, a deadlock): a race, never damage. */
    private static final java.util.Set<Integer> MV_RACES = java.util.Set.of(101, 105);

    private FileDamage() {
    }

    /** The failure as damage of the library's file, if it is that. */
    static Optional<DamagedDataException> of(DatabaseLocation location, Throwable failure) {
        for (Throwable cause = failure; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            boolean damaged = cause instanceof SQLException sql && H2_DAMAGE.contains(sql.getErrorCode())
                    || cause instanceof MVStoreException store && store.getErrorCode() != MV_WRITING_FAILED
                            && store.getErrorCode() != MV_CLOSED && store.getErrorCode() != MV_FILE_LOCKED
                            && !MV_RACES.contains(store.getErrorCode());
            if (damaged && location.dialect() == org.jooq.SQLDialect.H2) {
                DamagedDataException damage = new DamagedDataException(DamagedDataException.message(
                        "the database file at " + location.describe() + " cannot be read (" + location.withoutPassword(ConnectionFailures.reason(failure)) + ")"));
                damage.initCause(failure);
                return Optional.of(damage);
            }
        }
        return Optional.empty();
    }
}
