package org.kneepoint.server.app.design;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.DemagnetizingFactors;
import org.kneepoint.fitter.shape.FlatPoleShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.PermeanceCoefficients;

/**
 * A magnet's demagnetizing factors and the permeance coefficient Pc = (1 − N)/N of each ({@code kneepoint permeance
 * --json}, {@code GET /api/permeance/{shape}}): magnetometric, fluxmetric and centre-point.
 */
public record PermeanceDocument(Factors demagnetizingFactor, Factors permeanceCoefficient) {

    /** One quantity of the three kinds. */
    public record Factors(double magnetometric, double fluxmetric, double center) {
    }

    /** The factors of a set of demagnetizing factors. */
    public static PermeanceDocument of(DemagnetizingFactors factors) {
        PermeanceCoefficients pc = factors.permeanceCoefficients();
        return new PermeanceDocument(new Factors(factors.magnetometric(), factors.fluxmetric(), factors.centrePoint()),
                new Factors(pc.magnetometric(), pc.fluxmetric(), pc.centrePoint()));
    }

    /**
     * The magnet as the factors see it: free, or standing with a pole face on a large steel plate (its image doubles its
     * length); {@code onSteelName} names the option in the message when the magnet has no flat pole face.
     */
    public static MagnetShape seen(MagnetShape shape, boolean onSteel, String onSteelName) {
        if (!onSteel) {
            return shape;
        }
        if (!(shape instanceof FlatPoleShape flat)) {
            throw new BadInputException(onSteelName + " needs a magnet with a flat pole face (cylinder, ring or block)");
        }
        return new MagnetOnSteelPlate(flat);
    }
}
