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
import org.kneepoint.server.text.CharacterizationView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint curve FILE}: reads a curve file and characterizes each curve in it. */
@Command(name = "curve", mixinStandardHelpOptions = true,
        description = "Characterize the curves of a curve file: Br, HcB, HcJ, (BH)max, Hk, squareness, recoil permeability.")
final class CurveCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", description = "A curve file (header row with units, e.g. 'H [kOe],J [kG]').")
    private Path file;

    @Option(names = "--json", description = "Print one JSON document (SI units) instead of a table.")
    private boolean json;

    @Option(names = "--max-file-size", paramLabel = "BYTES", defaultValue = "" + ReadLimits.DEFAULT_MAX_BYTES,
            description = "Refuse files larger than this (default: ${DEFAULT-VALUE} bytes).")
    private long maxFileSize;

    @Override
    public Integer call() {
        if (maxFileSize <= 0) {
            throw new BadInputException(InputLocation.of("option --max-file-size"), "must be a positive number of bytes, got " + maxFileSize);
        }
        CurveFile curves = new CurveFileReader(new ReadLimits(maxFileSize)).read(file);
        List<Map<String, Object>> documents = new ArrayList<>();
        StringBuilder tables = new StringBuilder();
        for (DemagnetizationCurve curve : curves.curves()) {
            Characterization characterization = characterize(curves.source(), curve);
            documents.add(CharacterizationView.json(curves.source(), curve, characterization));
            tables.append(CharacterizationView.table(curves.source(), curve, characterization));
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
