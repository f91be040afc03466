package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.kneepoint.db.DamagedDataException;
import org.kneepoint.db.Library;
import org.kneepoint.db.VerifyReport;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.importer.json.BackupCodec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code kneepoint backup FILE}: the whole library to one JSON file (see docs/backup-format.md).
 * The library is verified first: a damaged library is refused (exit 2, no file written).
 */
@Command(name = "backup", mixinStandardHelpOptions = true, description = "Write the whole library to one JSON file.")
final class BackupCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "FILE", description = "The backup file to write.")
    private Path file;

    @Override
    public Integer call() {
        LibrarySnapshot snapshot;
        try (Library library = libraryOption.open()) {
            VerifyReport report = library.reader().verify();
            if (!report.clean()) {
                throw new DamagedDataException("the library is damaged (" + report.damaged().size() + " problems, the first: "
                        + report.damaged().get(0) + "); no backup was written. 'kneepoint verify' lists them all");
            }
            snapshot = library.reader().snapshot();
        }
        OutputFile.write(file, BackupCodec.write(snapshot));
        spec.commandLine().getOut().printf("%s: %d grades, %d curves (%d points), %d susceptibility points, %d fits, %d imports%n",
                file.getFileName(), snapshot.grades().size(), snapshot.curves().size(), snapshot.pointCount(),
                snapshot.susceptibility().size(), snapshot.fits().size(), snapshot.imports().size());
        spec.commandLine().getOut().flush();
        return 0;
    }
}
