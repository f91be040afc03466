package org.kneepoint.db;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.sql.SQLException;
import java.util.Locale;
import java.util.Optional;

/**
 * Faults of the embedded library's files that are not the program's or the user's mistake: another
 * program holds the file, the folder or file is read-only, the disk is full. Each is told in one
 * line as an {@link UnavailableException} (exit 4, HTTP 503): nothing of the request was kept, and
 * it can be done again once the cause is gone.
 */
enum StorageFault {

    /** H2 error 90020: the file is open in another process. */
    LOCKED("another program holds the library at %s (its file is locked); close that program, or let both use a shared "
            + "PostgreSQL library, and try again"),
    /**
     * H2 error 90097 (read only), 90062 (a file in the library's folder cannot be created, as when
     * the folder is read-only), or a file or folder the process may not write.
     */
    READ_ONLY("the library at %s cannot be written: its folder or file is read-only (%s); nothing was written"),
    /** No space left, over the disk quota, or over the process's file size limit. */
    FULL("the disk holding the library at %s is full (%s); nothing of this request was kept, free some space and try again");

    private static final int H2_ALREADY_OPEN = 90020;
    private static final int H2_READ_ONLY = 90097;
    private static final int H2_FILE_CREATION_FAILED = 90062;

    private final String pattern;

    StorageFault(String pattern) {
        this.pattern = pattern;
    }

    /** The fault behind a failure, if it is one of these. */
    static Optional<StorageFault> of(Throwable failure) {
        for (Throwable cause = failure; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            if (cause instanceof SQLException sql && sql.getErrorCode() == H2_ALREADY_OPEN) {
                return Optional.of(LOCKED);
            }
            if (cause instanceof SQLException sql && (sql.getErrorCode() == H2_READ_ONLY || sql.getErrorCode() == H2_FILE_CREATION_FAILED)
                    || cause instanceof AccessDeniedException) {
                return Optional.of(READ_ONLY);
            }
            if (cause instanceof IOException io && isFull(io)) {
                return Optional.of(FULL);
            }
            if (isFull(cause.getMessage())) {
                return Optional.of(FULL);
            }
        }
        return Optional.empty();
    }

    private static boolean isFull(IOException failure) {
        return failure instanceof FileSystemException fs ? isFull(fs.getReason()) || isFull(fs.getMessage()) : isFull(failure.getMessage());
    }

    private static boolean isFull(String message) {
        String text = message == null ? "" : message.toLowerCase(Locale.ROOT);
        return text.contains("no space left") || text.contains("disk quota exceeded") || text.contains("file too large");
    }

    /** The one-line message for the library at {@code location}. */
    UnavailableException toException(DatabaseLocation location, Throwable failure) {
        String reason = location.withoutPassword(ConnectionFailures.reason(failure));
        return new UnavailableException(String.format(Locale.ROOT, pattern, location.describe(), reason), failure);
    }
}
