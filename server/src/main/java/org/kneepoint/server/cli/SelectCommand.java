package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.SelectionRequest;
import org.kneepoint.server.app.design.SelectionRun;
import org.kneepoint.server.app.design.SelectionSort;
import org.kneepoint.server.text.SelectionView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint select (--pc P | SHAPE) --temperature T ...}: every grade of the library against the
 * requirements, ranked, with pass or fail and the reasons (docs/design.md §2, workflow 4).
 */
@Command(name = "select", mixinStandardHelpOptions = true,
        description = "Rank every grade of the library against a load line, temperature, opposing field, minimum flux density"
                + " and maximum irreversible loss, with pass or fail and the reasons.")
final class SelectCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LoadLineOptions loadLine;

    @Option(names = "--temperature", required = true, converter = QuantityConverters.Temperature.class,
            description = "Temperature of the magnet, e.g. 120C.")
    private double temperature;

    @Mixin
    private FieldOptions field;

    @Option(names = "--min-flux-density", converter = QuantityConverters.FluxDensity.class,
            description = "Least flux density B at the operating point, e.g. 1T (default: none).")
    private Double minimumFluxDensity;

    @Option(names = "--max-loss", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Largest irreversible loss allowed, also the limit of the maximum working temperature"
                    + " (default: ${DEFAULT-VALUE}).")
    private double maximumLossPercent;

    @Option(names = "--family", paramLabel = "FAMILY", description = "Only grades of this family, e.g. 'sintered SmCo'.")
    private String family;

    @Option(names = "--sort", defaultValue = "flux",
            description = "Order within passing and failing grades: flux, margin, loss, temperature or price (default: ${DEFAULT-VALUE}).")
    private String sort;

    @Mixin
    private OutputOptions output;

    @Mixin
    private ShortfallOption shortfall;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        SelectionRequest request = new SelectionRequest(loadLine.spec(), temperature, field.field(), minimumFluxDensity,
                maximumLossPercent / 100.0, SelectionSort.of(sort), family);
        SelectionRun run;
        try (Library library = libraryOption.open()) {
            run = DesignChecks.select(request, library.reader());
        }
        output.print(spec.commandLine().getOut(), run::document, () -> SelectionView.table(run));
        return shortfall.exitCode(run.verdict());
    }
}
