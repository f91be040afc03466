package org.kneepoint.bench;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.KneeFitter;
import org.kneepoint.fitter.model.knee.TemperatureFit;
import org.kneepoint.fitter.model.knee.TemperatureModelFitter;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/** A knee fit of one 500-point curve, and a temperature model over 6 curves of 500 points (invented, 1 mT noise, past HcJ). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class KneeFitBenchmark {

    private DemagnetizationCurve curve;
    private List<DemagnetizationCurve> curves;

    @Setup
    public void makeCurves() {
        curves = new ArrayList<>();
        SplittableRandom random = new SplittableRandom(5);
        for (int c = 0; c < 6; c++) {
            double celsius = 20 + 30 * c;
            double br = 1.27 * (1 - 0.0012 * (celsius - 20));
            double hcj = 2.0e6 * Math.exp(-0.0055 * (celsius - 20));
            double[] h = new double[500];
            double[] j = new double[500];
            for (int i = 0; i < 500; i++) {
                h[i] = 5e4 - 1.05 * hcj * i / 499;
                j[i] = (br + MU0 * 0.05 * h[i]) * (1 - Math.exp(-(h[i] + hcj) / (0.03 * hcj))) + 0.001 * random.nextGaussian();
            }
            curves.add(DemagnetizationCurve.of(Quantity.J, h, j, celsius + 273.15));
        }
        curve = curves.get(0);
    }

    @Benchmark
    public KneeFit kneeFitOf500Points() {
        return KneeFitter.fit(curve);
    }

    @Benchmark
    public TemperatureFit temperatureModelOverSixCurves() {
        return TemperatureModelFitter.fit(curves);
    }
}
