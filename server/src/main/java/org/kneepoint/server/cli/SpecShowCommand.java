package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.lots.SpecificationDocument;
import org.kneepoint.server.app.lots.Specifications;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kneepoint spec show GRADE [--json]}. */
@Command(name = "show", mixinStandardHelpOptions = true, description = "Show a grade's specifications, one per temperature.")
final class SpecShowCommand implements Callable<Integer> {

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
        SpecificationDocument document;
        try (Library library = libraryOption.open()) {
            document = Specifications.show(library, grade);
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.specifications(document));
        return 0;
    }
}
