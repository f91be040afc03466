package org.kneepoint.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.elements.ElementCheck;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.ElementSettings;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
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
 * The element check (issue 16): 10⁶ elements given H, each with its own direction, over 3 load cases at three
 * temperatures, on an invented NdFeB-like linear law. Target ≤ 0.3 s per check.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx3g")
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@State(Scope.Benchmark)
public class ElementCheckBenchmark {

    private static final int ELEMENTS = 1_000_000;
    private static final double[] TEMPERATURES = {293.15, 393.15, 423.15};

    private final LinearTemperatureLaw law = LinearTemperatureLaw.ofPercentPerKelvin(
            LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6), -0.12, -0.6, LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE);
    private final List<ElementField> cases = new ArrayList<>();

    @Setup
    public void makeCases() {
        SplittableRandom random = new SplittableRandom(16);
        for (double temperature : TEMPERATURES) {
            ElementField.Builder builder = ElementField.builder("case-" + temperature + ".csv", GivenField.FIELD_STRENGTH, true, true);
            for (int i = 0; i < ELEMENTS; i++) {
                double along = random.nextDouble(-7e5, 1e5);
                builder.add(i + 2, i * 1e-5, 0, 0, random.nextDouble(-5e4, 5e4), random.nextDouble(-5e4, 5e4), along, 1e-9,
                        random.nextDouble(-0.1, 0.1), random.nextDouble(-0.1, 0.1), 1.0, temperature);
            }
            cases.add(builder.build());
        }
    }

    @Benchmark
    public ElementCheckResult millionElementsThreeLoadCases() {
        return ElementCheck.run(law, cases, ElementSettings.alongZ(null, 0.01));
    }
}
