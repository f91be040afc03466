package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.lots.LotImport;
import org.kneepoint.server.app.lots.LotImportDocument;
import org.kneepoint.server.app.lots.LotImportRequest;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kneepoint lot import GRADE --lot ID FILE... [--measured-on DATE] [--sample S] [--notes N]}. */
@Command(name = "import", mixinStandardHelpOptions = true, description = {
        "Store curves measured on samples of a delivered lot, apart from the grade's reference curves (all or nothing).",
        "Without --sample each file is one sample, named after the file."})
final class LotImportCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(index = "0", paramLabel = "GRADE", description = "The grade the lot is of, as the library has it.")
    private String grade;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "FILE", description = "Curve files (.csv, .tsv, .txt, .json).")
    private List<Path> files;

    @Option(names = "--lot", required = true, paramLabel = "ID", description = "The lot's identifier (unique within the grade).")
    private String lot;

    @Option(names = "--measured-on", paramLabel = "DATE", description = "The day the samples were measured, e.g. 2026-11-30.")
    private LocalDate measuredOn;

    @Option(names = "--sample", paramLabel = "S", description = "The sample every file was measured on.")
    private String sample;

    @Option(names = "--notes", paramLabel = "TEXT", description = "Free text about the lot.")
    private String notes;

    @Option(names = "--max-file-size", paramLabel = "BYTES", defaultValue = "" + ReadLimits.DEFAULT_MAX_BYTES,
            description = "Refuse files larger than this (default: ${DEFAULT-VALUE} bytes).")
    private long maxFileSize;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        LotImportDocument document;
        try (Library library = libraryOption.open()) {
            document = LotImport.run(library, SizeLimit.of(maxFileSize), new LotImportRequest(grade, lot, files, measuredOn, sample, notes));
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.imported(document));
        return 0;
    }
}
