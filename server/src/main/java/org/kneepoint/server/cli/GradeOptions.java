package org.kneepoint.server.cli;

import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.server.library.GradeModel;
import org.kneepoint.server.library.TypedGrade;
import picocli.CommandLine.Option;

/**
 * A grade typed in on the command line ({@link TypedGrade}): a linear-recoil curve with a knee at the reference
 * temperature and linear temperature coefficients. None of the options is given when the grade comes from the
 * library instead.
 */
final class GradeOptions {

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
            description = "Temperature coefficient of Br, e.g. -0.12%%/K (default: 0%%/K).")
    Double alpha;

    @Option(names = "--beta", converter = QuantityConverters.PercentPerKelvin.class,
            description = "Temperature coefficient of HcJ, e.g. -0.6%%/K (default: 0%%/K).")
    Double beta;

    @Option(names = "--reference-temperature", converter = QuantityConverters.Temperature.class,
            description = "Temperature the values and coefficients refer to (default: 20C).")
    Double referenceTemperature;

    /** The model of {@code grade} (null: the one typed in) from the library {@code libraryOption} names; never both. */
    GradeModel model(String grade, LibraryOption libraryOption) {
        TypedGrade typed = new TypedGrade(br, muRec, hcj, knee, alpha, beta, referenceTemperature);
        if (grade == null) {
            return GradeModel.typed(typed.law("name a GRADE of the library, or type one in with --br, --mu-rec and --hcj"));
        }
        if (typed.given()) {
            throw new BadInputException("give either a GRADE of the library or the typed-in --br, --mu-rec, --hcj, --knee,"
                    + " --alpha, --beta, --reference-temperature, not both");
        }
        try (Library library = libraryOption.open()) {
            return GradeModel.stored(library.reader(), grade);
        }
    }
}
