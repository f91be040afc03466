package org.kneepoint.db;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Optional;
import java.util.OptionalLong;
import javax.sql.DataSource;
import org.h2.engine.SessionLocal;
import org.h2.jdbc.JdbcConnection;
import org.h2.mvstore.MVStore;
import org.h2.mvstore.MVStoreException;

/**
 * Guards an embedded library against falling back to an earlier state. H2 writes every commit as
 * a new version of its file; when the newest versions are damaged (a flipped bit, a torn write),
 * it opens the newest sound one instead, without a word, and the writes after it are gone. So
 * the version the file had when the library was last closed is kept beside it (in
 * {@value #FILE_NAME}); a file opened at an earlier version is refused as damaged. A library
 * killed before it closed keeps the stamp of the close before, which is never too high.
 *
 * @param file the H2 database file
 * @param version its version when opened
 */
record StoreVersion(Path file, long version) {

    static final String FILE_NAME = "kneepoint.version";

    /** The open embedded file behind the pool and its version; empty for a server database or an in-memory one. */
    static Optional<StoreVersion> of(DataSource pool) {
        try (Connection connection = pool.getConnection()) {
            if (connection.unwrap(JdbcConnection.class).getSession() instanceof SessionLocal session
                    && session.getDatabase().getStore() != null && session.getDatabase().getStore().getMvStore().getFileStore() != null) {
                MVStore store = session.getDatabase().getStore().getMvStore();
                return Optional.of(new StoreVersion(Path.of(withoutFileSystemPrefix(store.getFileStore().getFileName())),
                        store.getCurrentVersion()));
            }
            return Optional.empty();
        } catch (SQLException e) {
            return Optional.empty();
        }
    }

    /** H2 may name its file with its file system in front ("nio:/x/y.mv.db"); a drive letter ("C:") is kept. */
    private static String withoutFileSystemPrefix(String name) {
        int colon = name.indexOf(':');
        return colon > 1 && name.substring(0, colon).chars().allMatch(Character::isLetter) ? name.substring(colon + 1) : name;
    }

    /**
     * Refuses a file at an earlier version than the one kept beside it when it was last closed, and
     * one that was closed as a library but holds no schema any more (damage to H2's own catalog
     * shows as an empty database, which would otherwise be migrated afresh and read as empty).
     */
    void checkAgainstStamp(DataSource pool) {
        OptionalLong stamped = stamped();
        if (stamped.isEmpty()) {
            return;
        }
        if (version < stamped.getAsLong()) {
            throw new DamagedDataException("the library is damaged: its file " + file.getFileName() + " opened at version " + version
                    + ", earlier than version " + stamped.getAsLong() + " it had when last closed, so the writes since are lost. "
                    + "Restore a backup, or, if an older copy of the file was put back on purpose, delete " + stamp());
        }
        if (!CurrentSchema.hasHistory(pool)) {
            throw new DamagedDataException("the library is damaged: its file " + file.getFileName() + " holds no tables any more, though "
                    + "it was closed as a library at version " + stamped.getAsLong() + ". Restore a backup, or, to start an empty "
                    + "library here on purpose, delete " + file + " and " + stamp());
        }
    }

    private OptionalLong stamped() {
        try {
            return OptionalLong.of(Long.parseLong(Files.readString(stamp(), StandardCharsets.US_ASCII).strip()));
        } catch (IOException | NumberFormatException e) {
            return OptionalLong.empty();
        }
    }

    /** After the library closed: the file's final version, kept beside it. A stamp that cannot be written is left as it was. */
    void stampAfterClose() {
        long closed;
        try (MVStore store = new MVStore.Builder().fileName(file.toString()).readOnly().open()) {
            closed = store.getCurrentVersion();
        } catch (MVStoreException | IllegalStateException e) {
            return;
        }
        Path stamp = stamp();
        Path written = stamp.resolveSibling(FILE_NAME + ".new");
        try {
            Files.writeString(written, Long.toString(closed), StandardCharsets.US_ASCII);
            try {
                Files.move(written, stamp, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(written, stamp, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            return;
        }
    }

    private Path stamp() {
        return file.resolveSibling(FILE_NAME);
    }
}
