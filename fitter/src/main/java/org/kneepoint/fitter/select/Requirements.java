package org.kneepoint.fitter.select;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.shape.DemagnetizingKind;
import org.kneepoint.fitter.shape.MagnetShape;

/**
 * What the design needs of a grade: the load line (Pc and opposing field) at a temperature, an
 * optional minimum flux density B at the operating point, and the largest irreversible loss allowed
 * (also the loss limit of the maximum working temperature).
 *
 * @param loadLine                 Pc and Ha
 * @param temperature              K
 * @param minimumFluxDensity       T at the operating point, or null for none
 * @param maximumIrreversibleLoss  fraction, strictly between 0 and 1
 */
public record Requirements(LoadLine loadLine, double temperature, Double minimumFluxDensity, double maximumIrreversibleLoss) {

    public Requirements {
        if (loadLine == null) {
            throw new BadInputException("requirements need a load line, got null");
        }
        if (!(temperature > 0.0) || !Double.isFinite(temperature)) {
            throw new BadInputException("required temperature must be a positive finite number of kelvin, got " + temperature);
        }
        if (minimumFluxDensity != null && !Double.isFinite(minimumFluxDensity)) {
            throw new BadInputException("minimum flux density must be finite, got " + minimumFluxDensity);
        }
        if (!(maximumIrreversibleLoss > 0.0 && maximumIrreversibleLoss < 1.0)) {
            throw new BadInputException("maximum irreversible loss must lie strictly between 0 % and 100 %, got "
                    + 100 * maximumIrreversibleLoss + " %");
        }
    }

    /** Requirements whose load line comes from a shape's demagnetizing factor of the given kind. */
    public static Requirements forShape(MagnetShape shape, DemagnetizingKind kind, double opposingField, double temperature,
            Double minimumFluxDensity, double maximumIrreversibleLoss) {
        double pc = shape.demagnetizingFactors().permeanceCoefficients().coefficient(kind);
        return new Requirements(new LoadLine(pc, opposingField), temperature, minimumFluxDensity, maximumIrreversibleLoss);
    }
}
