package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;

/**
 * Faults of the embedded library's files (issue 13, item 5), each one line on standard error, exit
 * 4 (UNAVAILABLE), nothing half-written: another program holds the library (waited for, then
 * told), the library's folder is read-only, the disk is full (a child process whose file size
 * limit, {@code ulimit -f}, lets the import outgrow the file).
 */
@Tag("slow")
class LibraryFaultsTest {

    @TempDir
    Path folder;

    private Path library;
    private Map<String, Integer> before;

    @BeforeEach
    void demo() {
        library = folder.resolve("library");
        assertEquals(0, CliRun.of("demo", "--db", library.toString()).exitCode());
        before = rowCounts();
    }

    @Test
    void a_library_another_program_holds_is_waited_for_then_told_with_exit_4() throws Exception {
        ServerProcess holder = ServerProcess.start(library, folder);
        try {
            CliRun grades = CliRun.of("grades", "--db", library.toString());
            assertEquals(4, grades.exitCode(), grades.out() + grades.err());
            assertEquals(1, grades.err().lines().count(), grades.err());
            assertTrue(grades.err().startsWith("kneepoint: another program holds the library at "), grades.err());
        } finally {
            holder.kill();
        }
        assertEquals(before, rowCounts());
    }

    @Test
    void a_read_only_library_is_told_with_exit_4_and_nothing_written() throws Exception {
        Path file = LargeCurveFile.write(folder.resolve("large.csv"), 3, 200);
        Files.setPosixFilePermissions(library.resolve("kneepoint.mv.db"), PosixFilePermissions.fromString("r--r--r--"));
        Files.setPosixFilePermissions(library, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            Child write = Child.run(folder, asUnprivileged(ServerProcess.javaCommand("import", file.toString(), "--db", library.toString())));
            assertEquals(4, write.exitCode(), write.out() + write.err());
            assertEquals(1, write.err().lines().count(), write.err());
            assertTrue(write.err().contains("cannot be written: its folder or file is read-only"), write.err());
        } finally {
            Files.setPosixFilePermissions(library, PosixFilePermissions.fromString("rwxr-xr-x"));
            Files.setPosixFilePermissions(library.resolve("kneepoint.mv.db"), PosixFilePermissions.fromString("rw-r--r--"));
        }
        assertEquals(before, rowCounts());
    }

    @Test
    void a_full_disk_is_told_with_exit_4_and_nothing_written() throws Exception {
        Path file = LargeCurveFile.write(folder.resolve("large.csv"), 20, 5_000);
        long limitKiB = Files.size(library.resolve("kneepoint.mv.db")) / 1024 + 256;
        List<String> command = new ArrayList<>(List.of("bash", "-c", "ulimit -f " + limitKiB + " && exec \"$@\"", "limited"));
        command.addAll(ServerProcess.javaCommand("import", file.toString(), "--db", library.toString()));
        Child write = Child.run(folder, command);
        assertEquals(4, write.exitCode(), write.out() + write.err());
        assertEquals(1, write.err().lines().count(), write.err());
        assertTrue(write.err().startsWith("kneepoint: the disk holding the library at "), write.err());
        assertEquals(before, rowCounts());
    }

    /**
     * Root may write a read-only folder, so as root the child runs as the user nobody, allowed only
     * to read every file (the capability CAP_DAC_READ_SEARCH, for the class path), via setpriv.
     */
    private static List<String> asUnprivileged(List<String> command) throws IOException, InterruptedException {
        Process id = new ProcessBuilder("id", "-u").start();
        String uid = new String(id.getInputStream().readAllBytes()).strip();
        id.waitFor();
        if (!uid.equals("0")) {
            return command;
        }
        List<String> wrapped = new ArrayList<>(List.of("setpriv", "--reuid=65534", "--regid=65534", "--clear-groups",
                "--inh-caps=+dac_read_search", "--ambient-caps=+dac_read_search"));
        wrapped.addAll(command);
        return wrapped;
    }

    private Map<String, Integer> rowCounts() {
        try (Library opened = Library.open(DatabaseLocation.ofFolder(library))) {
            assertTrue(opened.reader().verify().clean(), "the library is sound");
            return opened.reader().rowCounts();
        }
    }

    /** A finished child process: exit code, standard output and error. */
    private record Child(int exitCode, String out, String err) {

        static Child run(Path folder, List<String> command) throws IOException, InterruptedException {
            Path out = Files.createTempFile(folder, "child", ".out");
            Path err = Files.createTempFile(folder, "child", ".err");
            Process process = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            if (!process.waitFor(120, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                throw new IllegalStateException("the child did not end: " + command);
            }
            return new Child(process.exitValue(), Files.readString(out), Files.readString(err));
        }
    }
}
