package org.kneepoint.server.cli;

import org.kneepoint.server.app.fits.FitSaving;
import org.kneepoint.server.app.fits.FitTarget;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFit;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFitter;
import org.kneepoint.server.text.CurieWeissFitView;
import org.kneepoint.server.app.grades.SusceptibilityData;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.fits.CurieWeissFitDocument;
import org.kneepoint.server.app.fits.CurieWeissFitParameters;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint fit curie-weiss FILE-or-MATERIAL}: fits χ(T) = C/(T − θ) + χ0 to a
 * susceptibility table or to a material's stored points, in SI volume susceptibility.
 */
@Command(name = "curie-weiss", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Fit the Curie–Weiss law χ(T) = C/(T − θ) + χ0 to susceptibility data.")
final class FitCurieWeissCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE-or-MATERIAL",
            description = "A susceptibility table (header such as 'T [K],chi [SI]'), else a material in the library.")
    private String target;

    @Mixin
    private OutputOptions output;

    @Option(names = "--save", description = "Store the fit in the library with its material (a file's material must be stored).")
    private boolean save;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        Optional<Path> file = FitTarget.file(target);
        try (Library library = file.isEmpty() || save ? libraryOption.open() : null) {
            SusceptibilityData data = file.isPresent() ? SusceptibilityData.fromFile(file.get()) : fromLibrary(library);
            if (save) {
                FitSaving.requireMaterial(library, data.material(), data.source());
            }
            CurieWeissFit fit = fit(data);
            if (save) {
                library.writer().saveFit(FitSaving.record(null, null, null, data.material(), "curie-weiss",
                        CurieWeissFitParameters.of(fit.parameters()), fit.rmsResidual()));
            }
            var out = spec.commandLine().getOut();
            if (output.json) {
                out.println(Json.write(CurieWeissFitDocument.of(data, fit, save)));
            } else {
                out.print(CurieWeissFitView.table(data.source() + ": Curie–Weiss fit to " + data.material()
                        + (save ? " (saved to the library)" : ""), fit));
            }
            out.flush();
        }
        return 0;
    }

    private SusceptibilityData fromLibrary(Library library) {
        if (library.reader().susceptibility(target).isEmpty()) {
            throw FitTarget.notFound("material", target, library);
        }
        return SusceptibilityData.fromLibrary(library.reader(), target);
    }

    private static CurieWeissFit fit(SusceptibilityData data) {
        try {
            return new CurieWeissFitter().fit(data.temperatureK(), data.chiVolume());
        } catch (BadInputException e) {
            throw e.location().isPresent() ? e : new BadInputException(InputLocation.of(data.source()), e.getMessage());
        }
    }
}
