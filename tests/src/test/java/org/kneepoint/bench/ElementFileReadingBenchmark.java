package org.kneepoint.bench;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.kneepoint.importer.csv.ElementFile;
import org.kneepoint.importer.csv.ElementFileReader;
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

/**
 * Reading and validating an element-field file of 10⁶ rows (x, y, z, Hx, Hy, Hz, V, T with a °C header: about
 * 90 MB of text) into SI primitive columns (issue 16). Target ≤ 3 s.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgsAppend = "-Xmx3g")
@Warmup(iterations = 1, time = 2)
@Measurement(iterations = 5, time = 2)
public class ElementFileReadingBenchmark {

    private Path file;

    @Setup
    public void writeFile() throws IOException {
        file = Files.createTempFile("kneepoint-bench", ".csv");
        SplittableRandom random = new SplittableRandom(16);
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write("x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³],T [°C]\n");
            for (int i = 0; i < 1_000_000; i++) {
                out.write(String.format(Locale.ROOT, "%.6f,%.6f,%.6f,%.4f,%.4f,%.4f,%.6e,120%n", random.nextDouble(-20, 20),
                        random.nextDouble(-10, 10), random.nextDouble(-2, 2), random.nextDouble(-50, 50), random.nextDouble(-50, 50),
                        random.nextDouble(-700, 100), random.nextDouble(1e-3, 1e-2)));
            }
        }
    }

    @TearDown
    public void deleteFile() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public ElementFile readMillionRowFile() {
        return new ElementFileReader(new ReadLimits(ElementFileReader.DEFAULT_MAX_BYTES)).read(file);
    }
}
