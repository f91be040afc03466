package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.LocalKneeCheck;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.server.text.CheckView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint check (--pc P | SHAPE) --br ... --temperature T}: a typed-in grade on its load line
 * at a temperature — operating point, margin to the knee, reversible and irreversible loss, maximum
 * working temperature (DESIGN §2, workflow 3).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Operating point, knee margin, flux loss and maximum working temperature of a magnet on its load line.")
final class CheckCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LoadLineOptions loadLine;

    @Mixin
    private GradeOptions grade;

    @Option(names = "--temperature", required = true, converter = QuantityConverters.Temperature.class,
            description = "Temperature of the magnet, e.g. 120C.")
    private double temperature;

    @Option(names = "--opposing-field", converter = QuantityConverters.FieldStrength.class, defaultValue = "0",
            description = "External field against the magnetization, e.g. 200kA/m (default: ${DEFAULT-VALUE}).")
    private double opposingField;

    @Option(names = "--loss-limit", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Irreversible loss allowed at the maximum working temperature (default: ${DEFAULT-VALUE}).")
    private double lossLimitPercent;

    @Option(names = "--json", description = "Print one JSON document (SI units).")
    private boolean json;

    @Override
    public Integer call() {
        LoadLine line = new LoadLine(loadLine.pc(), opposingField);
        LinearTemperatureLaw law = grade.law();
        DesignCheckResult result = DesignCheck.of(law, line, temperature, lossLimitPercent / 100.0);
        var out = spec.commandLine().getOut();
        if (json) {
            out.print(Json.write(CheckView.json(result)) + System.lineSeparator());
        } else {
            LocalKneeResult local = loadLine.shape()
                    .map(shape -> LocalKneeCheck.of(shape, law.at(temperature), line, LocalKneeCheck.DEFAULT_RESOLUTION))
                    .orElse(null);
            out.print(CheckView.table(loadLine.describe(), result, lossLimitPercent / 100.0, local));
        }
        out.flush();
        return 0;
    }
}
