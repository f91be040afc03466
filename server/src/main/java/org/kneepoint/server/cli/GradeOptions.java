package org.kneepoint.server.cli;

import org.kneepoint.db.Library;
import org.kneepoint.server.app.design.GradeChoice;
import org.kneepoint.server.app.design.GradeModel;
import org.kneepoint.server.app.design.TypedGrade;
import picocli.CommandLine.Option;

/**
 * A grade typed in on the command line ({@link TypedGrade}): a linear-recoil curve with a knee at the reference
 * temperature and linear temperature coefficients. None of the options is given when the grade comes from the
 * library instead.
 */
final class GradeOptions {

    private static final GradeChoice.InputNames NAMES = new GradeChoice.InputNames("GRADE", "",
            "--br, --mu-rec, --hcj, --knee, --alpha, --beta, --reference-temperature", "--br, --mu-rec and --hcj",
            "--alpha and --beta");

    @Option(names = "--br", converter = QuantityConverters.FluxDensity.class,
            description = "Remanence Br at the reference temperature, e.g. 1.3T.")
    Double br;

    @Option(names = "--mu-rec", description = "Relative recoil permeability, e.g. 1.05.")
    Double muRec;

    @Option(names = "--hcj", converter = QuantityConverters.FieldStrength.class,
            description = "Intrinsic coercivity HcJ at the reference temperature, e.g. 1600kA/m.")
    Double hcj;

    @Option(names = "--knee", converter = QuantityConverters.FieldStrength.class,
            description = "Knee field Hk (where J = 0.9·Br) at the reference temperature, e.g. 1450kA/m;"
                    + " default: an assumed square knee 2 %% of HcJ wide.")
    Double knee;

    @Option(names = "--alpha", converter = QuantityConverters.PercentPerKelvin.class,
            description = "Temperature coefficient of Br, e.g. -0.12%%/K; needed with --beta away from the reference temperature (0 allowed).")
    Double alpha;

    @Option(names = "--beta", converter = QuantityConverters.PercentPerKelvin.class,
            description = "Temperature coefficient of HcJ, e.g. -0.6%%/K; needed with --alpha away from the reference temperature (0 allowed).")
    Double beta;

    @Option(names = "--reference-temperature", converter = QuantityConverters.Temperature.class,
            description = "Temperature the values and coefficients refer to (default: 20C).")
    Double referenceTemperature;

    /** The grade named on the command line ({@code name}, or null for the one typed in with these options). */
    GradeChoice choice(String name) {
        return new GradeChoice(name, new TypedGrade(br, muRec, hcj, knee, alpha, beta, referenceTemperature), NAMES);
    }

    /** A grade of the library {@code libraryOption} names, looked up only when the command names one. */
    static GradeModel stored(String name, LibraryOption libraryOption) {
        try (Library library = libraryOption.open()) {
            return GradeModel.stored(library.reader(), name);
        }
    }
}
