package org.kneepoint.server.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.server.library.LibrarySelection;
import org.kneepoint.server.library.SelectionRow;
import org.kneepoint.server.library.SelectionSort;
import org.kneepoint.server.text.Json;
import org.kneepoint.server.text.SelectionView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint select (--pc P | SHAPE) --temperature T ...}: every grade of the library against the
 * requirements, ranked, with pass or fail and the reasons (DESIGN §2, workflow 4).
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

    @Option(names = "--opposing-field", converter = QuantityConverters.FieldStrength.class, defaultValue = "0",
            description = "External field against the magnetization, e.g. 200kA/m (default: ${DEFAULT-VALUE}).")
    private double opposingField;

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

    @Option(names = "--json", description = "Print a JSON array (SI units) instead of a table.")
    private boolean json;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        RankingOrder order = SelectionSort.of(sort);
        Requirements requirements = new Requirements(new LoadLine(loadLine.pc(), opposingField), temperature, minimumFluxDensity,
                maximumLossPercent / 100.0);
        List<SelectionRow> rows;
        try (Library library = libraryOption.open()) {
            rows = LibrarySelection.rank(library.reader(), family, requirements, order);
        }
        var out = spec.commandLine().getOut();
        out.print(json ? Json.write(SelectionView.json(rows, requirements)) + System.lineSeparator()
                : SelectionView.table(rows, requirements, loadLine.describe(), SelectionSort.describe(order)));
        out.flush();
        return 0;
    }
}
