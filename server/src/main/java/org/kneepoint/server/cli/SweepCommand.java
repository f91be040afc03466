package org.kneepoint.server.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.SweepRequest;
import org.kneepoint.server.app.design.SweepRun;
import org.kneepoint.server.chart.SweepChart;
import org.kneepoint.server.text.SweepView;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint sweep [GRADE] (--pc P | SHAPE) --from T1 --to T2 --step dT [--opposing-field H | --external-field H]
 * [--json] [-o FILE.svg|.png|.csv]}: the check at every temperature of a range (issue 14, item 4) — B, H, J, reversible
 * and irreversible loss, knee margin — with the working temperatures for the loss limit.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "The check of a magnet on its load line at every temperature of a range, with the working temperatures.")
final class SweepCommand implements Callable<Integer> {

    private static final int WIDTH = 900;
    private static final int HEIGHT = 560;

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

    @Option(names = "--from", required = true, converter = QuantityConverters.Temperature.class, description = "First temperature, e.g. 20C.")
    private double from;

    @Option(names = "--to", required = true, converter = QuantityConverters.Temperature.class, description = "Last temperature, e.g. 180C.")
    private double to;

    @Option(names = "--step", required = true, converter = KelvinStep.class,
            description = "Step between temperatures in kelvin, e.g. 5K (the last temperature is --to even when the steps miss it).")
    private double step;

    @Mixin
    private FieldOptions field;

    @Option(names = "--loss-limit", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Irreversible loss allowed at the working temperatures marked (default: ${DEFAULT-VALUE}).")
    private double lossLimitPercent;

    @Mixin
    private OutputOptions output;

    @Mixin
    private ShortfallOption shortfall;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Also write FILE.svg or FILE.png (the chart) or FILE.csv (the table).")
    private Path file;

    @Override
    public Integer call() throws IOException {
        String kind = file == null ? null : kind(file);
        SweepRun run = DesignChecks.sweep(new SweepRequest(grade.choice(gradeName), loadLine.spec(), from, to, step, field.field(),
                lossLimitPercent / 100.0), name -> GradeOptions.stored(name, libraryOption));
        if (kind != null) {
            String title = "Temperature sweep, Pc = " + String.format(Locale.ROOT, "%.3g", run.pc());
            switch (kind) {
                case "svg" -> OutputFile.write(file, SweepChart.svg(title, run, WIDTH, HEIGHT));
                case "csv" -> OutputFile.write(file, SweepView.csv(run));
                default -> writePng(SweepChart.png(title, run, WIDTH, HEIGHT));
            }
        }
        output.print(spec.commandLine().getOut(), run::document, () -> SweepView.table(run));
        return shortfall.exitCode(run.verdict());
    }

    private static String kind(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (String kind : new String[] {"svg", "png", "csv"}) {
            if (name.endsWith("." + kind)) {
                return kind;
            }
        }
        throw new BadInputException(InputLocation.of("option -o"), "the sweep is written as .svg, .png or .csv, got '" + file + "'");
    }

    private void writePng(byte[] png) throws IOException {
        Path temporary = Files.createTempFile(file.toAbsolutePath().getParent(), ".kneepoint-sweep-", ".part");
        try {
            Files.write(temporary, png);
            Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /** A temperature step in kelvin: "5K" or a plain number; never °C, which names a temperature, not a difference. */
    static final class KelvinStep implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            String digits = text.strip().endsWith("K") ? text.strip().substring(0, text.strip().length() - 1).strip() : text.strip();
            try {
                return Double.parseDouble(digits);
            } catch (NumberFormatException e) {
                throw new CommandLine.TypeConversionException("expected a step in kelvin such as 5K, got '" + text + "'");
            }
        }
    }
}
