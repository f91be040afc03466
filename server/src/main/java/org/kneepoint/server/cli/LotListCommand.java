package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.lots.LotListDocument;
import org.kneepoint.server.app.lots.LotListing;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kneepoint lot list GRADE [--json]}. */
@Command(name = "list", mixinStandardHelpOptions = true, description = "List a grade's lots with their samples and temperatures.")
final class LotListCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name as the library has it.")
    private String grade;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        LotListDocument document;
        try (Library library = libraryOption.open()) {
            document = LotListing.list(library, grade);
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.list(document));
        return 0;
    }
}
