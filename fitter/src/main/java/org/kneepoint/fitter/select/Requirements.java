package org.kneepoint.fitter.select;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.shape.DemagnetizingKind;
import org.kneepoint.fitter.shape.MagnetShape;

/**
 * What the design needs of a grade: the load line (Pc and the field against the magnetization, in either
 * convention) at a temperature, an optional minimum flux density B at the operating point, and the largest
 * irreversible loss allowed (also the loss limit of the working temperatures).
 *
 * @param loadLine                 Pc and the circuit field Ha the field comes to
 * @param field                    the field as given, with its convention
 * @param temperature              K
 * @param minimumFluxDensity       T at the operating point, or null for none
 * @param maximumIrreversibleLoss  fraction, strictly between 0 and 1
 */
public record Requirements(LoadLine loadLine, AppliedField field, double temperature, Double minimumFluxDensity,
        double maximumIrreversibleLoss) {

    public Requirements {
        if (loadLine == null || field == null) {
            throw new BadInputException("requirements need a load line and its field, got null");
        }
        if (loadLine.opposingField() != field.circuitField(loadLine.pc())) {
            throw new BadInputException("the load line's Ha = " + loadLine.opposingField() + " A/m is not what the "
                    + field.convention().name().toLowerCase(java.util.Locale.ROOT) + " field gives, " + field.circuitField(loadLine.pc()));
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

    /** Requirements on a load line with a circuit field (its Ha). */
    public Requirements(LoadLine loadLine, double temperature, Double minimumFluxDensity, double maximumIrreversibleLoss) {
        this(loadLine, loadLine == null ? null : AppliedField.opposing(loadLine.opposingField()), temperature,
                minimumFluxDensity, maximumIrreversibleLoss);
    }

    /** Requirements on the load line of {@code pc} under {@code field}, in either convention. */
    public static Requirements of(double pc, AppliedField field, double temperature, Double minimumFluxDensity,
            double maximumIrreversibleLoss) {
        return new Requirements(field.loadLine(pc), field, temperature, minimumFluxDensity, maximumIrreversibleLoss);
    }

    /** Requirements whose load line comes from a shape's demagnetizing factor of the given kind. */
    public static Requirements forShape(MagnetShape shape, DemagnetizingKind kind, double opposingField, double temperature,
            Double minimumFluxDensity, double maximumIrreversibleLoss) {
        return forShape(shape, kind, AppliedField.opposing(opposingField), temperature, minimumFluxDensity, maximumIrreversibleLoss);
    }

    /** Requirements from a shape's demagnetizing factor of the given kind under {@code field}, in either convention. */
    public static Requirements forShape(MagnetShape shape, DemagnetizingKind kind, AppliedField field, double temperature,
            Double minimumFluxDensity, double maximumIrreversibleLoss) {
        double pc = shape.demagnetizingFactors().permeanceCoefficients().coefficient(kind);
        return of(pc, field, temperature, minimumFluxDensity, maximumIrreversibleLoss);
    }
}
