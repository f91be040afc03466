package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.lots.LotCheck;
import org.kneepoint.server.app.lots.LotCheckDocument;
import org.kneepoint.server.app.lots.LotCheckRequest;
import org.kneepoint.server.app.lots.Uncertainties;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kneepoint lot check GRADE --lot ID [--json] [--uncertainty br=0.5%,hcj=1%]}. */
@Command(name = "check", mixinStandardHelpOptions = true, description = {
        "Check a lot against the grade's specification and reference curves: per sample and temperature each specified",
        "minimum with its margin and verdict, the largest deviation of J(H) from the reference curve, and the lot's verdict."})
final class LotCheckCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name as the library has it.")
    private String grade;

    @Option(names = "--lot", required = true, paramLabel = "ID", description = "The lot's identifier.")
    private String lot;

    @Option(names = "--uncertainty", paramLabel = "LIST",
            description = "Expanded measurement uncertainties in percent of the value, e.g. br=0.5%,hcj=1%: a value above its minimum"
                    + " by less than its uncertainty is inconclusive, not a pass.")
    private String uncertainty;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        LotCheckRequest request = new LotCheckRequest(grade, lot, Uncertainties.parse(uncertainty, "--uncertainty"));
        LotCheckDocument document;
        try (Library library = libraryOption.open()) {
            document = LotCheck.run(library, request);
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.check(document));
        return 0;
    }
}
