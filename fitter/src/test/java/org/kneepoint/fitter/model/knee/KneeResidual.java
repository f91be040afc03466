package org.kneepoint.fitter.model.knee;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Test-only: the knee model as a Commons Math least-squares model, so that the project's own
 * optimizer can be checked against Commons Math's Levenberg–Marquardt. Parameters (Br, μrec, HcJ, w):
 * with E = exp(−(H + HcJ)/w) and D = Br − μ0(μrec − 1)·HcJ,
 * ∂J/∂Br = 1 − E, ∂J/∂μrec = μ0·(H + HcJ·E), ∂J/∂HcJ = μ0(μrec − 1)·E + D·E/w,
 * ∂J/∂w = −D·E·(H + HcJ)/w².
 */
final class KneeResidual implements MultivariateJacobianFunction {

    private final double[] h;

    KneeResidual(double[] h) {
        this.h = h;
    }

    @Override
    public Pair<RealVector, RealMatrix> value(RealVector point) {
        double br = point.getEntry(0);
        double muRec = point.getEntry(1);
        double hcj = point.getEntry(2);
        double width = point.getEntry(3);
        double slope = MU0 * (muRec - 1);
        double depth = br - slope * hcj;
        double[] values = new double[h.length];
        double[][] jacobian = new double[h.length][4];
        for (int i = 0; i < h.length; i++) {
            double e = Math.exp(-(h[i] + hcj) / width);
            values[i] = br + slope * h[i] - depth * e;
            jacobian[i][0] = 1 - e;
            jacobian[i][1] = MU0 * (h[i] + hcj * e);
            jacobian[i][2] = slope * e + depth * e / width;
            jacobian[i][3] = -depth * e * (h[i] + hcj) / (width * width);
        }
        return new Pair<>(new ArrayRealVector(values, false), new Array2DRowRealMatrix(jacobian, false));
    }
}
