package org.kneepoint.server.app.fits;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Optional;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.NotFoundException;

/**
 * The FILE-or-NAME argument of the fit commands: an existing regular file is read as a file;
 * anything else is a name (grade or material) looked up in the library.
 */
public final class FitTarget {

    private FitTarget() {
    }

    /** The file the argument names, if it names an existing regular file. */
    public static Optional<Path> file(String argument) {
        try {
            Path path = Path.of(argument);
            return Files.isRegularFile(path) ? Optional.of(path) : Optional.empty();
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }

    public static NotFoundException notFound(String what, String argument, Library library) {
        return new NotFoundException("no file or " + what + " named '" + argument + "' (library at "
                + library.location().describe() + ")");
    }
}
