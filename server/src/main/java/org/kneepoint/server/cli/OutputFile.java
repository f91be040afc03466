package org.kneepoint.server.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;

/**
 * Writes a command's result file all at once: to a temporary file beside the target, then moved
 * over it, so that a failure never leaves a half-written or truncated file behind.
 */
final class OutputFile {

    private OutputFile() {
    }

    static void write(Path target, String content) {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        try {
            Path temporary = folder.resolve("." + absolute.getFileName() + "." + java.util.UUID.randomUUID() + ".part");
            try {
                Files.writeString(temporary, content, StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.CREATE_NEW,
                        java.nio.file.StandardOpenOption.WRITE);
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(temporary);
            }
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(target.toString()), "cannot write the file: " + e.getMessage());
        }
    }
}
