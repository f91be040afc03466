package org.kneepoint.tests;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.fitter.units.UnitCatalog;

/**
 * Random valid curve files (seeded): any delimiter, decimal commas where allowed, any supported
 * unit, B, J or M columns in either order, comments and blank lines — with the SI values the
 * reader must produce, computed from the very digits written. The curves are invented knee curves.
 */
final class RandomCurveFiles {

    record Generated(String text, String grade, double temperatureK, double[] h, double[] values) {
    }

    private static final String[] FIELD_UNITS = {"A/m", "kA/m", "MA/m", "Oe", "kOe"};
    private static final String[] FLUX_UNITS = {"T", "mT", "G", "kG"};
    private static final String[] MAGNETIZATION_UNITS = {"A/m", "kA/m", "emu/cm³"};
    private static final String[] TEMPERATURES = {"20 °C", "293.15 K", "68 °F", "120C", "423.15 K"};

    private RandomCurveFiles() {
    }

    static Generated generate(SplittableRandom random, int index) {
        char delimiter = ",;\t".charAt(random.nextInt(3));
        boolean decimalComma = delimiter != ',' && random.nextBoolean();
        String fieldUnit = FIELD_UNITS[random.nextInt(FIELD_UNITS.length)];
        char quantity = "BJM".charAt(random.nextInt(3));
        String valueUnit = quantity == 'M' ? MAGNETIZATION_UNITS[random.nextInt(MAGNETIZATION_UNITS.length)]
                : FLUX_UNITS[random.nextInt(FLUX_UNITS.length)];
        double fieldFactor = UnitCatalog.require(fieldUnit, Dimension.FIELD_STRENGTH).factor();
        double valueFactor = UnitCatalog.require(valueUnit, quantity == 'M' ? Dimension.MAGNETIZATION : Dimension.FLUX_DENSITY).factor();
        String temperature = TEMPERATURES[random.nextInt(TEMPERATURES.length)];
        boolean fieldFirst = random.nextBoolean();
        int points = 5 + random.nextInt(60);
        double br = 0.3 + random.nextDouble();
        double hcj = 2e5 + random.nextDouble() * 2e6;
        double muRec = 1.02 + 0.1 * random.nextDouble();

        StringBuilder text = new StringBuilder();
        if (random.nextBoolean()) {
            text.append("# invented test file ").append(index).append('\n');
        }
        String grade = "Random grade " + index;
        text.append("# grade: ").append(grade).append('\n').append("# family: invented family\n");
        text.append("# temperature: ").append(temperature).append('\n');
        String hHeader = "H [" + fieldUnit + "]";
        String vHeader = quantity + " [" + valueUnit + "]";
        text.append(fieldFirst ? hHeader + delimiter + vHeader : vHeader + delimiter + hHeader).append('\n');
        List<double[]> expected = new ArrayList<>();
        for (int i = 0; i < points; i++) {
            double h = 0.05 * hcj - 1.1 * hcj * i / (points - 1);
            double j = h <= -hcj ? 0 : (br + MU0 * (muRec - 1) * h) * (1 - Math.exp(-(h + hcj) / (0.05 * hcj)));
            double value = quantity == 'B' ? j + MU0 * h : quantity == 'J' ? j : j / MU0;
            String hText = number(random, h / fieldFactor);
            String vText = number(random, value / valueFactor);
            double storedValue = Double.parseDouble(vText) * valueFactor;
            expected.add(new double[] {Double.parseDouble(hText) * fieldFactor, quantity == 'M' ? MU0 * storedValue : storedValue});
            if (decimalComma) {
                hText = hText.replace('.', ',');
                vText = vText.replace('.', ',');
            }
            text.append(fieldFirst ? hText + delimiter + vText : vText + delimiter + hText).append('\n');
            if (random.nextInt(20) == 0) {
                text.append(random.nextBoolean() ? "\n" : "# a comment between rows\n");
            }
        }
        double[] h = expected.stream().mapToDouble(point -> point[0]).toArray();
        double[] values = expected.stream().mapToDouble(point -> point[1]).toArray();
        double kelvin = org.kneepoint.fitter.units.QuantityParser.parse(temperature, Dimension.TEMPERATURE);
        return new Generated(text.toString(), grade, kelvin, h, values);
    }

    private static String number(SplittableRandom random, double value) {
        return random.nextBoolean() ? String.format(Locale.ROOT, "%.9g", value) : String.format(Locale.ROOT, "%.7e", value);
    }
}
