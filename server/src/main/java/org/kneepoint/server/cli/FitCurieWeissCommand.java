package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFit;
import org.kneepoint.fitter.model.curieweiss.CurieWeissFitter;
import org.kneepoint.server.text.CurieWeissFitView;
import org.kneepoint.server.library.SusceptibilityData;
import org.kneepoint.server.text.Json;
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

    @Option(names = "--json", description = "Print one JSON document (SI units) instead of a table.")
    private boolean json;

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
                        CurieWeissFitView.parameters(fit.parameters()), fit.rmsResidual()));
            }
            var out = spec.commandLine().getOut();
            if (json) {
                var document = CurieWeissFitView.json(fit);
                document.put("source", data.source());
                document.put("material", data.material());
                document.put("form", data.form().name().toLowerCase());
                document.put("saved", save);
                out.println(Json.write(document));
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
