package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.library.GradeCurve;
import org.kneepoint.server.library.GradeCurves;
import org.kneepoint.server.text.CharacterizationView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code kneepoint curve FILE} characterizes each curve of a curve file; {@code kneepoint curve
 * GRADE --temperature T} characterizes the grade's stored curves at T.
 */
@Command(name = "curve", mixinStandardHelpOptions = true,
        description = {"Characterize curves: Br, HcB, HcJ, (BH)max, Hk, squareness, recoil permeability.",
            "FILE: the curves of a curve file. GRADE --temperature T: the stored curves of a grade at T."})
final class CurveCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE|GRADE", description = "A curve file (header row with units, e.g. 'H [kOe],J [kG]'), or a grade with --temperature.")
    private String target;

    @Option(names = "--temperature", paramLabel = "T", converter = QuantityConverters.Temperature.class,
            description = "Characterize the stored curves of the grade GRADE at this temperature, e.g. 120C.")
    private Double temperatureK;

    @picocli.CommandLine.Mixin
    private LibraryOption libraryOption;

    @Option(names = "--json", description = "Print one JSON document (SI units) instead of a table.")
    private boolean json;

    @Option(names = "--max-file-size", paramLabel = "BYTES", defaultValue = "" + ReadLimits.DEFAULT_MAX_BYTES,
            description = "Refuse files larger than this (default: ${DEFAULT-VALUE} bytes).")
    private long maxFileSize;

    @Override
    public Integer call() {
        List<GradeCurve> curves = new ArrayList<>();
        if (temperatureK == null) {
            CurveFile file = new CurveFileReader(SizeLimit.of(maxFileSize)).read(Path.of(target));
            file.curves().forEach(curve -> curves.add(new GradeCurve(file.source(), curve, file.source(), false, false)));
        } else {
            try (org.kneepoint.db.Library library = libraryOption.open()) {
                curves.addAll(GradeCurves.at(library.reader(), target, temperatureK));
            }
        }
        List<Map<String, Object>> documents = new ArrayList<>();
        StringBuilder tables = new StringBuilder();
        for (GradeCurve curve : curves) {
            Characterization characterization = characterize(curve.grade(), curve.curve());
            documents.add(CharacterizationView.json(curve, characterization));
            tables.append(CharacterizationView.table(curve, characterization));
        }
        var out = spec.commandLine().getOut();
        out.print(json ? Json.write(documents.size() == 1 ? documents.get(0) : documents) + System.lineSeparator() : tables);
        out.flush();
        return 0;
    }

    private static Characterization characterize(String source, DemagnetizationCurve curve) {
        try {
            return CurveCharacterizer.characterize(curve);
        } catch (BadInputException e) {
            String where = curve.temperatureK() == null ? source : source + " (curve at " + curve.temperatureK() + " K)";
            throw new BadInputException(InputLocation.of(where), e.getMessage());
        }
    }
}
