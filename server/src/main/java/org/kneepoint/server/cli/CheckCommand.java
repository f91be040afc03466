package org.kneepoint.server.cli;

import org.kneepoint.server.app.version.VersionInfo;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.server.app.design.CheckRequest;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.ToleranceRequest;
import org.kneepoint.server.app.version.VersionInfo;
import org.kneepoint.server.text.CheckView;
import org.kneepoint.server.text.ToleranceView;
import org.kneepoint.server.web.CheckReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint check [GRADE] (--pc P | SHAPE) [--br ...] --temperature T [--tolerance NAME=SPEC ...]}: a grade of
 * the library, or one typed in, on its load line at a temperature — operating point, margin to the knee, reversible
 * and irreversible loss, maximum working temperature (docs/design.md §2, workflow 3) — and, with tolerances, a study of
 * how they spread (issue 14).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Operating point, knee margin, flux loss and maximum working temperature of a magnet on its load line.")
final class CheckCommand implements Callable<Integer> {

    private static final ToleranceRequest.OptionNames NAMES =
            new ToleranceRequest.OptionNames("--tolerance", "--distribution", "--samples", "--seed");

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

    @Mixin
    private FieldOptions field;

    @Option(names = "--loss-limit", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Irreversible loss allowed at the minimum and maximum working temperatures (default: ${DEFAULT-VALUE}).")
    private double lossLimitPercent;

    @Option(names = "--tolerance", paramLabel = "NAME=SPEC",
            description = "A tolerance band for a study of the check, repeatable: NAME one of br, hcj, mu-rec, knee, pc, diameter,"
                    + " inner-diameter, length, width, depth, thickness, temperature, opposing-field, external-field; SPEC e.g."
                    + " ±2%, +-2%, ±0.05mm, ±5K or -5%..+0%. A band is a 3σ process limit.")
    private List<String> tolerances;

    @Option(names = "--distribution", paramLabel = "normal|uniform",
            description = "How a value spreads over its band: normal (3σ = the band, truncated at its ends; the default) or uniform.")
    private String distribution;

    @Option(names = "--samples", paramLabel = "N", description = "Samples of the tolerance study (default 10000).")
    private Integer samples;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of the tolerance study's random numbers (default 14: a study repeats).")
    private Long seed;

    @Mixin
    private OutputOptions output;

    @Mixin
    private ShortfallOption shortfall;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report (inputs, results, chart, assumptions, sources, cautions).")
    private Path report;

    @Override
    public Integer call() {
        CheckRequest request = new CheckRequest(grade.choice(gradeName), loadLine.spec(), temperature, field.field(),
                lossLimitPercent / 100.0);
        ToleranceRequest tolerance = ToleranceRequest.of(tolerances, distribution, samples, seed, NAMES);
        CheckRun run = DesignChecks.check(request, tolerance, name -> GradeOptions.stored(name, libraryOption));
        if (report != null) {
            if (!report.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".html")) {
                throw new BadInputException(InputLocation.of("option --report"), "the report is an .html file, got '" + report + "'");
            }
            String inputs = String.join(" ", spec.commandLine().getParseResult().originalArgs());
            OutputFile.write(report, CheckReport.html(run, "kneepoint " + inputs, VersionInfo.version()));
        }
        output.print(spec.commandLine().getOut(), run::document, () -> CheckView.table(run) + ToleranceView.table(run));
        return shortfall.exitCode(run.verdict());
    }
}
