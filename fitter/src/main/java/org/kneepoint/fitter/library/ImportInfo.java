package org.kneepoint.fitter.library;

import java.time.Instant;

/**
 * The record of one import: file name, SHA-256 of its bytes (lower-case hex), when, and what it
 * brought. The time is kept to the millisecond so that backups round-trip exactly.
 */
public record ImportInfo(String fileName, String sha256, Instant importedAt, int curves, int points, int susceptibilityPoints) {

    public ImportInfo {
        if (fileName == null || fileName.isBlank() || sha256 == null || !sha256.matches("[0-9a-f]{64}") || importedAt == null) {
            throw new IllegalArgumentException("an import record needs a file name, a SHA-256 and a time");
        }
        importedAt = importedAt.truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
    }
}
