package org.kneepoint.server.cli;

import org.kneepoint.server.app.version.VersionInfo;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.importer.export.ExportUnits;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.server.app.grades.CurveDamage;
import org.kneepoint.server.app.grades.CurveExport;
import org.kneepoint.server.app.grades.GradeCurves;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code kneepoint export GRADE --temperature T}: a grade's curve at T as CSV (re-readable by
 * {@code import}), JSON or a bare table, in SI or CGS, as stored or resampled, optionally shifted
 * so that B = 0 at H = 0. The curve is the stored one at T, or else the temperature model's
 * ({@link GradeCurves}), marked modeled and, outside the measured temperatures, extrapolated; with {@code --after STEPS
 * --pc P} that of a magnet the steps damaged ({@link CurveDamage}).
 */
@Command(name = "export", mixinStandardHelpOptions = true, description = "Export a grade's curve at a temperature.")
final class ExportCommand implements Callable<Integer> {

    enum Format { csv, json }

    enum CurveChoice { normal, intrinsic }

    enum UnitChoice { si, cgs }

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name.")
    private String grade;

    @Option(names = "--temperature", required = true, converter = QuantityConverters.Temperature.class, paramLabel = "T",
            description = "Temperature of the curve, e.g. 120C.")
    private double temperatureK;

    @Option(names = "--format", defaultValue = "csv", description = "csv or json (default ${DEFAULT-VALUE}).")
    private Format format;

    @Option(names = "--curve", defaultValue = "normal", description = "normal (H, B) or intrinsic (H, J); default ${DEFAULT-VALUE}.")
    private CurveChoice curve;

    @Option(names = "--points", paramLabel = "N", description = "Resample to N points evenly spaced in H on the monotone curve.")
    private Integer points;

    @Option(names = "--units", defaultValue = "si", description = "si (A/m, T) or cgs (Oe, G); default ${DEFAULT-VALUE}.")
    private UnitChoice units;

    @Option(names = "--shifted", description = "Shift H by HcB so that B = 0 at H = 0 (normal curve only).")
    private boolean shifted;

    @Option(names = "--bare", description = "Only two columns of numbers: no metadata, no header (CSV only).")
    private boolean bare;

    @Option(names = "--after", converter = DutyStepsConverter.class, paramLabel = "STEPS",
            description = "Export the curve of a magnet damaged by these steps TEMPERATURE:FIELD[:KIND] in order, as 'duty' takes"
                    + " them, e.g. \"150C:300kA/m, 20C:0\": its recoil line down to the worst point, the curve beyond. Needs --pc.")
    private DutyStepsConverter.Steps after;

    @Option(names = "--pc", paramLabel = "P", description = "Permeance coefficient of the load line the --after steps act on.")
    private Double pc;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write to FILE instead of standard output.")
    private Path output;

    @Override
    public Integer call() {
        CurveDamage damage = damage();
        String text;
        try (Library library = libraryOption.open()) {
            GradeCurves.stored(library.reader(), grade);
            CurveExport export = new CurveExport(grade, temperatureK,
                    format == Format.json ? CurveExport.Format.JSON : CurveExport.Format.CSV,
                    curve == CurveChoice.normal ? Quantity.B : Quantity.J, points,
                    units == UnitChoice.si ? ExportUnits.SI : ExportUnits.CGS, shifted, bare, damage);
            text = export.write(library.reader(), VersionInfo.version());
        }
        if (output == null) {
            spec.commandLine().getOut().print(text);
            spec.commandLine().getOut().flush();
        } else {
            OutputFile.write(output, text);
        }
        return 0;
    }

    private CurveDamage damage() {
        return CurveDamage.of(pc, after == null ? null : after.list(), InputLocation.of("option --pc"), InputLocation.of("option --after"));
    }
}
