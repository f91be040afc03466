package org.kneepoint.fitter.model.curieweiss;

import java.util.Arrays;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.stat.regression.SimpleRegression;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Least-squares fit of χ(T) = C/(T − θ) + χ0 by variable projection (G. H. Golub, V. Pereyra,
 * SIAM J. Numer. Anal. 10, 413–432, 1973): for a given θ the model is linear in C and χ0 and is
 * solved exactly, so only the residual profile in θ is searched. θ is kept below the lowest
 * temperature by searching d = Tmin − θ &gt; 0 in log d, first on a grid from 1e-6·(Tmax − Tmin)
 * to 1e4·Tmax (robust against the local minima and flat tails of the profile), then by Brent's
 * method between the grid neighbours of the best point. The order of the points does not matter.
 */
public final class CurieWeissFitter {

    private static final int GRID = 240;

    /** Fits the law to temperatures (kelvin, distinct, &gt; 0) and SI volume susceptibilities. */
    public CurieWeissFit fit(double[] temperature, double[] susceptibility) {
        validate(temperature, susceptibility);
        double tMin = Arrays.stream(temperature).min().orElseThrow();
        double tMax = Arrays.stream(temperature).max().orElseThrow();
        double logLow = Math.log(1e-6 * (tMax - tMin));
        double logHigh = Math.log(1e4 * tMax);
        int best = 0;
        double bestResidual = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= GRID; i++) {
            double residual = profile(temperature, susceptibility, tMin - Math.exp(logLow + (logHigh - logLow) * i / GRID));
            if (residual < bestResidual) {
                bestResidual = residual;
                best = i;
            }
        }
        double step = (logHigh - logLow) / GRID;
        double low = logLow + step * Math.max(best - 1, 0);
        double high = logLow + step * Math.min(best + 1, GRID);
        BrentOptimizer brent = new BrentOptimizer(1e-12, 1e-14);
        var optimum = brent.optimize(new MaxEval(200), GoalType.MINIMIZE, new SearchInterval(low, high),
                new UnivariateObjectiveFunction(u -> profile(temperature, susceptibility, tMin - Math.exp(u))));
        double theta = optimum.getValue() < bestResidual ? tMin - Math.exp(optimum.getPoint())
                : tMin - Math.exp(logLow + step * best);
        SimpleRegression linear = regression(temperature, susceptibility, theta);
        CurieWeissParameters parameters = new CurieWeissParameters(linear.getSlope(), theta, linear.getIntercept());
        return CurieWeissUncertainty.assess(parameters, temperature, susceptibility,
                GRID + 1 + brent.getEvaluations());
    }

    private static double profile(double[] temperature, double[] susceptibility, double theta) {
        return regression(temperature, susceptibility, theta).getSumSquaredErrors();
    }

    private static SimpleRegression regression(double[] temperature, double[] susceptibility, double theta) {
        SimpleRegression regression = new SimpleRegression(true);
        for (int i = 0; i < temperature.length; i++) {
            regression.addData(1 / (temperature[i] - theta), susceptibility[i]);
        }
        return regression;
    }

    private static void validate(double[] temperature, double[] susceptibility) {
        if (temperature.length != susceptibility.length) {
            throw new BadInputException(temperature.length + " temperatures and " + susceptibility.length
                    + " susceptibilities; expected one χ per temperature");
        }
        if (temperature.length < 3) {
            throw new BadInputException("a Curie–Weiss fit has three parameters and got " + temperature.length
                    + " points; expected at least 3");
        }
        for (int i = 0; i < temperature.length; i++) {
            if (!(temperature[i] > 0) || Double.isInfinite(temperature[i])) {
                throw new BadInputException("temperature at point " + (i + 1) + " is " + temperature[i]
                        + "; expected a finite temperature > 0 K");
            }
            if (!Double.isFinite(susceptibility[i])) {
                throw new BadInputException("susceptibility at point " + (i + 1) + " is " + susceptibility[i]
                        + "; expected a finite SI volume susceptibility");
            }
        }
        double[] sorted = temperature.clone();
        Arrays.sort(sorted);
        for (int i = 1; i < sorted.length; i++) {
            if (sorted[i] == sorted[i - 1]) {
                throw new BadInputException("temperature " + sorted[i] + " K appears twice; expected distinct temperatures");
            }
        }
    }
}
