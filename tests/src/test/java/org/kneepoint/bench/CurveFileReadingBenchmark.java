package org.kneepoint.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.kneepoint.importer.csv.CurveFile;
import org.kneepoint.importer.csv.CurveFileReader;
import org.kneepoint.importer.csv.ReadLimits;
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

/** Reading and validating a curve file of 10⁶ rows (about 40 MB of text) into SI. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
public class CurveFileReadingBenchmark {

    private Path file;

    @Setup
    public void writeFile() throws IOException {
        file = Files.createTempFile("kneepoint-bench", ".csv");
        StringBuilder text = new StringBuilder("H [kA/m],J [T]\n");
        for (int i = 0; i < 1_000_000; i++) {
            double h = 100 - 1600.0 * i / 999_999.0;
            double j = h <= -1400 ? 0 : (1.3 + 6.3e-5 * h) * (1 - Math.exp(-(h + 1400) / 40));
            text.append(h).append(',').append(j).append('\n');
        }
        Files.writeString(file, text);
    }

    @TearDown
    public void deleteFile() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public CurveFile readMillionRowFile() {
        return new CurveFileReader(ReadLimits.defaults()).read(file);
    }
}
