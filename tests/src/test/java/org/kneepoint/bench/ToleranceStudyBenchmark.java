package org.kneepoint.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.study.BandDistribution;
import org.kneepoint.fitter.study.CheckSetup;
import org.kneepoint.fitter.study.StudyOptions;
import org.kneepoint.fitter.study.ToleranceSpec;
import org.kneepoint.fitter.study.ToleranceStudy;
import org.kneepoint.fitter.study.ToleranceStudyResult;
import org.kneepoint.server.app.demo.DemoLoader;
import org.kneepoint.server.app.design.GradeModel;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Speed of a tolerance study (issue 14). Target: 10,000 samples of a check of a library grade (the demo NdFeB's fitted
 * temperature model) at 120 °C with Pc 1 and 200 kA/m against it, under bands on Br, HcJ, Pc and temperature, each
 * sample with its operating point, loss and maximum working temperature, ≤ 50 ms.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class ToleranceStudyBenchmark {

    private Path folder;
    private CheckSetup setup;
    private final List<ToleranceSpec> bands = List.of("br=±2%", "hcj=±5%", "pc=±10%", "temperature=±5K").stream()
            .map(text -> ToleranceSpec.parse(text, "--tolerance")).toList();
    private final StudyOptions options = new StudyOptions(BandDistribution.NORMAL, 10_000, StudyOptions.DEFAULT_SEED);

    @Setup
    public void loadGrade() throws IOException {
        folder = Files.createTempDirectory("kneepoint-tolerance-bench");
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            DemoLoader.load(library);
            GradeModel model = GradeModel.stored(library.reader(), "DEMO NdFeB 42/100");
            setup = CheckSetup.ofPc(model.model(), 1.0, AppliedField.opposing(2e5), 393.15, 0.01);
        }
    }

    @TearDown
    public void deleteLibrary() throws IOException {
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        }
    }

    @Benchmark
    public ToleranceStudyResult tenThousandSamples() {
        return ToleranceStudy.run(setup, bands, options, "--tolerance");
    }
}
