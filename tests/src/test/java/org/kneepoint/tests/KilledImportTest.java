package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.awaitility.Awaitility;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

/**
 * A child JVM killed with SIGKILL in the middle of a large import leaves the library exactly as it
 * was before, and the library opens cleanly afterwards (one transaction per import, docs/design.md §5).
 */
@Tag("slow")
class KilledImportTest {

    private static final Path JAR = Path.of("..", "server", "target", "kneepoint.jar");

    @Test
    void a_killed_import_leaves_the_library_as_it_was(@TempDir Path folder) throws Exception {
        Path libraryFolder = folder.resolve("library");
        assertEquals(0, CliRun.of("demo", "--db", libraryFolder.toString()).exitCode());
        Map<String, Integer> before;
        try (Library library = Library.open(DatabaseLocation.ofFolder(libraryFolder))) {
            before = library.reader().rowCounts();
        }
        Path big = LargeCurveFile.write(folder.resolve("large.csv"), 100, 20_000);
        Path databaseFile = libraryFolder.resolve("kneepoint.mv.db");
        long sizeBefore = Files.size(databaseFile);

        Process child = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar", JAR.toString(), "import", big.toString(), "--db", libraryFolder.toString())
                .redirectOutput(folder.resolve("child-out.txt").toFile()).redirectError(folder.resolve("child-err.txt").toFile()).start();
        Awaitility.await("the import writing into the library, or ending").atMost(Duration.ofSeconds(120)).pollInterval(Duration.ofMillis(2))
                .until(() -> !child.isAlive() || Files.size(databaseFile) >= sizeBefore + 300_000);
        assertTrue(child.isAlive(), "the import was still running when it was killed: " + Files.readString(folder.resolve("child-err.txt")));
        child.destroyForcibly();
        assertTrue(child.waitFor(30, TimeUnit.SECONDS));
        assertEquals(137, child.exitValue(), "killed by SIGKILL");

        try (Library library = Library.open(DatabaseLocation.ofFolder(libraryFolder))) {
            assertEquals(before, library.reader().rowCounts());
            assertTrue(library.reader().importWithChecksum(org.kneepoint.server.app.imports.FileChecksum.sha256(big)).isEmpty());
        }
        CliRun grades = CliRun.of("grades", "--json", "--db", libraryFolder.toString());
        assertEquals(0, grades.exitCode(), grades.err());
    }
}
