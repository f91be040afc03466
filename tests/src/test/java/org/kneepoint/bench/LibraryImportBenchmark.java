package org.kneepoint.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportPlanner;
import org.kneepoint.server.app.imports.ImportProgress;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Import of 1,000,000 points (50 curves × 20,000 points, one file in the long layout) into a
 * fresh embedded library: read, check, characterize every curve, store in one transaction.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 1)
@Measurement(iterations = 5)
public class LibraryImportBenchmark {

    private Path folder;
    private Path file;
    private Library library;

    @Setup(Level.Trial)
    public void writeFile() throws IOException {
        folder = Files.createTempDirectory("kneepoint-import-bench");
        file = org.kneepoint.tests.LargeCurveFile.write(folder.resolve("large.csv"), 50, 20_000);
    }

    @Setup(Level.Invocation)
    public void openEmptyLibrary() throws IOException {
        library = Library.open(DatabaseLocation.ofFolder(Files.createTempDirectory(folder, "library")));
    }

    @TearDown(Level.Invocation)
    public void closeLibrary() {
        library.close();
    }

    @TearDown(Level.Trial)
    public void deleteFiles() throws IOException {
        try (Stream<Path> paths = Files.walk(folder)) {
            paths.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
        }
    }

    @Benchmark
    public int importMillionPoints() {
        List<ImportPlan> plans = new ImportPlanner(ReadLimits.defaults(), library.reader()).plan(List.of(file), Instant.now(), ImportProgress.ignore());
        library.writer().importBatches(plans.stream().map(ImportPlan::batch).toList());
        return plans.size();
    }
}
