package org.kneepoint.server.cli;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import picocli.CommandLine.Option;

/**
 * A grade typed in on the command line: a linear-recoil curve with a knee at the reference
 * temperature and linear temperature coefficients ({@link LinearTemperatureLaw}). None of the
 * options is given when the grade comes from the library instead.
 */
final class GradeOptions {

    /** Knee width w/HcJ used when no knee field is given: an assumed square knee, not data. */
    static final double DEFAULT_RELATIVE_KNEE_WIDTH = 0.02;

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

    /** Whether any of the options was given. */
    boolean given() {
        return br != null || muRec != null || hcj != null || knee != null || alpha != null || beta != null
                || referenceTemperature != null;
    }

    LinearTemperatureLaw law() {
        if (br == null || muRec == null || hcj == null) {
            throw new BadInputException("name a GRADE of the library, or type one in with --br, --mu-rec and --hcj");
        }
        LinearRecoilKnee curve = knee == null
                ? new LinearRecoilKnee(br, muRec, hcj, DEFAULT_RELATIVE_KNEE_WIDTH * hcj)
                : LinearRecoilKnee.withKneeField(br, muRec, hcj, knee);
        return LinearTemperatureLaw.ofPercentPerKelvin(curve, alpha == null ? 0.0 : alpha, beta == null ? 0.0 : beta,
                referenceTemperature == null ? LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE : referenceTemperature);
    }
}
