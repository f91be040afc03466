package org.kneepoint.server.cli;

import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import picocli.CommandLine.Option;

/**
 * A grade typed in on the command line: a linear-recoil curve with a knee at the reference
 * temperature and linear temperature coefficients ({@link LinearTemperatureLaw}).
 */
final class GradeOptions {

    /** Knee width w/HcJ used when no knee field is given: an assumed square knee, not data. */
    static final double DEFAULT_RELATIVE_KNEE_WIDTH = 0.02;

    @Option(names = "--br", required = true, converter = QuantityConverters.FluxDensity.class,
            description = "Remanence Br at the reference temperature, e.g. 1.3T.")
    double br;

    @Option(names = "--mu-rec", required = true, description = "Relative recoil permeability, e.g. 1.05.")
    double muRec;

    @Option(names = "--hcj", required = true, converter = QuantityConverters.FieldStrength.class,
            description = "Intrinsic coercivity HcJ at the reference temperature, e.g. 1600kA/m.")
    double hcj;

    @Option(names = "--knee", converter = QuantityConverters.FieldStrength.class,
            description = "Knee field Hk (where J = 0.9·Br) at the reference temperature, e.g. 1450kA/m;"
                    + " default: an assumed square knee 2 % of HcJ wide.")
    Double knee;

    @Option(names = "--alpha", converter = QuantityConverters.PercentPerKelvin.class, defaultValue = "0%/K",
            description = "Temperature coefficient of Br, e.g. -0.12%%/K (default: ${DEFAULT-VALUE}).")
    double alpha;

    @Option(names = "--beta", converter = QuantityConverters.PercentPerKelvin.class, defaultValue = "0%/K",
            description = "Temperature coefficient of HcJ, e.g. -0.6%%/K (default: ${DEFAULT-VALUE}).")
    double beta;

    @Option(names = "--reference-temperature", converter = QuantityConverters.Temperature.class, defaultValue = "20C",
            description = "Temperature the values and coefficients refer to (default: ${DEFAULT-VALUE}).")
    double referenceTemperature;

    LinearTemperatureLaw law() {
        LinearRecoilKnee curve = knee == null
                ? new LinearRecoilKnee(br, muRec, hcj, DEFAULT_RELATIVE_KNEE_WIDTH * hcj)
                : LinearRecoilKnee.withKneeField(br, muRec, hcj, knee);
        return LinearTemperatureLaw.ofPercentPerKelvin(curve, alpha, beta, referenceTemperature);
    }
}
