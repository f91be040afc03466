package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.importer.json.BackupCodec;
import org.kneepoint.server.app.demo.DemoLoader;

/**
 * The same migrations, stores and backups on PostgreSQL 15. tests/run starts a throwaway server on
 * loopback and names it in KNEEPOINT_TEST_POSTGRES_URL; each test works in a schema of its own.
 */
@Tag("slow")
class PostgresLibraryTest {

    @Test
    void the_demo_library_backs_up_to_the_same_bytes_on_postgresql_as_on_h2() {
        String h2Backup;
        try (Library h2 = Library.open(new DatabaseLocation("jdbc:h2:mem:kneepoint-" + UUID.randomUUID() + ";DB_CLOSE_DELAY=-1"))) {
            DemoLoader.load(h2);
            h2Backup = BackupCodec.write(h2.reader().snapshot());
        }
        try (Library postgres = Library.open(new DatabaseLocation(TestPostgres.freshSchemaUrl()))) {
            assertEquals(Library.SCHEMA_VERSION, postgres.schemaVersion());
            postgres.writer().restore(BackupCodec.read("backup", h2Backup));
            assertEquals(h2Backup, BackupCodec.write(postgres.reader().snapshot()));
            assertEquals(12, postgres.reader().grades(null).size());
            assertThrows(ConflictException.class, () -> postgres.writer().restore(BackupCodec.read("backup", h2Backup)));
        }
    }

    @Test
    void hostile_strings_survive_postgresql_unchanged() {
        try (Library postgres = Library.open(new DatabaseLocation(TestPostgres.freshSchemaUrl()))) {
            GradeInfo grade = new GradeInfo("'; DROP TABLE grade; -- <script>alert(1)</script> Ниодим 磁石", "invented family",
                    "tab\there", null, "line\nbreak", null);
            var curve = org.kneepoint.fitter.curve.DemagnetizationCurve.of(org.kneepoint.fitter.curve.Quantity.J,
                    new double[] {5e4, 0, -5e5}, new double[] {1.3, 1.29, 1.26}, 293.15);
            postgres.writer().importBatch(new org.kneepoint.fitter.library.ImportInfo("hostile.csv", "a".repeat(64),
                    java.time.Instant.parse("2026-12-02T00:00:00Z"), 1, 3, 0), List.of(grade),
                    List.of(new LibraryCurve(grade.name(), curve, grade.name(), null)), List.of());
            assertEquals(grade, postgres.reader().grade(grade.name()).orElseThrow());
            assertEquals(curve, postgres.reader().curves(grade.name()).get(0).curve());
        }
    }
}
