package org.kneepoint.server.cli;

import org.kneepoint.server.app.fits.FitSaving;
import org.kneepoint.server.app.fits.KneeFitData;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.KneeFitter;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.OneOrMany;
import org.kneepoint.server.app.fits.KneeFitDocument;
import org.kneepoint.server.app.fits.KneeFitParameters;
import org.kneepoint.server.text.KneeFitView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint fit knee FILE-or-GRADE}: the knee model fitted to each curve (or to the one at --temperature). */
@Command(name = "knee", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Fit the knee model (Br, μrec, HcJ, knee width) to each normal or intrinsic curve.")
final class FitKneeCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE-or-GRADE", description = "A curve file, else a grade in the library.")
    private String target;

    @Option(names = "--temperature", paramLabel = "T", converter = QuantityConverters.Temperature.class,
            description = "Only the curve at this temperature, e.g. 120C.")
    private Double temperatureK;

    @Mixin
    private OutputOptions output;

    @Option(names = "--save", description = "Store the fits in the library with their grade and curves.")
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
            List<KneeFitDocument> documents = new ArrayList<>();
            StringBuilder tables = new StringBuilder();
            for (DemagnetizationCurve curve : selected(data)) {
                KneeFit fit = fit(data.source(), curve);
                if (save) {
                    library.writer().saveFit(FitSaving.record(data.grade(), curve.temperatureK(),
                            curve.kind().name().toLowerCase(Locale.ROOT), null, "knee", KneeFitParameters.of(fit.model()), fit.rmsJ()));
                }
                documents.add(KneeFitDocument.of(fit));
                tables.append(KneeFitView.table(data.source(), fit));
            }
            var out = spec.commandLine().getOut();
            out.print(output.json ? Json.write(OneOrMany.of(documents)) + System.lineSeparator()
                    : tables + (save ? "saved to the library\n" : ""));
            out.flush();
        }
        return 0;
    }

    private List<DemagnetizationCurve> selected(KneeFitData data) {
        List<DemagnetizationCurve> curves = temperatureK == null ? data.curves() : data.curves().stream()
                .filter(curve -> curve.temperatureK() != null && Math.abs(curve.temperatureK() - temperatureK) <= 0.01).toList();
        if (curves.isEmpty()) {
            throw new BadInputException(InputLocation.of(data.source()), temperatureK == null ? "no normal or intrinsic curve to fit"
                    : String.format(Locale.ROOT, "no curve at %.2f K", temperatureK));
        }
        return curves;
    }

    private static KneeFit fit(String source, DemagnetizationCurve curve) {
        try {
            return KneeFitter.fit(curve);
        } catch (BadInputException e) {
            String where = curve.temperatureK() == null ? source : String.format(Locale.ROOT, "%s (curve at %.2f K)", source, curve.temperatureK());
            throw new BadInputException(InputLocation.of(where), e.getMessage());
        }
    }
}
