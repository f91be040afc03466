package org.kneepoint.bench;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.select.GradeCandidate;
import org.kneepoint.fitter.select.GradeSelection;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;
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
 * Speed of grade selection. Target: ranking 1,000 knee-model grades against one set of requirements
 * (with each grade's knee margin in kelvin and maximum working temperature) ≤ 50 ms.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@State(Scope.Benchmark)
public class GradeRankingBenchmark {

    private final List<GradeCandidate> grades = new ArrayList<>();
    private final Requirements requirements = new Requirements(new LoadLine(1.5, 1e5), 393.15, 0.6, 0.01);

    public GradeRankingBenchmark() {
        SplittableRandom random = new SplittableRandom(2);
        while (grades.size() < 1000) {
            double br = random.nextDouble(1.1, 1.45);
            double muRec = random.nextDouble(1.02, 1.06);
            double hcj = random.nextDouble(1.0e6, 2.8e6);
            double recoilLimit = 0.95 * 0.1 * br / (MU0 * (muRec - 1.0));
            LinearRecoilKnee curve = LinearRecoilKnee.withKneeField(br, muRec, hcj, Math.min(hcj, recoilLimit) * random.nextDouble(0.85, 0.97));
            grades.add(new GradeCandidate("grade " + grades.size(), LinearTemperatureLaw.ofPercentPerKelvin(curve,
                    random.nextDouble(-0.13, -0.09), random.nextDouble(-0.6, -0.4), 293.15), random.nextDouble(5, 50)));
        }
    }

    @Benchmark
    public List<RankedGrade> rankThousandGrades() {
        return GradeSelection.rank(grades, requirements, RankingOrder.FLUX_DENSITY);
    }
}
