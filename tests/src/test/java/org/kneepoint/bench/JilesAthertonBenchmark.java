package org.kneepoint.bench;

import java.util.Arrays;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.kneepoint.fitter.model.ja.FixedStepLoopEvaluator;
import org.kneepoint.fitter.model.ja.HysteresisSimulator;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonFitter;
import org.kneepoint.fitter.model.ja.JilesAthertonModel;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.MeasuredLoop;
import org.kneepoint.fitter.model.ja.Trajectory;
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

/**
 * Speed of the Jiles–Atherton model. Targets on a 2-core machine: fixed-step evaluation of a
 * 1,200-point loop ≤ 0.1 ms; adaptive simulation of a major loop to 1e-6 ≤ 1 ms; a full
 * identification of a 1,200-point loop to the noise floor ≤ 1 s. The loop is synthetic: the
 * parameter set of docs/references.md §5b (attributed to Jiles and Atherton 1986) with 0.3 % Gaussian
 * noise from a fixed seed.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@State(Scope.Benchmark)
public class JilesAthertonBenchmark {

    private static final JilesAthertonParameters SOFT_IRON = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);
    private static final double H_MAX = 5000;
    private static final int POINTS = 1200;

    private JilesAthertonModel model;
    private FixedStepLoopEvaluator evaluator;
    private double[] magnetization;
    private HysteresisSimulator simulator;
    private MeasuredLoop noisyLoop;
    private JilesAthertonFitter fitter;

    @Setup
    public void prepare() {
        double[] h = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            h[i] = H_MAX * Math.cos(2 * Math.PI * i / (POINTS - 1));
        }
        simulator = HysteresisSimulator.adaptive(SOFT_IRON);
        double[] clean = simulator.simulate(h).fluxDensity();
        double bMax = Arrays.stream(clean).max().orElseThrow();
        Random random = new Random(42L);
        double[] b = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            b[i] = clean[i] + 0.003 * bMax * random.nextGaussian();
        }
        noisyLoop = MeasuredLoop.ofFluxDensity(h, b);
        model = new JilesAthertonModel(SOFT_IRON);
        evaluator = new FixedStepLoopEvaluator(noisyLoop);
        magnetization = new double[POINTS];
        fitter = new JilesAthertonFitter();
    }

    /** RK4 at 1/200 of Hmax per step over a 1,200-point loop (the fit's inner evaluation). */
    @Benchmark
    public double[] fixedStepLoopEvaluation() {
        evaluator.magnetization(model, magnetization);
        return magnetization;
    }

    /** Initial curve and major loop 0 → +Hmax → −Hmax → +Hmax, adaptive Dormand–Prince at the default tolerance. */
    @Benchmark
    public Trajectory adaptiveMajorLoop() {
        return simulator.simulate(new double[] {H_MAX, -H_MAX, H_MAX});
    }

    /** Starting values, CMA-ES and Levenberg–Marquardt on the noisy 1,200-point loop. */
    @Benchmark
    public JilesAthertonFit identification() {
        return fitter.fitLoop(noisyLoop, FitProgress.ignore());
    }
}
