package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.kneepoint.db.TestLibraries.Engine;
import org.kneepoint.fitter.error.ErrorCode;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * The checksum stored with every row (migration V4): a value changed behind the library's back is
 * refused where it is read, naming the grade and curve, and listed by {@code verify}; rows stored
 * before version 4 are given their checksums by migration 5. Every case on H2 and PostgreSQL.
 */
class RowChecksumTest {

    private static final GradeInfo GRADE = new GradeInfo("Invented N40", "sintered NdFeB", "Supplier A (invented)", 7500.0, "notes", "test");
    private static final String MATERIAL = "Copper (invented)";

    /** One grade with a short and a long curve (in pieces), a susceptibility point and a fit. */
    private static void fill(Library library) {
        var curves = List.of(new LibraryCurve(GRADE.name(), TestLibraries.curve(293.15, 50), "invented", null),
                new LibraryCurve(GRADE.name(), TestLibraries.curve(373.15, 9000), "invented", null));
        var chi = List.of(new SusceptibilityPoint(MATERIAL, 293.15, -9.6e-6, SusceptibilityForm.VOLUME, 8960.0, null, "demo", null));
        library.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 2, 9050), List.of(GRADE), curves, List.of());
        library.writer().importBatch(new org.kneepoint.fitter.library.ImportInfo("chi.csv", "0".repeat(63) + "2",
                Instant.parse("2026-12-02T10:16:00Z"), 0, 0, 1), List.of(), List.of(), chi);
        library.writer().saveFit(new FitRecord(GRADE.name(), 293.15, "intrinsic", null, "knee", "{\"a\":1}", 0.01,
                Instant.parse("2026-12-02T11:00:00Z"), "test"));
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void a_library_written_by_the_program_is_sound_and_stays_sound_after_an_edit(Engine engine) {
        try (Library library = TestLibraries.fresh(engine)) {
            assertTrue(library.reader().verify().clean());
            fill(library);
            library.writer().editGrade(GRADE.name(), 1, new GradeDetails("Supplier B (invented)", 7550.0, "edited", 12.5));
            VerifyReport report = library.reader().verify();
            assertEquals(List.of(), report.damaged());
            assertEquals(2, report.checked().get("curve_piece"), "9000 points: 4096 in the row, then pieces of 4096 and 808");
            LibrarySnapshot snapshot = library.reader().snapshot();
            assertEquals(2, snapshot.curves().size());
            assertEquals(9000, snapshot.curves().get(1).curve().size());
        }
    }

    static Stream<Arguments> damage() {
        List<Arguments> cases = new ArrayList<>();
        for (Engine engine : Engine.values()) {
            cases.add(Arguments.of(engine, "a point of a curve", (Consumer<Connection>) c -> flipByte(c, "curve", "measured_values",
                    "SELECT id FROM curve WHERE temperature_k = 293.15"),
                    (ReadAction) library -> library.reader().curves(GRADE.name()), "the intrinsic curve at 293.15 K of grade 'Invented N40'"));
            cases.add(Arguments.of(engine, "a point in a piece of a long curve", (Consumer<Connection>) c -> flipByte(c, "curve_piece",
                    "h_values", "SELECT curve_id FROM curve_piece WHERE piece = 2"),
                    (ReadAction) library -> library.reader().snapshot(), "piece 2 of the points of the intrinsic curve at 373.15 K"));
            cases.add(Arguments.of(engine, "a curve's temperature", (Consumer<Connection>) c -> update(c,
                    "UPDATE curve SET temperature_k = 374.15 WHERE temperature_k = 373.15"),
                    (ReadAction) library -> library.reader().grades(null), "the intrinsic curve at 374.15 K of grade 'Invented N40'"));
            cases.add(Arguments.of(engine, "a grade's density", (Consumer<Connection>) c -> update(c, "UPDATE grade SET density = 7501"),
                    (ReadAction) library -> library.reader().grade(GRADE.name()), "grade 'Invented N40' does not match its checksum"));
            cases.add(Arguments.of(engine, "a susceptibility", (Consumer<Connection>) c -> update(c, "UPDATE susceptibility_point SET chi = -9.7e-6"),
                    (ReadAction) library -> library.reader().susceptibility(MATERIAL), "susceptibility point of 'Copper (invented)' at 293.15 K"));
            cases.add(Arguments.of(engine, "a fit's parameters", (Consumer<Connection>) c -> update(c, "UPDATE fit SET parameters = '{\"a\":2}'"),
                    (ReadAction) library -> library.reader().fits(), "knee fit of grade 'Invented N40'"));
            cases.add(Arguments.of(engine, "an import record's SHA-256", (Consumer<Connection>) c -> update(c,
                    "UPDATE import_record SET sha256 = '" + "f".repeat(64) + "' WHERE file_name = 'a.csv'"),
                    (ReadAction) library -> library.reader().curves(GRADE.name()), "import record of the file 'a.csv'"));
            cases.add(Arguments.of(engine, "a missing piece", (Consumer<Connection>) c -> update(c, "DELETE FROM curve_piece WHERE piece = 1"),
                    (ReadAction) library -> library.reader().curves(GRADE.name()), "the intrinsic curve at 373.15 K of grade 'Invented N40' lacks piece 1"));
            cases.add(Arguments.of(engine, "a row gone whole", (Consumer<Connection>) c -> update(c, "DELETE FROM susceptibility_point"),
                    (ReadAction) library -> library.reader().susceptibility(MATERIAL),
                    "the table susceptibility point holds 0 rows where 1 were written"));
        }
        return cases.stream();
    }

    /** A read of the library that must refuse damaged values. */
    interface ReadAction {
        Object read(Library library);
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("damage")
    void a_value_changed_behind_the_library_is_refused_where_read_and_listed_by_verify(Engine engine, String change,
            Consumer<Connection> tamper, ReadAction read, String named) throws SQLException {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        try (Library library = Library.open(location)) {
            fill(library);
            try (Connection connection = DriverManager.getConnection(location.jdbcUrl(), h2User(location), "")) {
                tamper.accept(connection);
            }
            Executable reading = () -> read.read(library);
            DamagedDataException error = assertThrows(DamagedDataException.class, reading, change);
            assertEquals(ErrorCode.DAMAGED, error.code());
            assertTrue(error.getMessage().contains(named), error.getMessage());
            assertTrue(error.getMessage().startsWith("the library is damaged: "), error.getMessage());
            VerifyReport report = library.reader().verify();
            assertTrue(report.damaged().stream().anyMatch(line -> line.contains(named)), report.damaged().toString());
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void rows_stored_before_version_4_get_their_checksums_from_migration_5(Engine engine) throws SQLException {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        Flyway.configure().dataSource(location.jdbcUrl(), h2User(location), "").locations("classpath:db/migration").target("3").load().migrate();
        try (Connection connection = DriverManager.getConnection(location.jdbcUrl(), h2User(location), "");
                Statement statement = connection.createStatement()) {
            statement.execute("INSERT INTO material_family (id, name) VALUES (1, 'sintered NdFeB')");
            statement.execute("INSERT INTO grade (id, name, family_id, density, provenance) VALUES (1, 'Invented old grade', 1, 7500, 'v3')");
            try (PreparedStatement curve = connection.prepareStatement("INSERT INTO curve (id, grade_id, temperature_k, kind, quantity, "
                    + "point_count, h_values, measured_values) VALUES (1, 1, 293.15, 'intrinsic', 'J', 2, ?, ?)")) {
                curve.setBytes(1, PackedDoubles.pack(new double[] {0, -1e5}, 0, 2));
                curve.setBytes(2, PackedDoubles.pack(new double[] {1.3, 1.29}, 0, 2));
                curve.execute();
            }
        }
        try (Library library = Library.open(location)) {
            assertEquals(Library.SCHEMA_VERSION, library.schemaVersion());
            assertEquals(List.of(), library.reader().verify().damaged());
            assertEquals(1.29, library.reader().curves("Invented old grade").get(0).curve().values()[1]);
        }
    }

    private static String h2User(DatabaseLocation location) {
        return location.dialect() == org.jooq.SQLDialect.H2 ? "sa" : null;
    }

    private static void update(Connection connection, String sql) {
        try (Statement statement = connection.createStatement()) {
            assertTrue(statement.executeUpdate(sql) > 0, sql);
        } catch (SQLException e) {
            throw new IllegalStateException(sql, e);
        }
    }

    /** Flips the lowest bit of the 13th byte of the column in the row whose key the query finds. */
    private static void flipByte(Connection connection, String table, String column, String keyQuery) {
        String key = table.equals("curve") ? "id" : "curve_id";
        String where = " WHERE " + key + " = (" + keyQuery + ")" + (table.equals("curve_piece") ? " AND piece = 2" : "");
        try (Statement statement = connection.createStatement(); ResultSet row = statement.executeQuery("SELECT " + column + " FROM " + table + where)) {
            assertTrue(row.next());
            byte[] bytes = row.getBytes(1);
            bytes[12] ^= 1;
            try (PreparedStatement update = connection.prepareStatement("UPDATE " + table + " SET " + column + " = ?" + where)) {
                update.setBytes(1, bytes);
                assertEquals(1, update.executeUpdate());
            }
        } catch (SQLException e) {
            throw new IllegalStateException(table + "." + column, e);
        }
    }
}
