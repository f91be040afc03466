package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.kneepoint.db.TestLibraries.Engine;
import org.kneepoint.fitter.error.ConflictException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.library.GradeDetails;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.StoredGrade;

/**
 * One database shared by several library instances (as several server processes would open it):
 * each instance has its own pool and its own in-process write lock, so only the database keeps
 * their writes apart. Every case runs on H2 (two instances on one in-memory database) and on
 * PostgreSQL (two instances on one schema).
 */
@Tag("slow")
class SharedLibraryTest {

    private static final String FAMILY = "sintered NdFeB";

    @ParameterizedTest
    @EnumSource(Engine.class)
    void two_instances_importing_into_the_same_new_family_and_grades_lose_and_duplicate_nothing(Engine engine) throws Exception {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        try (Library first = Library.open(location); Library second = Library.open(location)) {
            ExecutorService pool = Executors.newFixedThreadPool(8);
            CyclicBarrier start = new CyclicBarrier(8);
            List<Future<?>> done = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                int task = t;
                Library library = task % 2 == 0 ? first : second;
                done.add(pool.submit((Callable<Void>) () -> {
                    // Tasks 2k and 2k+1 share a new grade (at different temperatures) and all share a new family.
                    GradeInfo grade = new GradeInfo("Invented shared grade " + task / 2, FAMILY, null, null, null, null);
                    LibraryCurve curve = new LibraryCurve(grade.name(), TestLibraries.curve(293.15 + 40 * (task % 2), 100 + task), null, null);
                    start.await();
                    library.writer().importBatch(TestLibraries.importInfo("file" + task + ".csv", 500 + task, 1, 100 + task),
                            List.of(grade), List.of(curve), List.of());
                    first.reader().grades(null);
                    second.reader().snapshot();
                    return null;
                }));
            }
            for (Future<?> future : done) {
                future.get();
            }
            pool.shutdown();
            LibrarySnapshot snapshot = second.reader().snapshot();
            assertEquals(8, snapshot.imports().size());
            assertEquals(4, snapshot.grades().size());
            assertEquals(8, snapshot.curves().size());
            assertEquals(List.of(FAMILY), first.reader().families());
            for (LibraryCurve stored : snapshot.curves()) {
                int shared = Integer.parseInt(stored.grade().substring("Invented shared grade ".length()));
                int task = 2 * shared + (stored.curve().temperatureK() > 300 ? 1 : 0);
                assertEquals(TestLibraries.curve(stored.curve().temperatureK(), 100 + task), stored.curve());
            }
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void the_same_file_imported_through_two_instances_at_once_is_stored_once(Engine engine) throws Exception {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        try (Library first = Library.open(location); Library second = Library.open(location)) {
            GradeInfo grade = new GradeInfo("Invented N45", FAMILY, null, null, null, null);
            List<LibraryCurve> curves = List.of(new LibraryCurve(grade.name(), TestLibraries.curve(293.15, 300), null, null));
            CyclicBarrier start = new CyclicBarrier(2);
            ExecutorService pool = Executors.newFixedThreadPool(2);
            List<Future<String>> outcomes = new ArrayList<>();
            for (Library library : List.of(first, second)) {
                outcomes.add(pool.submit(() -> {
                    start.await();
                    try {
                        library.writer().importBatch(TestLibraries.importInfo("n45.csv", 77, 1, 300), List.of(grade), curves, List.of());
                        return "stored";
                    } catch (ConflictException e) {
                        return e.getMessage();
                    }
                }));
            }
            List<String> results = new ArrayList<>();
            for (Future<String> outcome : outcomes) {
                results.add(outcome.get());
            }
            pool.shutdown();
            assertEquals(1, results.stream().filter("stored"::equals).count(), results.toString());
            assertTrue(results.stream().anyMatch(result -> result.contains("already imported")), results.toString());
            assertEquals(1, first.reader().snapshot().curves().size());
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void an_edit_from_a_stale_version_is_a_conflict_and_changes_nothing(Engine engine) {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        try (Library alice = Library.open(location); Library bob = Library.open(location)) {
            GradeInfo grade = new GradeInfo("Invented N42SH", FAMILY, "Supplier A (invented)", 7500.0, null, null);
            alice.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 0, 0), List.of(grade), List.of(), List.of());
            StoredGrade read = bob.reader().storedGrade(grade.name()).orElseThrow();
            assertEquals(1, read.version());

            assertEquals(2, alice.writer().editGrade(grade.name(), 1, new GradeDetails("Supplier A (invented)", 7500.0, "re-quoted", 48.5)));
            var stale = assertThrows(ConflictException.class,
                    () -> bob.writer().editGrade(grade.name(), 1, new GradeDetails("Supplier B (invented)", 7500.0, null, 40.0)));
            assertTrue(stale.getMessage().contains("changed by someone else since version 1 (it is now at version 2)"), stale.getMessage());

            StoredGrade now = bob.reader().storedGrade(grade.name()).orElseThrow();
            assertEquals(2, now.version());
            assertEquals(new GradeInfo(grade.name(), FAMILY, "Supplier A (invented)", 7500.0, "re-quoted", null, 48.5), now.grade());
            assertEquals(3, bob.writer().editGrade(grade.name(), 2, new GradeDetails(null, null, null, 40.0)));
            assertEquals(40.0, alice.reader().grades(null).get(0).price());
            assertThrows(NotFoundException.class, () -> alice.writer().editGrade("no such grade", 1, new GradeDetails(null, null, null, null)));
        }
    }

    @ParameterizedTest
    @EnumSource(Engine.class)
    void of_many_concurrent_edits_from_one_version_exactly_one_wins(Engine engine) throws Exception {
        DatabaseLocation location = TestLibraries.freshLocation(engine);
        try (Library first = Library.open(location); Library second = Library.open(location)) {
            GradeInfo grade = new GradeInfo("Invented N38UH", FAMILY, null, null, null, null);
            first.writer().importBatch(TestLibraries.importInfo("a.csv", 1, 0, 0), List.of(grade), List.of(), List.of());
            int editors = 6;
            CyclicBarrier start = new CyclicBarrier(editors);
            ExecutorService pool = Executors.newFixedThreadPool(editors);
            List<Future<Boolean>> outcomes = new ArrayList<>();
            for (int e = 0; e < editors; e++) {
                double price = 10 + e;
                Library library = e % 2 == 0 ? first : second;
                outcomes.add(pool.submit(() -> {
                    start.await();
                    try {
                        library.writer().editGrade(grade.name(), 1, new GradeDetails(null, null, null, price));
                        return true;
                    } catch (ConflictException lost) {
                        return false;
                    }
                }));
            }
            int winners = 0;
            for (Future<Boolean> outcome : outcomes) {
                winners += outcome.get() ? 1 : 0;
            }
            pool.shutdown();
            assertEquals(1, winners);
            assertEquals(2, second.reader().storedGrade(grade.name()).orElseThrow().version());
        }
    }

    @Test
    void an_unreachable_server_is_reported_as_unavailable_with_the_address_and_no_password() {
        var error = assertThrows(UnavailableException.class, () -> Library.open(
                new DatabaseLocation("jdbc:postgresql://127.0.0.1:1/kneepoint?connectTimeout=2", "team", "s3cret-pass")));
        assertTrue(error.getMessage().startsWith("the library database at jdbc:postgresql://127.0.0.1:1/kneepoint?connectTimeout=2 (as team) "
                + "cannot be reached ("), error.getMessage());
        assertTrue(error.getMessage().contains("Connection refused"), error.getMessage());
        assertTrue(!error.getMessage().contains("s3cret"), error.getMessage());
    }
}
