package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.ja.HysteresisSimulator;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.model.ja.LoopMetrics;
import org.kneepoint.fitter.model.ja.MajorLoopAnalysis;
import org.kneepoint.fitter.model.ja.Trajectory;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.app.fits.JilesAthertonLoopDocument;
import org.kneepoint.server.text.JilesAthertonLoopView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint ja simulate}: the loop 0 → +Hmax → −Hmax → +Hmax of given parameters, started
 * demagnetized and integrated adaptively (about 1e-6 relative accuracy), with its figures read on
 * the descending branch and, on request, its points.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Simulate the major loop 0 → +Hmax → −Hmax → +Hmax of Jiles–Atherton parameters.")
final class JilesAthertonSimulateCommand implements Callable<Integer> {

    /** Most points a simulated loop may be asked for. */
    static final int MAXIMUM_POINTS = 100_000;

    @Spec
    private CommandSpec spec;

    @Option(names = "--ms", required = true, paramLabel = "MAGNETIZATION", converter = QuantityConverters.Magnetization.class,
            description = "Saturation magnetization Ms, e.g. 1.6e6A/m or 1.6MA/m.")
    private double ms;

    @Option(names = "--a", required = true, paramLabel = "FIELD", converter = QuantityConverters.FieldStrength.class,
            description = "Anhysteretic shape parameter a, e.g. 1100A/m.")
    private double a;

    @Option(names = "--k", required = true, paramLabel = "FIELD", converter = QuantityConverters.FieldStrength.class,
            description = "Pinning parameter k, e.g. 400A/m.")
    private double k;

    @Option(names = "--c", required = true, paramLabel = "NUMBER", description = "Reversibility c, 0 to 1.")
    private double c;

    @Option(names = "--alpha", required = true, paramLabel = "NUMBER", description = "Interdomain coupling α, ≥ 0.")
    private double alpha;

    @Option(names = "--hmax", required = true, paramLabel = "FIELD", converter = QuantityConverters.FieldStrength.class,
            description = "Turning field Hmax of the loop, e.g. 5kA/m.")
    private double hMax;

    @Option(names = "--points", paramLabel = "N",
            description = "Also give the loop +Hmax → −Hmax → +Hmax as N points (3 to " + MAXIMUM_POINTS + ").")
    private Integer points;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        if (points != null && (points < 3 || points > MAXIMUM_POINTS)) {
            throw new BadInputException(InputLocation.of("option --points"),
                    "expected 3 to " + MAXIMUM_POINTS + " points, got " + points);
        }
        JilesAthertonParameters parameters = new JilesAthertonParameters(ms, a, k, c, alpha);
        LoopMetrics metrics = MajorLoopAnalysis.adaptive(parameters).measure(hMax);
        Trajectory loop = points == null ? null : HysteresisSimulator.adaptive(parameters).simulate(loopFields(hMax, points));
        var out = spec.commandLine().getOut();
        out.print(output.json ? Json.write(JilesAthertonLoopDocument.of(parameters, metrics, loop)) + System.lineSeparator()
                : JilesAthertonLoopView.table(parameters, metrics, loop));
        out.flush();
        return 0;
    }

    /** N fields along +Hmax → −Hmax → +Hmax, both turning fields included; the first is reached on the initial curve. */
    static double[] loopFields(double hMax, int count) {
        int falling = (count + 1) / 2;
        double[] h = new double[count];
        for (int i = 0; i < falling; i++) {
            h[i] = hMax - 2 * hMax * i / (falling - 1);
        }
        int rising = count - falling;
        for (int i = 1; i <= rising; i++) {
            h[falling - 1 + i] = -hMax + 2 * hMax * i / rising;
        }
        return h;
    }
}
