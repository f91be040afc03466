package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import org.kneepoint.fitter.model.knee.KneeCurve;

/**
 * The knee model's parameters, SI, as a saved knee fit stores them and as the knee and temperature fit documents begin:
 * Br, μrec, HcJ, the knee width HcJ − Hk, the knee shape's form, the line permeability, then the shape's own parameters
 * (only the keys of that form are written).
 */
public record KneeFitParameters(double br, double muRec, double hcj, double kneeWidth, String kneeShape, double muLine,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingWidth,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingSkew,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double switchingTail,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double rationalBend,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double rationalCurvature) {

    /** The names of the shape parameters this record has a key for. */
    static final List<String> SHAPE_KEYS = List.of("switchingWidth", "switchingSkew", "switchingTail", "rationalBend",
            "rationalCurvature");

    /** The parameters of a fitted knee model; a shape parameter without a key here is a bug. */
    public static KneeFitParameters of(KneeCurve model) {
        Double[] shape = shapeValues(model.shape().parameterNames(), model.shape().parameters());
        return new KneeFitParameters(model.remanence(), model.recoilPermeability(), model.intrinsicCoercivity(), model.kneeWidth(),
                model.shape().form(), model.linePermeability(), shape[0], shape[1], shape[2], shape[3], shape[4]);
    }

    /** The values of the named shape parameters in the order of {@link #SHAPE_KEYS}, null for the other forms'. */
    static Double[] shapeValues(List<String> names, double[] values) {
        Double[] shape = new Double[SHAPE_KEYS.size()];
        for (int i = 0; i < names.size(); i++) {
            int key = SHAPE_KEYS.indexOf(names.get(i));
            if (key < 0) {
                throw new IllegalStateException("the knee shape parameter '" + names.get(i) + "' has no key in the documents");
            }
            shape[key] = values[i];
        }
        return shape;
    }
}
