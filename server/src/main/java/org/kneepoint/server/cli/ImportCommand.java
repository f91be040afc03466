package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportRun;
import org.kneepoint.server.text.ImportView;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.imports.ImportReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint import FILE...}: reads, checks and stores curve files and susceptibility tables in one transaction. */
@Command(name = "import", mixinStandardHelpOptions = true,
        description = "Import curve files and susceptibility tables into the library (all or nothing).")
final class ImportCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Curve files (.csv, .tsv, .txt, .json) or susceptibility tables.")
    private List<Path> files;

    @Option(names = "--dry-run", description = "Read and check everything, report what would be imported, write nothing.")
    private boolean dryRun;

    @Mixin
    private OutputOptions output;

    @Option(names = "--max-file-size", paramLabel = "BYTES", defaultValue = "" + ReadLimits.DEFAULT_MAX_BYTES,
            description = "Refuse files larger than this (default: ${DEFAULT-VALUE} bytes).")
    private long maxFileSize;

    @Override
    public Integer call() {
        try (Library library = libraryOption.open()) {
            List<ImportPlan> plans = ImportRun.run(library, SizeLimit.of(maxFileSize), files, dryRun);
            var out = spec.commandLine().getOut();
            out.print(output.json ? Json.write(ImportReport.of(plans, dryRun)) + System.lineSeparator() : ImportView.table(plans, dryRun));
            out.flush();
        }
        return 0;
    }
}
