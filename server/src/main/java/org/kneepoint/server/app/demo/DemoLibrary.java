package org.kneepoint.server.app.demo;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;

/**
 * The demo library, all of it invented. Scenario: a small maker of e-bike hub motors and
 * Hall-sensor position encoders qualifies rotor and sensor magnets offered by two invented
 * suppliers. Twelve grades across sintered NdFeB (five coercivity classes), SmCo (2:17 and 1:5),
 * hard ferrite, cast AlNiCo and bonded NdFeB, each with curves at 3–5 temperatures within what
 * the family allows, and susceptibility tables for four weakly magnetic materials.
 *
 * <p>Values are invented but typical of each family: Br, α(Br) and the ranges of μrec and β(HcJ)
 * follow the family values collected in shared/docs/references.md §6b (IEC TR 62518 summary and the
 * Modelica FluxTubes records for α; μrec and β from memory). Br falls linearly with α; HcJ
 * follows exp(β·(T − 20 °C)), whose slope at 20 °C is β and which never turns negative. Curves follow an invented knee
 * shape, J = (Br + μ0(μrec − 1)H)·(1 − exp(−(H + HcJ)/w)), and for AlNiCo the rounded form
 * J = Br·(1 − (−H/HcJ)^n); a little seeded noise makes them look measured. Every file says
 * "DEMO DATA — invented".
 */
public final class DemoLibrary {

    static final String NORTH = "Supplier North (invented)";
    static final String SOUTH = "Supplier South (invented)";

    static final List<DemoGrade> GRADES = List.of(
            new DemoGrade("DEMO NdFeB 42/100", "sintered NdFeB", NORTH, 7500, 1.31, 1.00e6, 1.05, -0.12, -0.60, 0.030, List.of(20, 60, 80, 100), true, 45.0),
            new DemoGrade("DEMO NdFeB 40/160", "sintered NdFeB", NORTH, 7500, 1.27, 1.60e6, 1.05, -0.12, -0.58, 0.030, List.of(20, 80, 120, 150), false, 55.0),
            new DemoGrade("DEMO NdFeB 38/200", "sintered NdFeB", SOUTH, 7550, 1.24, 2.00e6, 1.05, -0.115, -0.55, 0.035, List.of(20, 80, 120, 150, 180), true, 68.0),
            new DemoGrade("DEMO NdFeB 35/250", "sintered NdFeB", SOUTH, 7550, 1.19, 2.50e6, 1.04, -0.11, -0.52, 0.035, List.of(20, 100, 150, 200, 220), false, 82.0),
            new DemoGrade("DEMO NdFeB 33/280", "sintered NdFeB", NORTH, 7600, 1.16, 2.80e6, 1.04, -0.105, -0.50, 0.040, List.of(20, 100, 150, 200), false, 95.0),
            new DemoGrade("DEMO SmCo 28/200", "sintered SmCo", SOUTH, 8300, 1.07, 2.00e6, 1.03, -0.035, -0.25, 0.040, List.of(20, 100, 200, 300, 350), false, 120.0),
            new DemoGrade("DEMO SmCo 18/160", "sintered SmCo", NORTH, 8300, 0.88, 1.60e6, 1.04, -0.045, -0.30, 0.050, List.of(20, 100, 200, 250), true, 105.0),
            new DemoGrade("DEMO Ferrite 30/26", "hard ferrite", SOUTH, 4900, 0.40, 2.60e5, 1.10, -0.20, 0.30, 0.060, List.of(-40, 0, 20, 80, 150), false, 4.2),
            new DemoGrade("DEMO Ferrite 27/33", "hard ferrite", NORTH, 4950, 0.38, 3.30e5, 1.10, -0.19, 0.20, 0.060, List.of(-40, 20, 80, 150), true, 4.8),
            new DemoGrade("DEMO AlNiCo 5", "cast AlNiCo", SOUTH, 7300, 1.25, 5.2e4, 0, -0.02, 0.01, 5.0, List.of(20, 200, 400, 500), false, 38.0),
            new DemoGrade("DEMO AlNiCo 8", "cast AlNiCo", NORTH, 7300, 0.82, 1.3e5, 0, -0.025, 0.01, 3.0, List.of(20, 200, 400), false, 52.0),
            new DemoGrade("DEMO bonded NdFeB 10/70", "bonded NdFeB", SOUTH, 6000, 0.68, 7.2e5, 1.15, -0.11, -0.40, 0.100, List.of(20, 80, 120, 150), false, 60.0));

    private static final int POINTS = 120;
    private static final double NOISE = 5e-4;

    private DemoLibrary() {
    }

    /** File name → text of every demo file: one curve file per grade, one table per material. */
    public static Map<String, String> files() {
        Map<String, String> files = new LinkedHashMap<>();
        for (DemoGrade grade : GRADES) {
            files.put(grade.name().replaceAll("[^A-Za-z0-9]+", "-").toLowerCase(Locale.ROOT) + ".csv", curveFile(grade));
        }
        files.putAll(DemoSusceptibility.files());
        return files;
    }

    /** Names of the demo grades. */
    /** The invented price per kilogram of each demo grade (a demo currency; roughly in the order of real families' costs, from memory). */
    static Map<String, Double> prices() {
        Map<String, Double> prices = new java.util.LinkedHashMap<>();
        GRADES.forEach(grade -> prices.put(grade.name(), grade.price()));
        return prices;
    }

    public static List<String> gradeNames() {
        return GRADES.stream().map(DemoGrade::name).toList();
    }

    static String curveFile(DemoGrade grade) {
        StringBuilder out = new StringBuilder();
        out.append("# DEMO DATA — invented for the Kneepoint demo scenario (e-bike hub motors and position sensors); not a real grade\n");
        out.append("# grade: ").append(grade.name()).append('\n');
        out.append("# family: ").append(grade.family()).append('\n');
        out.append("# supplier: ").append(grade.supplier()).append('\n');
        out.append("# density: ").append(grade.density()).append(" kg/m³\n");
        out.append("# source: demo data (invented)\n");
        out.append(grade.cgsUnits() ? "T [°C],H [kOe],J [kG]\n" : "T [°C],H [kA/m],J [T]\n");
        SplittableRandom noise = new SplittableRandom(grade.name().hashCode());
        for (int celsius : grade.celsius()) {
            double br = grade.br() * (1 + grade.alpha() / 100 * (celsius - 20));
            double hcj = grade.hcj() * Math.exp(grade.beta() / 100 * (celsius - 20));
            for (int i = 0; i < POINTS; i++) {
                double h = 0.05 * hcj - 1.2 * hcj * i / (POINTS - 1);
                double j = polarization(grade, h, br, hcj) * (1 + NOISE * noise.nextGaussian());
                double hOut = grade.cgsUnits() ? h * 4 * Math.PI / 1e6 : h / 1e3;
                double jOut = grade.cgsUnits() ? j * 10 : j;
                out.append(String.format(Locale.ROOT, "%d,%.5g,%.5g%n", celsius, hOut, jOut));
            }
        }
        return out.toString();
    }

    private static double polarization(DemoGrade grade, double h, double br, double hcj) {
        if (h <= -hcj) {
            return 0.0;
        }
        if (grade.family().contains("AlNiCo")) {
            double x = Math.max(0, -h / hcj);
            return br * (1 - Math.pow(x, grade.roundness())) + (h > 0 ? MU0 * 2.0 * h : 0);
        }
        double width = grade.roundness() * hcj;
        return (br + MU0 * (grade.muRec() - 1) * h) * (1 - Math.exp(-(h + hcj) / width));
    }
}
