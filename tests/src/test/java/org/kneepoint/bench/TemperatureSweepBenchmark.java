package org.kneepoint.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.study.TemperatureSweep;
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
 * Speed of a temperature sweep (issue 14). Target: 160 steps of a check of a library grade (the demo NdFeB's model,
 * −20 °C to 140 °C by 1 K, Pc 1, 100 kA/m against it) with the working temperatures, ≤ 10 ms.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class TemperatureSweepBenchmark {

    private Path folder;
    private TemperatureModel model;

    @Setup
    public void loadGrade() throws IOException {
        folder = Files.createTempDirectory("kneepoint-sweep-bench");
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            DemoLoader.load(library);
            model = GradeModel.stored(library.reader(), "DEMO NdFeB 42/100").model();
        }
    }

    @TearDown
    public void deleteLibrary() throws IOException {
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        }
    }

    @Benchmark
    public TemperatureSweep sweep160Steps() {
        return TemperatureSweep.run(model, 1.0, AppliedField.opposing(1e5), 253.15, 413.15, 1.0, 0.01);
    }
}
