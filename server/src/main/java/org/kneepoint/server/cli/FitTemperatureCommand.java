package org.kneepoint.server.cli;

import org.kneepoint.server.app.fits.FitSaving;
import org.kneepoint.server.app.fits.KneeFitData;

import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.fits.TemperatureFitDocument;
import org.kneepoint.server.app.fits.TemperatureFitParameters;
import org.kneepoint.server.text.TemperatureFitView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint fit temperature FILE-or-GRADE}: the temperature model and α, β from curves at several temperatures. */
@Command(name = "temperature", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Fit the temperature model: knee fits at each temperature, α of Br and β of HcJ (linear and quadratic).")
final class FitTemperatureCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE-or-GRADE", description = "A curve file with several temperatures, else a grade in the library.")
    private String target;

    @Mixin
    private OutputOptions output;

    @Option(names = "--save", description = "Store the fit in the library with its grade.")
    private boolean save;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        try (Library library = KneeFitData.isFile(target) && !save ? null : libraryOption.open()) {
            KneeFitData data = KneeFitData.of(target, library);
            if (save) {
                FitSaving.requireGrade(library, data.grade(), data.source());
            }
            TemperatureFit fit;
            try {
                fit = TemperatureModelFitter.fit(data.curves());
            } catch (BadInputException e) {
                throw new BadInputException(InputLocation.of(data.source()), e.getMessage());
            }
            if (save) {
                library.writer().saveFit(FitSaving.record(data.grade(), null, null, null, "temperature",
                        TemperatureFitParameters.of(fit), fit.fits().stream().mapToDouble(f -> f.rmsJ()).max().orElse(0)));
            }
            var out = spec.commandLine().getOut();
            out.print(output.json ? Json.write(TemperatureFitDocument.of(fit)) + System.lineSeparator()
                    : TemperatureFitView.table(data.source(), fit) + (save ? "saved to the library\n" : ""));
            out.flush();
        }
        return 0;
    }
}
