package org.kneepoint.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.model.ja.HysteresisSimulator;
import org.kneepoint.fitter.model.ja.JilesAthertonParameters;
import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * Invented data for the fit commands: Jiles–Atherton loops simulated from known parameters with
 * Gaussian noise from a fixed seed, Curie–Weiss tables from known C, θ, χ0, and small libraries
 * holding them.
 */
final class FitTestData {

    /** The soft-iron-like parameter set the benchmarks use (docs/references.md §5b). */
    static final JilesAthertonParameters SOFT_IRON = new JilesAthertonParameters(1.6e6, 1100, 400, 0.2, 1.6e-3);
    static final double H_MAX = 5000;
    static final String GRADE = "Invented soft iron";
    static final String MATERIAL = "Invented paramagnet";
    static final double CURIE_CONSTANT = 0.05;
    static final double WEISS_TEMPERATURE = 20;
    static final double CHI0 = -1e-5;

    private FitTestData() {
    }

    /** H = Hmax·cos(2π·i/(n − 1)): one cycle from +Hmax, started demagnetized. */
    static double[] cosineField(int points) {
        double[] h = new double[points];
        for (int i = 0; i < points; i++) {
            h[i] = H_MAX * Math.cos(2 * Math.PI * i / (points - 1));
        }
        return h;
    }

    /** B of the soft-iron loop along {@code h}, plus noise of {@code noise}·max|B|. */
    static double[] noisyFluxDensity(double[] h, double noise, long seed) {
        double[] b = HysteresisSimulator.adaptive(SOFT_IRON).simulate(h).fluxDensity();
        double largest = 0;
        for (double value : b) {
            largest = Math.max(largest, Math.abs(value));
        }
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < b.length; i++) {
            b[i] += noise * largest * gaussian(random);
        }
        return b;
    }

    private static double gaussian(SplittableRandom random) {
        return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
    }

    /** A curve file of (H, B) rows with the given metadata lines. */
    static Path curveFile(Path folder, String name, String metadata, double[] h, double[] b) throws IOException {
        StringBuilder text = new StringBuilder(metadata).append("H [A/m],B [T]\n");
        for (int i = 0; i < h.length; i++) {
            text.append(String.format(Locale.ROOT, "%.9g,%.9g%n", h[i], b[i]));
        }
        return Files.writeString(folder.resolve(name), text);
    }

    /** A 300-point soft-iron loop file with 0.3 % noise, naming the grade. */
    static Path loopFile(Path folder) throws IOException {
        double[] h = cosineField(300);
        return curveFile(folder, "loop.csv", "# grade: " + GRADE + "\n# temperature: 20 °C\n# kind: loop\n", h,
                noisyFluxDensity(h, 0.003, 7L));
    }

    /** χ = C/(T − θ) + χ0 at 50 to 300 K, exact. */
    static double[][] curieWeissPoints() {
        double[][] points = new double[26][];
        for (int i = 0; i < points.length; i++) {
            double t = 50 + 10 * i;
            points[i] = new double[] {t, CURIE_CONSTANT / (t - WEISS_TEMPERATURE) + CHI0};
        }
        return points;
    }

    /** A library in {@code folder} holding the soft-iron grade with loops at the given temperatures, and the paramagnet. */
    static void storeLibrary(Path folder, double... temperaturesK) {
        double[] h = cosineField(300);
        List<LibraryCurve> curves = new java.util.ArrayList<>();
        for (double t : temperaturesK) {
            curves.add(new LibraryCurve(GRADE, new DemagnetizationCurve(CurveKind.LOOP, Quantity.B, h,
                    noisyFluxDensity(h, 0.003, 7L), t), "invented for tests", null));
        }
        List<SusceptibilityPoint> chi = new java.util.ArrayList<>();
        for (double[] point : curieWeissPoints()) {
            chi.add(new SusceptibilityPoint(MATERIAL, point[0], point[1], SusceptibilityForm.VOLUME, null, null, "invented", null));
        }
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            library.writer().importBatch(new ImportInfo("invented.csv", "0".repeat(63) + "7", Instant.parse("2026-12-02T01:00:00Z"),
                    curves.size(), curves.size() * h.length, chi.size()),
                    List.of(new GradeInfo(GRADE, "soft iron", null, null, null, "invented for tests")), curves, chi);
        }
    }

    /** H and B of the soft-iron curve from +1 to −1 kA/m (60 points) measured after magnetizing at 20 kA/m. */
    static double[][] secondQuadrantCurve() {
        double[] history = new double[61];
        history[0] = 20_000;
        for (int i = 1; i < history.length; i++) {
            history[i] = 1000 - 2000.0 * (i - 1) / 59;
        }
        double[] b = HysteresisSimulator.adaptive(SOFT_IRON).simulate(history).fluxDensity();
        return new double[][] {java.util.Arrays.copyOfRange(history, 1, history.length), java.util.Arrays.copyOfRange(b, 1, b.length)};
    }

    /** A library in {@code folder} holding one grade whose only curve is that second-quadrant curve, as a normal curve at 20 °C. */
    static void storeSecondQuadrantGrade(Path folder, String grade) {
        double[][] curve = secondQuadrantCurve();
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            library.writer().importBatch(new ImportInfo("curve.csv", "0".repeat(63) + "8", Instant.parse("2026-12-02T01:00:00Z"),
                    1, curve[0].length, 0), List.of(new GradeInfo(grade, "soft iron", null, null, null, "invented for tests")),
                    List.of(new LibraryCurve(grade, DemagnetizationCurve.of(Quantity.B, curve[0], curve[1], 293.15), "invented", null)),
                    List.of());
        }
    }

    static int storedFits(Path folder) {
        try (Library library = Library.open(DatabaseLocation.ofFolder(folder))) {
            return library.reader().fits().size();
        }
    }
}
