package org.kneepoint.server.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.server.chart.GradeChart;
import org.kneepoint.server.app.grades.GradeCurve;
import org.kneepoint.server.app.grades.GradeCurves;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code kneepoint plot GRADE -o FILE.svg|.png}: the grade page's chart — B and J at every stored
 * temperature, or at the temperatures asked for (modeled where none is stored), knee marked.
 */
@Command(name = "plot", mixinStandardHelpOptions = true, description = "Write a grade's B and J curves as an SVG or PNG chart.")
final class PlotCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name.")
    private String grade;

    @Option(names = "--temperature", paramLabel = "T", split = ",", converter = QuantityConverters.Temperature.class,
            description = "Only these temperatures, e.g. 20C,120C (modeled where no curve is stored). Default: every stored one.")
    private List<Double> temperaturesK;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE", description = "FILE.svg or FILE.png.")
    private Path output;

    @Option(names = "--width", defaultValue = "900", description = "Width in pixels (default ${DEFAULT-VALUE}).")
    private int width;

    @Option(names = "--height", defaultValue = "600", description = "Height in pixels (default ${DEFAULT-VALUE}).")
    private int height;

    @Override
    public Integer call() throws IOException {
        String name = output.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean svg = name.endsWith(".svg");
        if (!svg && !name.endsWith(".png")) {
            throw new BadInputException(InputLocation.of("option -o"), "the chart is written as .svg or .png, got '" + output + "'");
        }
        if (width < 100 || width > 10_000 || height < 100 || height > 10_000) {
            throw new BadInputException("width and height must be between 100 and 10000 pixels, got " + width + " × " + height);
        }
        List<LibraryCurve> curves = new ArrayList<>();
        try (Library library = libraryOption.open()) {
            if (temperaturesK == null) {
                curves.addAll(GradeCurves.stored(library.reader(), grade));
            } else {
                for (double temperature : temperaturesK) {
                    for (GradeCurve curve : GradeCurves.at(library.reader(), grade, temperature)) {
                        curves.add(new LibraryCurve(grade, curve.curve(), curve.source(), null));
                    }
                }
            }
        }
        if (svg) {
            OutputFile.write(output, GradeChart.svg(grade, curves, width, height));
        } else {
            Path temporary = Files.createTempFile(output.toAbsolutePath().getParent(), ".kneepoint-plot-", ".part");
            try {
                Files.write(temporary, GradeChart.png(grade, curves, width, height));
                Files.move(temporary, output, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            } finally {
                Files.deleteIfExists(temporary);
            }
        }
        spec.commandLine().getOut().println(output.getFileName() + ": " + curves.size() + " curves of " + grade);
        spec.commandLine().getOut().flush();
        return 0;
    }
}
