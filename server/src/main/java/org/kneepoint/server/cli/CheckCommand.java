package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.LocalKneeCheck;
import org.kneepoint.fitter.loadline.LocalKneeResult;
import org.kneepoint.server.library.GradeModel;
import org.kneepoint.server.text.CheckView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint check [GRADE] (--pc P | SHAPE) [--br ...] --temperature T}: a grade of the library, or one
 * typed in, on its load line at a temperature — operating point, margin to the knee, reversible and irreversible
 * loss, maximum working temperature (DESIGN §2, workflow 3).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Operating point, knee margin, flux loss and maximum working temperature of a magnet on its load line.")
final class CheckCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LoadLineOptions loadLine;

    @Parameters(arity = "0..1", paramLabel = "GRADE",
            description = "A grade of the library (its temperature model); without it, type the grade in with --br, --mu-rec, --hcj.")
    private String gradeName;

    @Mixin
    private GradeOptions grade;

    @Mixin
    private LibraryOption libraryOption;

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

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report (inputs, results, chart, assumptions, sources, cautions).")
    private java.nio.file.Path report;

    @Override
    public Integer call() {
        LoadLine line = new LoadLine(loadLine.pc(), opposingField);
        GradeModel model = grade.model(gradeName, libraryOption);
        DesignCheckResult result = DesignCheck.of(model.model(), line, temperature, lossLimitPercent / 100.0);
        boolean extrapolated = model.extrapolated(result);
        if (report != null) {
            if (!report.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".html")) {
                throw new org.kneepoint.fitter.error.BadInputException(org.kneepoint.fitter.error.InputLocation.of("option --report"),
                        "the report is an .html file, got '" + report + "'");
            }
            var run = new org.kneepoint.server.http.DesignRequests.CheckRun(model, loadLine.spec(), result, lossLimitPercent / 100.0, extrapolated);
            String inputs = String.join(" ", spec.commandLine().getParseResult().originalArgs());
            OutputFile.write(report, org.kneepoint.server.web.CheckReport.html(run, "kneepoint " + inputs, VersionInfo.version()));
        }
        var out = spec.commandLine().getOut();
        if (json) {
            out.print(Json.write(CheckView.json(result, extrapolated)) + System.lineSeparator());
        } else {
            LocalKneeResult local = loadLine.shape()
                    .map(shape -> LocalKneeCheck.of(shape, model.model().at(temperature), line, LocalKneeCheck.DEFAULT_RESOLUTION))
                    .orElse(null);
            out.print(CheckView.table(model.description(), loadLine.describe(), result, lossLimitPercent / 100.0, local,
                    extrapolated));
        }
        out.flush();
        return 0;
    }
}
