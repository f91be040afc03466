package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.time.OffsetDateTime;
import org.junit.jupiter.api.Test;
import org.kneepoint.db.jooq.tables.records.ImportRecordRecord;

/**
 * A damaged file can read a required column as null: the row's checksum then differs from the
 * stored one (and the read reports damage), it never fails with a null pointer.
 */
class RowChecksumsTest {

    @Test
    void a_required_value_read_as_null_changes_the_checksum_instead_of_failing() {
        ImportRecordRecord row = new ImportRecordRecord();
        row.setId(7L);
        row.setFileName("invented.csv");
        row.setSha256("0".repeat(64));
        row.setImportedAt(OffsetDateTime.parse("2026-12-02T10:15:30.123Z"));
        row.setCurveCount(3);
        row.setPointCount(300);
        row.setSusceptibilityCount(0);
        String sound = RowChecksums.of(row);
        assertEquals(sound, RowChecksums.importRecord(7L, "invented.csv", "0".repeat(64),
                OffsetDateTime.parse("2026-12-02T10:15:30.123Z"), 3, 300, 0), "the record and its values agree");

        row.setSusceptibilityCount(null);
        assertNotEquals(sound, RowChecksums.of(row));
        row.setSusceptibilityCount(0);
        row.setId(null);
        assertNotEquals(sound, RowChecksums.of(row));
    }
}
