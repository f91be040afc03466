package org.kneepoint.server.cli;

import java.util.EnumMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;
import org.kneepoint.server.app.lots.SpecificationDocument;
import org.kneepoint.server.app.lots.SpecificationRequest;
import org.kneepoint.server.app.lots.Specifications;
import org.kneepoint.server.text.LotViews;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint spec set GRADE --temperature T [--br-min B] [--hcj-min H] [--bh-max-min E] [--hk-min H]
 * [--squareness-min S] [--hcb-min H]} and the matching {@code --...-typical} options: the quantities
 * named replace what is stored at that temperature, the others stay.
 */
@Command(name = "set", mixinStandardHelpOptions = true, description = {
        "Set a grade's specification at one temperature: minimum (and typical) values of the quantities named.",
        "Quantities not named keep their stored values; every change adds one to the specification's version."})
final class SpecSetCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name as the library has it.")
    private String grade;

    @Option(names = "--temperature", required = true, paramLabel = "T", converter = QuantityConverters.Temperature.class,
            description = "The temperature the limits hold at, e.g. 20C or 150 °C.")
    private double temperatureK;

    @Option(names = "--br-min", paramLabel = "B", converter = QuantityConverters.FluxDensity.class, description = "Minimum Br, e.g. 1.28T or 12.8kG.")
    private Double brMin;

    @Option(names = "--hcj-min", paramLabel = "H", converter = QuantityConverters.FieldStrength.class, description = "Minimum HcJ, e.g. 955kA/m or 12kOe.")
    private Double hcjMin;

    @Option(names = "--bh-max-min", paramLabel = "E", converter = SpecificationConverters.EnergyProduct.class,
            description = "Minimum (BH)max, e.g. 310kJ/m3 or 39MGOe.")
    private Double bhMaxMin;

    @Option(names = "--hk-min", paramLabel = "H", converter = QuantityConverters.FieldStrength.class,
            description = "Minimum knee field Hk (|H| at J = 0.9·Br).")
    private Double hkMin;

    @Option(names = "--squareness-min", paramLabel = "S", converter = SpecificationConverters.Ratio.class,
            description = "Minimum squareness Hk/HcJ, e.g. 0.9 or 90%.")
    private Double squarenessMin;

    @Option(names = "--hcb-min", paramLabel = "H", converter = QuantityConverters.FieldStrength.class, description = "Minimum HcB.")
    private Double hcbMin;

    @Option(names = "--br-typical", paramLabel = "B", converter = QuantityConverters.FluxDensity.class, description = "Typical Br.")
    private Double brTypical;

    @Option(names = "--hcj-typical", paramLabel = "H", converter = QuantityConverters.FieldStrength.class, description = "Typical HcJ.")
    private Double hcjTypical;

    @Option(names = "--bh-max-typical", paramLabel = "E", converter = SpecificationConverters.EnergyProduct.class, description = "Typical (BH)max.")
    private Double bhMaxTypical;

    @Option(names = "--hk-typical", paramLabel = "H", converter = QuantityConverters.FieldStrength.class, description = "Typical Hk.")
    private Double hkTypical;

    @Option(names = "--squareness-typical", paramLabel = "S", converter = SpecificationConverters.Ratio.class, description = "Typical Hk/HcJ.")
    private Double squarenessTypical;

    @Option(names = "--hcb-typical", paramLabel = "H", converter = QuantityConverters.FieldStrength.class, description = "Typical HcB.")
    private Double hcbTypical;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        SpecificationRequest request = new SpecificationRequest(grade, temperatureK,
                given(brMin, hcjMin, bhMaxMin, hkMin, squarenessMin, hcbMin),
                given(brTypical, hcjTypical, bhMaxTypical, hkTypical, squarenessTypical, hcbTypical));
        SpecificationDocument document;
        try (Library library = libraryOption.open()) {
            document = Specifications.set(library, request);
        }
        output.print(spec.commandLine().getOut(), () -> document, () -> LotViews.specifications(document));
        return 0;
    }

    /** The values given, by quantity, in the order of {@link SpecifiedQuantity}. */
    private static Map<SpecifiedQuantity, Double> given(Double... values) {
        Map<SpecifiedQuantity, Double> given = new EnumMap<>(SpecifiedQuantity.class);
        for (int i = 0; i < values.length; i++) {
            if (values[i] != null) {
                given.put(SpecifiedQuantity.values()[i], values[i]);
            }
        }
        return given;
    }
}
