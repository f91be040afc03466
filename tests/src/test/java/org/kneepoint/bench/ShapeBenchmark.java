package org.kneepoint.bench;

import java.util.concurrent.TimeUnit;
import org.kneepoint.fitter.field.FieldGrid;
import org.kneepoint.fitter.field.FieldMap;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.DemagnetizingFactors;
import org.kneepoint.fitter.shape.RingShape;
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
 * Speed of the shape physics. Targets: one set of cylinder or block factors (Nm, Nf, N0) ≤ 5 µs;
 * the field at 10⁵ points (a 400 × 250 x–z map) around a cylinder or a block ≤ 0.1 s.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@State(Scope.Benchmark)
public class ShapeBenchmark {

    private final CylinderShape cylinder = new CylinderShape(0.01, 0.007);
    private final BlockShape block = new BlockShape(0.02, 0.01, 0.004);
    private final RingShape ring = new RingShape(0.02, 0.008, 0.005);
    private final MagnetField cylinderField = MagnetField.of(cylinder, 1.3);
    private final MagnetField blockField = MagnetField.of(block, 1.3);
    private final FieldGrid grid = new FieldGrid(-0.03, 0.03, 400, -0.03, 0.03, 250, 0.0005);

    @Benchmark
    public DemagnetizingFactors cylinderFactors() {
        return cylinder.demagnetizingFactors();
    }

    @Benchmark
    public DemagnetizingFactors blockFactors() {
        return block.demagnetizingFactors();
    }

    @Benchmark
    public DemagnetizingFactors ringFactors() {
        return ring.demagnetizingFactors();
    }

    @Benchmark
    public FieldMap cylinderFieldAtTenToTheFivePoints() {
        return FieldMap.of(cylinderField, grid);
    }

    @Benchmark
    public FieldMap blockFieldAtTenToTheFivePoints() {
        return FieldMap.of(blockField, grid);
    }
}
