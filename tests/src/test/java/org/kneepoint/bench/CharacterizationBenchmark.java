package org.kneepoint.bench;

import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/** Characterization of one curve of 10⁶ points (an invented sintered-like curve), ordered and shuffled. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class CharacterizationBenchmark {

    @Param({"ordered", "shuffled"})
    public String order;

    private DemagnetizationCurve curve;

    @Setup
    public void makeCurve() {
        int n = 1_000_000;
        double[] h = new double[n];
        double[] j = new double[n];
        java.util.SplittableRandom random = new java.util.SplittableRandom(42);
        for (int i = 0; i < n; i++) {
            h[i] = 1e5 - 1.6e6 * i / (n - 1.0);
            j[i] = h[i] <= -1.4e6 ? 0 : (1.3 + 6.3e-8 * h[i]) * (1 - Math.exp(-(h[i] + 1.4e6) / 4e4))
                    + 0.002 * random.nextGaussian();
        }
        if (order.equals("shuffled")) {
            for (int i = n - 1; i > 0; i--) {
                int k = random.nextInt(i + 1);
                double th = h[i];
                h[i] = h[k];
                h[k] = th;
                double tj = j[i];
                j[i] = j[k];
                j[k] = tj;
            }
        }
        curve = DemagnetizationCurve.of(Quantity.J, h, j, 293.15);
    }

    @Benchmark
    public Characterization characterizeMillionPoints() {
        return CurveCharacterizer.characterize(curve);
    }
}
