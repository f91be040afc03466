package org.kneepoint.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.GradeSummary;
import org.kneepoint.fitter.library.ImportBatch;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
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

/** Listing 10,000 grades (each with curves at three temperatures) from an embedded library. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class GradeListingBenchmark {

    private Path folder;
    private Library library;

    @Setup
    public void fillLibrary() throws IOException {
        folder = Files.createTempDirectory("kneepoint-listing-bench");
        library = Library.open(DatabaseLocation.ofFolder(folder));
        List<GradeInfo> grades = new ArrayList<>();
        List<LibraryCurve> curves = new ArrayList<>();
        double[] h = {1e5, 0, -5e5, -1e6};
        double[] j = {1.31, 1.3, 1.27, 1.2};
        for (int g = 0; g < 10_000; g++) {
            GradeInfo grade = new GradeInfo(String.format("Invented grade %05d", g), "family " + (g % 7), "Supplier " + (g % 13), null, null, null);
            grades.add(grade);
            for (double temperature : new double[] {293.15, 353.15, 423.15}) {
                curves.add(new LibraryCurve(grade.name(), DemagnetizationCurve.of(Quantity.J, h, j, temperature), null, null));
            }
        }
        ImportInfo info = new ImportInfo("bench", "0".repeat(64), Instant.now(), curves.size(), 4 * curves.size(), 0);
        library.writer().importBatches(List.of(new ImportBatch(info, grades, curves, List.of())));
    }

    @TearDown
    public void deleteLibrary() throws IOException {
        library.close();
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        }
    }

    @Benchmark
    public List<GradeSummary> listTenThousandGrades() {
        return library.reader().grades(null);
    }
}
