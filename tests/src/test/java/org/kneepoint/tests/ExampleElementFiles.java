package org.kneepoint.tests;

import java.util.List;
import java.util.Locale;
import org.kneepoint.fitter.field.FieldVector;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.fitter.loadline.DesignCheck;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.fitter.shape.BlockShape;

/**
 * The invented element-field example of {@code examples/} (issue 16): Kneepoint's own analytic field inside a free
 * 20 × 10 × 5 mm block (magnetized along its 5 mm edge, +z) of the invented grade below at 80 °C, in a uniform
 * external field against the magnetization of 0, 330 and 400 kA/m — three load cases on 10 × 5 × 5 cells. Each
 * case polarizes the block at the J of its single-Pc operating point (Nm, docs/design.md §4); the field of a cell is
 * the block's demagnetizing field at its centre minus the external field.
 */
final class ExampleElementFiles {

    /** The invented grade, as typed in on the command line. */
    static final String GRADE = "--br 1.3T --mu-rec 1.05 --hcj 1600kA/m --knee 1450kA/m --alpha -0.12%/K --beta -0.6%/K";
    static final double TEMPERATURE = 353.15;
    static final List<Double> EXTERNAL_FIELDS = List.of(0.0, 3.3e5, 4.0e5);
    static final List<String> NAMES = List.of("invented-block-elements-case1.csv", "invented-block-elements-case2.csv",
            "invented-block-elements-case3.csv");

    private static final int[] CELLS = {10, 5, 5};

    private ExampleElementFiles() {
    }

    /** The text of load case {@code index} (0, 1, 2). */
    static String text(int index) {
        BlockShape block = new BlockShape(0.02, 0.01, 0.005);
        LinearTemperatureLaw law = LinearTemperatureLaw.ofPercentPerKelvin(LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6),
                -0.12, -0.6, LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE);
        double nm = block.demagnetizingFactors().magnetometric();
        double external = EXTERNAL_FIELDS.get(index);
        double j = DesignCheck.of(law, (1 - nm) / nm, AppliedField.external(external), TEMPERATURE, 0.01).point().j();
        MagnetField field = MagnetField.of(block, j);
        double[] edges = {block.width(), block.depth(), block.thickness()};
        StringBuilder out = new StringBuilder();
        out.append("# source: invented example, not a measurement: Kneepoint's analytic field inside a free 20 x 10 x 5 mm block,\n")
                .append(String.format(Locale.ROOT, "# notes: load case %d of 3, uniform external field %.0f kA/m against the"
                        + " magnetization (+z), 80 C%n", index + 1, external / 1e3))
                .append("x [mm],y [mm],z [mm],Hx [kA/m],Hy [kA/m],Hz [kA/m],V [mm³]\n");
        double volume = edges[0] * edges[1] * edges[2] / (CELLS[0] * CELLS[1] * CELLS[2]) * 1e9;
        for (int i = 0; i < CELLS[0]; i++) {
            for (int k = 0; k < CELLS[1]; k++) {
                for (int m = 0; m < CELLS[2]; m++) {
                    double x = -edges[0] / 2 + (i + 0.5) * edges[0] / CELLS[0];
                    double y = -edges[1] / 2 + (k + 0.5) * edges[1] / CELLS[1];
                    double z = -edges[2] / 2 + (m + 0.5) * edges[2] / CELLS[2];
                    FieldVector h = field.fieldStrength(x, y, z);
                    out.append(String.format(Locale.ROOT, "%.4f,%.4f,%.4f,%.6g,%.6g,%.6g,%.6g%n", x * 1e3, y * 1e3, z * 1e3, h.x() / 1e3,
                            h.y() / 1e3, (h.z() - external) / 1e3, volume));
                }
            }
        }
        return out.toString();
    }
}
