package org.kneepoint.server.cli;

import org.kneepoint.server.app.fits.FitSaving;
import org.kneepoint.server.app.fits.FitTarget;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.QuantityFormatter;
import org.kneepoint.fitter.units.Unit;
import org.kneepoint.fitter.units.UnitCatalog;
import org.kneepoint.server.app.fits.JilesAthertonFitData;
import org.kneepoint.server.app.fits.JilesAthertonFitRun;
import org.kneepoint.server.text.JilesAthertonFitView;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.fits.JilesAthertonFitDocument;
import org.kneepoint.server.app.fits.JilesAthertonFitParameters;
import org.kneepoint.server.text.ProgressBar;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint fit ja FILE-or-GRADE}: identifies Ms, a, k, c, α from a loop or a
 * second-quadrant curve, read from a curve file or from a grade's stored curves. Fits that run
 * longer than a second draw a progress bar on standard error when the console is interactive and
 * {@code --json} is not given.
 */
@Command(name = "ja", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Fit Jiles–Atherton parameters Ms, a, k, c, α to a loop or a second-quadrant curve.")
final class FitJilesAthertonCommand implements Callable<Integer> {

    private static final Unit KILO_AMPERE = UnitCatalog.require("kA/m", Dimension.FIELD_STRENGTH);

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE-or-GRADE",
            description = "A curve file (a '# kind: loop' file in measurement order, or a normal/intrinsic curve), "
                    + "else the name of a grade in the library (its stored loop curve).")
    private String target;

    @Option(names = "--temperature", paramLabel = "T", converter = QuantityConverters.Temperature.class,
            description = "Which curve, when there are several, e.g. 20°C.")
    private Double temperatureK;

    @Option(names = "--magnetizing-field", paramLabel = "FIELD", converter = QuantityConverters.FieldStrength.class,
            description = "Field the sample was magnetized at before the data (needed for a second-quadrant curve), e.g. 3MA/m.")
    private Double magnetizingField;

    @Mixin
    private OutputOptions output;

    @Option(names = "--save", description = "Store the fit in the library with its grade (a file must name a stored grade).")
    private boolean save;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        Optional<Path> file = FitTarget.file(target);
        try (Library library = file.isEmpty() || save ? libraryOption.open() : null) {
            JilesAthertonFitData data = file.isPresent() ? JilesAthertonFitData.fromFile(file.get(), temperatureK, magnetizingField)
                    : fromLibrary(library);
            if (save) {
                FitSaving.requireGrade(library, data.grade(), data.source());
            }
            JilesAthertonFit fit = fit(data);
            if (save) {
                library.writer().saveFit(FitSaving.record(data.grade(), data.curve().temperatureK(),
                        data.curve().kind().name().toLowerCase(), null, "ja",
                        JilesAthertonFitParameters.of(fit.parameters()), fit.rmsB()));
            }
            print(data, fit);
        }
        return 0;
    }

    private JilesAthertonFitData fromLibrary(Library library) {
        if (library.reader().grade(target).isEmpty()) {
            throw FitTarget.notFound("grade", target, library);
        }
        return JilesAthertonFitData.fromGrade(library.reader(), target, temperatureK, magnetizingField);
    }

    private JilesAthertonFit fit(JilesAthertonFitData data) {
        FitProgress progress = output.json || System.console() == null ? FitProgress.ignore()
                : new ProgressBar(spec.commandLine().getErr(), System::nanoTime, "fit ja");
        return JilesAthertonFitRun.fit(data, progress);
    }

    private void print(JilesAthertonFitData data, JilesAthertonFit fit) {
        var out = spec.commandLine().getOut();
        if (output.json) {
            out.println(Json.write(JilesAthertonFitDocument.of(data, fit, save)));
        } else {
            String title = data.source() + ": Jiles–Atherton fit to the " + (data.isLoop() ? "loop" : "second-quadrant curve")
                    + (data.magnetizingField() == null ? "" : " after magnetizing at " + QuantityFormatter.format(data.magnetizingField(), KILO_AMPERE, 5))
                    + (save ? " (saved to the library)" : "");
            out.print(JilesAthertonFitView.table(title, fit));
        }
        out.flush();
    }
}
