package org.kneepoint.bench;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.OperatingPointTable;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Speed of operating points in bulk. Target: 10⁶ points (1,000 knee-model grades × 20 temperatures from
 * −40 °C to 180 °C × 50 permeance coefficients from 0.1 to 20) ≤ 0.05 s for the whole table, 1e-9 relative in H.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@State(Scope.Benchmark)
public class OperatingPointBenchmark {

    private final List<LinearTemperatureLaw> grades = new ArrayList<>();
    private final double[] temperatures = new double[20];
    private final double[] pcs = new double[50];
    private final double[] table = new double[1000 * 20 * 50];

    public OperatingPointBenchmark() {
        SplittableRandom random = new SplittableRandom(1);
        while (grades.size() < 1000) {
            double br = random.nextDouble(1.1, 1.45);
            double muRec = random.nextDouble(1.02, 1.06);
            double hcj = random.nextDouble(1.0e6, 2.8e6);
            double recoilLimit = 0.95 * 0.1 * br / (MU0 * (muRec - 1.0));
            LinearRecoilKnee curve = LinearRecoilKnee.withKneeField(br, muRec, hcj,
                    Math.min(hcj, recoilLimit) * random.nextDouble(0.85, 0.97));
            grades.add(LinearTemperatureLaw.ofPercentPerKelvin(curve, random.nextDouble(-0.13, -0.09),
                    random.nextDouble(-0.6, -0.4), LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE));
        }
        for (int t = 0; t < temperatures.length; t++) {
            temperatures[t] = 233.15 + t * 220.0 / (temperatures.length - 1);
        }
        for (int p = 0; p < pcs.length; p++) {
            pcs[p] = 0.1 * Math.pow(200.0, p / (pcs.length - 1.0));
        }
    }

    @Benchmark
    public double[] operatingPointTableOfTenToTheSix() {
        OperatingPointTable.fieldsInto(grades, temperatures, pcs, 0.0, table);
        return table;
    }
}
