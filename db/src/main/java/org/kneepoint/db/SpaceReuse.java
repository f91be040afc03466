package org.kneepoint.db;

import java.sql.Connection;
import java.sql.SQLException;
import javax.sql.DataSource;
import org.h2.engine.SessionLocal;
import org.h2.jdbc.JdbcConnection;

/**
 * Gives back the space of an embedded library that is written append-only while open
 * ({@code REUSE_SPACE=FALSE}, see {@link DatabaseLocation#H2_SETTINGS}): just before the last
 * connection closes, H2 is allowed to reuse space again, so that its compaction at close moves
 * the live data together and shortens the file. Nothing is written after that but the close.
 */
final class SpaceReuse {

    private SpaceReuse() {
    }

    /** Allows the open H2 database behind the pool to reuse space; a pool that cannot answer is closed as it is. */
    static void allowBeforeClose(DataSource pool) {
        try (Connection connection = pool.getConnection()) {
            if (connection.unwrap(JdbcConnection.class).getSession() instanceof SessionLocal session
                    && session.getDatabase().getStore() != null && session.getDatabase().getStore().getMvStore().getFileStore() != null) {
                session.getDatabase().getStore().getMvStore().setReuseSpace(true);
            }
        } catch (SQLException | RuntimeException e) {
            // Closed without giving the space back: the file stays longer until a later close compacts it.
            return;
        }
    }
}
