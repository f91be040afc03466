package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.lots.LotHistory;
import org.kneepoint.server.app.lots.LotHistoryDocument;
import org.kneepoint.server.app.lots.LotHistoryRequest;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kneepoint lot history GRADE [--temperature T] [--json]}. */
@Command(name = "history", mixinStandardHelpOptions = true, description = {
        "Every lot's Br, HcJ, (BH)max and Hk/HcJ at one temperature in order of measurement, with mean, standard deviation",
        "and Cpk = (mean - minimum)/(3 sigma) against the specification (Cpk from 5 lots on)."})
final class LotHistoryCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name as the library has it.")
    private String grade;

    @Option(names = "--temperature", paramLabel = "T", converter = QuantityConverters.Temperature.class,
            description = "The measurement temperature, e.g. 20C. Default: the specification's temperature nearest 20 °C, else 20 °C.")
    private Double temperatureK;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        LotHistoryDocument document;
        try (Library library = libraryOption.open()) {
            document = LotHistory.run(library, new LotHistoryRequest(grade, temperatureK));
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.history(document));
        return 0;
    }
}
