package org.kneepoint.server.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.importer.json.BackupCodec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint restore FILE}: a backup into an empty library, in one transaction. */
@Command(name = "restore", mixinStandardHelpOptions = true, description = "Restore a backup into an empty library.")
final class RestoreCommand implements Callable<Integer> {

    /** Largest backup read: a library of tens of millions of points. */
    private static final long MAX_BACKUP_BYTES = 2L * 1024 * 1024 * 1024 - 1;

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "FILE", description = "A backup written by 'kneepoint backup'.")
    private Path file;

    @Override
    public Integer call() {
        String source = file.getFileName().toString();
        String text;
        try {
            if (Files.size(file) > MAX_BACKUP_BYTES) {
                throw new BadInputException(InputLocation.of(source), "the backup is larger than 2 GiB");
            }
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new BadInputException(InputLocation.of(source), "no such file (looked for " + file + ")");
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the file: " + e.getMessage());
        }
        LibrarySnapshot snapshot = BackupCodec.read(source, text);
        try (Library library = libraryOption.open()) {
            library.writer().restore(snapshot);
        }
        spec.commandLine().getOut().printf("restored %d grades, %d curves (%d points), %d susceptibility points, %d fits%n",
                snapshot.grades().size(), snapshot.curves().size(), snapshot.pointCount(), snapshot.susceptibility().size(),
                snapshot.fits().size());
        spec.commandLine().getOut().flush();
        return 0;
    }
}
