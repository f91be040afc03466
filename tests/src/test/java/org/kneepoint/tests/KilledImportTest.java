package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

/**
 * A child JVM killed with SIGKILL in the middle of a large import leaves the library exactly as it
 * was before, and the library opens cleanly afterwards (one transaction per import, DESIGN §5).
 */
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
        Path big = writeLargeFile(folder.resolve("large.csv"), 50, 20_000);
        Path databaseFile = libraryFolder.resolve("kneepoint.mv.db");
        long sizeBefore = Files.size(databaseFile);

        Process child = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar", JAR.toString(), "import", big.toString(), "--db", libraryFolder.toString())
                .redirectOutput(folder.resolve("child-out.txt").toFile()).redirectError(folder.resolve("child-err.txt").toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (child.isAlive() && Files.size(databaseFile) < sizeBefore + 2_000_000 && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        assertTrue(child.isAlive(), "the import was still running when it was killed: " + Files.readString(folder.resolve("child-err.txt")));
        child.destroyForcibly();
        assertTrue(child.waitFor(30, TimeUnit.SECONDS));
        assertEquals(137, child.exitValue(), "killed by SIGKILL");

        try (Library library = Library.open(DatabaseLocation.ofFolder(libraryFolder))) {
            assertEquals(before, library.reader().rowCounts());
            assertTrue(library.reader().importWithChecksum(org.kneepoint.server.library.FileChecksum.sha256(big)).isEmpty());
        }
        CliRun grades = CliRun.of("grades", "--json", "--db", libraryFolder.toString());
        assertEquals(0, grades.exitCode(), grades.err());
    }

    /** {@code curves} invented curves of {@code points} points each, in the long layout (a T column). */
    static Path writeLargeFile(Path file, int curves, int points) throws IOException {
        try (BufferedWriter out = Files.newBufferedWriter(file)) {
            out.write("# grade: Invented large grade\n# family: invented family\n# source: invented for a test\n");
            out.write("T [K],H [A/m],J [T]\n");
            for (int c = 0; c < curves; c++) {
                double temperature = 250 + 4 * c;
                for (int i = 0; i < points; i++) {
                    double h = 1e5 - 1.7e6 * i / (points - 1.0);
                    double j = h <= -1.5e6 ? 0 : (1.3 + 6.3e-8 * h) * (1 - Math.exp(-(h + 1.5e6) / 4e4));
                    out.write(String.format(Locale.ROOT, "%.2f,%.3f,%.6f%n", temperature, h, j));
                }
            }
        }
        return file;
    }

}
