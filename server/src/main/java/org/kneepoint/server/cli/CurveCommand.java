package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.concurrent.Callable;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.grades.GradeCurve;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.text.CharacterizationView;
import org.kneepoint.server.app.OneOrMany;
import org.kneepoint.server.app.grades.CurveDocument;
import org.kneepoint.server.app.grades.Grades;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Mixin;
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

    @Mixin
    private OutputOptions output;

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
        List<CurveDocument> documents = Grades.characterize(curves);
        output.print(spec.commandLine().getOut(), () -> OneOrMany.of(documents),
                () -> documents.stream().map(CharacterizationView::table).collect(Collectors.joining()));
        return 0;
    }
}
