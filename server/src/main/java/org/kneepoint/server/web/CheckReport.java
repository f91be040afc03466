package org.kneepoint.server.web;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.server.chart.CheckChart;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.Verdict;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * A design check as one self-contained HTML file for a design review: the inputs, the verdict, the results, the
 * operating-point chart (inline SVG), the assumptions, the published source of each method and the
 * cautions. It needs nothing else to open offline: the style sheet is inlined and there is no script.
 */
public final class CheckReport {

    private static final List<String> ASSUMPTIONS = List.of(
            "The magnet is uniformly magnetized along +z and works in the second quadrant (H ≤ 0, B ≥ 0); B = μ0·H + J.",
            "Load line B = −μ0·Pc·(H + Ha), Ha the opposing field; for a shape, Pc = (1 − N)/N with the stated demagnetizing factor"
                    + " (magnetometric Nm unless another was chosen).",
            "Knee field Hk: where J has fallen to 0.9·Br (IEC 60404-8-1 practice, from memory).",
            "Irreversible loss by linear recoil: below the knee the magnet recoils along a line of slope μ0·(μrec − 1) in J from the"
                    + " operating point; Br' = J(Hop) − μ0·(μrec − 1)·Hop; loss = 1 − Br'/Br(T), carried back to T0 by the reversible coefficient.",
            "A library grade's curve at T comes from its temperature model: knee fits at the measured temperatures, interpolated"
                    + " between them and extrapolated (flagged) beyond; a typed-in grade follows the linear law of its α and β.",
            "The single-Pc estimate treats the magnet's internal field as uniform; local field variations near edges and pole faces are not in these numbers.");

    private static final List<String> SOURCES = List.of(
            "Cylinder demagnetizing factors: D.-X. Chen, J. A. Brug, R. B. Goldfarb, IEEE Trans. Magn. 27(4), 3601–3619 (1991);"
                    + " the fluxmetric closed form derived from the magnetometric one (Kneepoint).",
            "Block demagnetizing factors: A. Aharoni, J. Appl. Phys. 83, 3432 (1998).",
            "Spheroids: J. A. Osborn, Phys. Rev. 67, 351 (1945). Magnetic circuit Pc = (Lm·Ag)/(Am·Lg)·(σ/f): common practice.",
            "Knee model J(H) = Br + μ0(μrec − 1)H − D·exp(−(H + HcJ)/w) and the operating point in closed form with the Lambert W"
                    + " function (R. M. Corless et al., Adv. Comput. Math. 5, 329 (1996)).",
            "Linear temperature law Br(T) = Br0·(1 + α·(T − T0)), HcJ(T) = HcJ0·(1 + β·(T − T0)).");

    private CheckReport() {
    }

    /** The report's contents; {@code chart} is SVG markup from the chart library and {@code styleSheet} our own CSS. */
    record View(String version, String madeAt, String inputs, String model, String loadLine, String temperature,
            List<CheckResults.Row> results, String chart, List<String> assumptions, List<String> sources, boolean extrapolated,
            String styleSheet, Verdict verdict) {
    }

    /** The report of a check, from the command line that asked for it, by this version of the program. */
    public static String html(CheckRun run, String inputs, String programVersion) {
        String temperature = Temperatures.celsius(run.result().temperature());
        LoadLine line = run.result().loadLine();
        String chart = CheckChart.svg("Operating point at " + temperature, run.model().model(), CheckChart.temperaturesOf(
                run.model().model(), run.result().temperature(), run.result().maxWorkingTemperature()), line, 960, 560);
        return Templates.render("report.jte", new View(programVersion, Instant.now().toString(), inputs, run.model().description(),
                run.loadLine().describe(), temperature, CheckResults.rows(run), chart, ASSUMPTIONS, SOURCES, run.extrapolated(), styleSheet(),
                run.verdict()));
    }

    static String styleSheet() {
        try (InputStream in = CheckReport.class.getResourceAsStream("/web/kneepoint.css")) {
            return in == null ? "" : new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
