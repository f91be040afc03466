package org.kneepoint.importer.input;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * The content of one input file, read from disk once: its name (for messages), its bytes and
 * their SHA-256 in lower-case hex.
 *
 * @param source the file name, as messages name it
 * @param bytes  the whole content
 * @param sha256 SHA-256 of {@code bytes}, lower-case hex
 */
public record InputFile(String source, byte[] bytes, String sha256) {

    public InputFile {
        bytes = bytes.clone();
    }

    /** Content given in memory (a test, an upload already read); the checksum is computed here. */
    public static InputFile of(String source, byte[] bytes) {
        return new InputFile(source, bytes, sha256(bytes));
    }

    /** Reads a file after checking its size against {@code maxBytes}; every failure is bad input naming the file. */
    public static InputFile load(Path path, long maxBytes) {
        return of(path.getFileName().toString(), readBytes(path, maxBytes));
    }

    /**
     * The text of a file, checked and decoded as {@link #load} and {@link #text} do, without keeping its bytes or their
     * checksum: for large inputs that are read, not imported (a field solver's million elements).
     */
    public static String loadText(Path path, long maxBytes) {
        return decode(path.getFileName().toString(), readBytes(path, maxBytes));
    }

    private static byte[] readBytes(Path path, long maxBytes) {
        String source = path.getFileName().toString();
        try {
            long size = Files.size(path);
            if (size > maxBytes) {
                throw new BadInputException(InputLocation.of(source), String.format(
                        "the file is %d bytes, larger than the limit of %d bytes", size, maxBytes));
            }
            return Files.readAllBytes(path);
        } catch (NoSuchFileException e) {
            throw new BadInputException(InputLocation.of(source), "no such file (looked for " + path + ")");
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
    }

    @Override
    public byte[] bytes() {
        return bytes.clone();
    }

    /** The content as text; anything but valid UTF-8 is refused. A leading byte-order mark is kept. */
    public String text() {
        return decode(source, bytes);
    }

    private static String decode(String source, byte[] content) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(content)).toString();
        } catch (CharacterCodingException e) {
            throw new BadInputException(InputLocation.of(source), "the file is not UTF-8 text");
        }
    }

    private static String sha256(byte[] content) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }
}
