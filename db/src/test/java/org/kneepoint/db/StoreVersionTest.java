package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;

/** An embedded library that comes back at an earlier state than it was closed in is refused, not read as sound. */
class StoreVersionTest {

    private static final GradeInfo GRADE = new GradeInfo("Invented N42", "sintered NdFeB", null, 7500.0, null, "test");

    @Test
    void a_file_put_back_at_an_earlier_version_is_refused_until_its_stamp_is_deleted(@TempDir Path folder) throws Exception {
        DatabaseLocation location = DatabaseLocation.ofFolder(folder.resolve("library"));
        Path file = folder.resolve("library").resolve("kneepoint.mv.db");
        try (Library library = Library.open(location)) {
            assertTrue(library.reader().isEmpty());
        }
        Path earlier = Files.copy(file, folder.resolve("earlier.mv.db"));
        try (Library library = Library.open(location)) {
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 1, 50), List.of(GRADE),
                    List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), "invented", null)), List.of());
        }
        Path stamp = file.resolveSibling(StoreVersion.FILE_NAME);
        assertTrue(Files.isRegularFile(stamp));

        Files.copy(earlier, file, StandardCopyOption.REPLACE_EXISTING);
        DamagedDataException refused = assertThrows(DamagedDataException.class, () -> Library.open(location));
        assertTrue(refused.getMessage().contains("earlier than version " + Files.readString(stamp).strip()), refused.getMessage());
        assertTrue(refused.getMessage().contains("delete " + stamp), refused.getMessage());
        assertEquals(1, refused.getMessage().lines().count());

        Files.delete(stamp);
        try (Library library = Library.open(location)) {
            assertTrue(library.reader().isEmpty(), "the earlier state, opened on purpose");
        }
    }

    @Test
    void a_closed_library_whose_tables_are_gone_is_refused_not_created_afresh(@TempDir Path folder) throws Exception {
        DatabaseLocation location = DatabaseLocation.ofFolder(folder);
        try (Library library = Library.open(location)) {
            library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 1, 50), List.of(GRADE),
                    List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), "invented", null)), List.of());
        }
        // What damage to H2's own catalog looks like from outside: a database with no tables.
        try (Connection connection = DriverManager.getConnection(location.connectionUrl(), "sa", "");
                Statement statement = connection.createStatement()) {
            statement.execute("DROP ALL OBJECTS");
        }
        DamagedDataException refused = assertThrows(DamagedDataException.class, () -> Library.open(location));
        assertTrue(refused.getMessage().contains("holds no tables any more"), refused.getMessage());
    }

    @Test
    void reopening_a_closed_library_is_never_behind_its_own_stamp(@TempDir Path folder) {
        DatabaseLocation location = DatabaseLocation.ofFolder(folder);
        for (int round = 0; round < 3; round++) {
            try (Library library = Library.open(location)) {
                library.writer().importBatch(TestLibraries.importInfo("r" + round + ".csv", round + 1, 1, 50),
                        List.of(new GradeInfo("Invented grade " + round, "sintered NdFeB", null, 7500.0, null, "test")),
                        List.of(new LibraryCurve("Invented grade " + round, TestLibraries.curve(293.15, 50), "invented", null)), List.of());
            }
        }
        try (Library library = Library.open(location)) {
            assertEquals(3, library.reader().grades(null).size());
        }
    }
}
