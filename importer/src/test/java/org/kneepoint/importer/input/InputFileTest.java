package org.kneepoint.importer.input;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.fitter.error.BadInputException;

class InputFileTest {

    @TempDir
    Path folder;

    @Test
    void the_checksum_is_the_sha256_of_the_bytes() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                InputFile.of("abc.txt", "abc".getBytes(StandardCharsets.US_ASCII)).sha256());
    }

    @Test
    void a_file_is_read_with_its_name_bytes_and_text() throws IOException {
        Path file = folder.resolve("curve.csv");
        Files.writeString(file, "H [kA/m],J [T]\n0,1.2\n");
        InputFile input = InputFile.load(file, 1000);
        assertEquals("curve.csv", input.source());
        assertEquals("H [kA/m],J [T]\n0,1.2\n", input.text());
        assertEquals(InputFile.of("x", Files.readAllBytes(file)).sha256(), input.sha256());
    }

    @Test
    void the_bytes_are_copied_in_and_out() {
        byte[] bytes = {1, 2, 3};
        InputFile input = InputFile.of("b", bytes);
        bytes[0] = 9;
        assertArrayEquals(new byte[] {1, 2, 3}, input.bytes());
        assertNotSame(input.bytes(), input.bytes());
    }

    @Test
    void a_file_larger_than_the_limit_is_refused_before_it_is_read() throws IOException {
        Path file = folder.resolve("big.csv");
        Files.write(file, new byte[2000]);
        assertEquals("big.csv: the file is 2000 bytes, larger than the limit of 1000 bytes",
                assertThrows(BadInputException.class, () -> InputFile.load(file, 1000)).getMessage());
    }

    @Test
    void a_missing_file_and_a_folder_are_bad_input_naming_them() throws IOException {
        Path missing = folder.resolve("missing.csv");
        assertEquals("missing.csv: no such file (looked for " + missing + ")",
                assertThrows(BadInputException.class, () -> InputFile.load(missing, 1000)).getMessage());
        Path directory = Files.createDirectory(folder.resolve("dir.csv"));
        assertThrows(BadInputException.class, () -> InputFile.load(directory, 1L << 40));
    }

    @Test
    void text_that_is_not_utf8_is_refused() {
        InputFile latin1 = InputFile.of("latin1.csv", new byte[] {'a', (byte) 0xB0, '\n'});
        assertEquals("latin1.csv: the file is not UTF-8 text", assertThrows(BadInputException.class, latin1::text).getMessage());
    }
}
