package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DamagedDataException;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.db.VerifyReport;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.importer.json.BackupCodec;

/**
 * Flipped bits in the embedded database file never give changed values silently (issue 13, item
 * 2): in {@value #TRIES} copies of the demo library, each with one bit flipped at a seeded random
 * place of its file, opening, reading everything and {@code verify} either give exactly the values
 * of the sound library, or refuse with a known error of one line (damaged, or cannot be opened).
 * A read that refuses is never followed by a verify that finds the library sound.
 */
@Tag("slow")
class FlippedBytesTest {

    private static final int TRIES = 80;
    private static final long SEED = 20261205L;

    @Test
    void a_flipped_bit_is_refused_or_changes_no_value(@TempDir Path folder) throws Exception {
        Path sound = folder.resolve("sound");
        assertEquals(0, CliRun.of("demo", "--db", sound.toString()).exitCode());
        String reference;
        try (Library library = Library.open(DatabaseLocation.ofFolder(sound))) {
            reference = BackupCodec.write(library.reader().snapshot());
            assertTrue(library.reader().verify().clean());
        }
        byte[] file = Files.readAllBytes(sound.resolve("kneepoint.mv.db"));
        Random random = new Random(SEED);
        int refusedAtOpen = 0;
        int refusedAtRead = 0;
        int unchanged = 0;
        List<String> silent = new ArrayList<>();
        for (int attempt = 0; attempt < TRIES; attempt++) {
            int position = random.nextInt(file.length);
            byte[] damaged = file.clone();
            damaged[position] ^= (byte) (1 << random.nextInt(8));
            Path copy = Files.createDirectories(folder.resolve("try-" + attempt));
            Files.write(copy.resolve("kneepoint.mv.db"), damaged);
            // The version the file had when last closed, kept beside it: a file fallen back to an earlier version is refused.
            Files.copy(sound.resolve("kneepoint.version"), copy.resolve("kneepoint.version"));
            String place = "bit flipped at byte " + position;
            Library library;
            try {
                library = Library.open(DatabaseLocation.ofFolder(copy));
            } catch (KneepointException e) {
                assertOneLine(e, place);
                refusedAtOpen++;
                continue;
            }
            try (library) {
                String read;
                try {
                    read = BackupCodec.write(library.reader().snapshot());
                } catch (DamagedDataException e) {
                    assertOneLine(e, place);
                    VerifyReport report = library.reader().verify();
                    assertFalse(report.clean(), place + ": a read refused (" + e.getMessage() + ") but verify found the library sound");
                    refusedAtRead++;
                    continue;
                }
                if (!read.equals(reference)) {
                    silent.add(place);
                    continue;
                }
                VerifyReport report = library.reader().verify();
                if (report.clean()) {
                    unchanged++;
                } else {
                    refusedAtRead++;
                }
            }
        }
        System.out.printf("FlippedBytesTest: %d tries: %d refused when opened, %d refused when read or verified, %d unchanged, %d changed silently%n",
                TRIES, refusedAtOpen, refusedAtRead, unchanged, silent.size());
        assertEquals(List.of(), silent, "values changed with no error");
        assertEquals(TRIES, refusedAtOpen + refusedAtRead + unchanged);
    }

    private static void assertOneLine(KneepointException error, String place) {
        assertTrue(error.getMessage() != null && !error.getMessage().isBlank() && error.getMessage().lines().count() == 1,
                place + ": " + error.getMessage());
    }
}
