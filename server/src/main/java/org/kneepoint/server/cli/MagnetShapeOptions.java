package org.kneepoint.server.cli;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.server.app.design.LoadLineSpec;
import org.kneepoint.server.app.wording.Lengths;
import picocli.CommandLine.Option;

/**
 * The magnet's shape options, declared once for every command that takes a magnet ({@code check}, {@code duty},
 * {@code select}, {@code permeance}, {@code field}): the sizes of a cylinder, ring, block or spheroid, whether it
 * stands on a steel plate, and which demagnetizing factor sets the load line. A command that names its shape
 * ({@code permeance cylinder}, {@code field block}) takes the sizes of that shape only and refuses the others.
 */
final class MagnetShapeOptions {

    private static final String FACTOR = "--factor";
    private static final String ON_STEEL = "--on-steel";

    @Option(names = "--diameter", converter = LengthConverter.class,
            description = "Outer diameter of a cylinder or ring (equatorial diameter of a spheroid), e.g. 10mm.")
    Double diameter;

    @Option(names = "--length", converter = LengthConverter.class,
            description = "Length of a cylinder or ring along the magnetization (polar diameter of a spheroid).")
    Double length;

    @Option(names = "--inner-diameter", converter = LengthConverter.class, description = "Bore of a ring.")
    Double innerDiameter;

    @Option(names = "--width", converter = LengthConverter.class, description = "Block edge along x.")
    Double width;

    @Option(names = "--depth", converter = LengthConverter.class, description = "Block edge along y.")
    Double depth;

    @Option(names = "--thickness", converter = LengthConverter.class, description = "Block edge along the magnetization (z).")
    Double thickness;

    @Option(names = ON_STEEL, description = "The magnet stands with one pole face on a large steel plate (its image doubles its length).")
    boolean onSteel;

    @Option(names = FACTOR, paramLabel = "KIND",
            description = "Demagnetizing factor for the load line: magnetometric (default), fluxmetric or center.")
    String factor;

    /** The load line of {@code check}, {@code duty} and {@code select}: {@code pc}, or this magnet. */
    LoadLineSpec loadLine(Double pc) {
        return new LoadLineSpec(pc, diameter, length, innerDiameter, width, depth, thickness, onSteel,
                factor == null ? "magnetometric" : factor);
    }

    /**
     * The magnet of the shape a command names: {@code cylinder} (a ring when given {@code --inner-diameter}),
     * {@code ring}, {@code block} or {@code spheroid}; sizes of another shape, a missing size, and {@code --factor}
     * (or {@code --on-steel} where {@code onSteelApplies} is false) are refused, naming the option.
     */
    MagnetShape shape(String kind, boolean onSteelApplies) {
        if (factor != null) {
            throw new BadInputException(FACTOR + " sets the load line of check, duty and select; " + kind + " takes no " + FACTOR);
        }
        if (onSteel && !onSteelApplies) {
            throw new BadInputException(ON_STEEL + " does not apply here: the field is that of a free magnet");
        }
        return switch (kind) {
            case "cylinder" -> {
                only(kind, "--diameter", "--length", "--inner-diameter");
                yield innerDiameter == null ? new CylinderShape(need(diameter, "--diameter", kind), need(length, "--length", kind))
                        : new RingShape(need(diameter, "--diameter", kind), innerDiameter, need(length, "--length", kind));
            }
            case "ring" -> {
                only(kind, "--diameter", "--length", "--inner-diameter");
                yield new RingShape(need(diameter, "--diameter", kind), need(innerDiameter, "--inner-diameter", kind),
                        need(length, "--length", kind));
            }
            case "block" -> {
                only(kind, "--width", "--depth", "--thickness");
                yield new BlockShape(need(width, "--width", kind), need(depth, "--depth", kind), need(thickness, "--thickness", kind));
            }
            case "spheroid" -> {
                only(kind, "--diameter", "--length");
                yield new SpheroidShape(need(diameter, "--diameter", kind), need(length, "--length", kind));
            }
            default -> throw new IllegalArgumentException("no magnet shape named " + kind);
        };
    }

    /** The magnet of {@link #shape} in one line, e.g. {@code ring D = 20 mm, Di = 8 mm, L = 5 mm}. */
    String describe(String kind) {
        if (kind.equals("block")) {
            return "block " + Lengths.mm(width) + " × " + Lengths.mm(depth) + " × " + Lengths.mm(thickness);
        }
        return innerDiameter == null ? kind + " D = " + Lengths.mm(diameter) + ", L = " + Lengths.mm(length)
                : "ring D = " + Lengths.mm(diameter) + ", Di = " + Lengths.mm(innerDiameter) + ", L = " + Lengths.mm(length);
    }

    private void only(String kind, String... allowed) {
        List<String> given = new ArrayList<>();
        add(given, "--diameter", diameter);
        add(given, "--length", length);
        add(given, "--inner-diameter", innerDiameter);
        add(given, "--width", width);
        add(given, "--depth", depth);
        add(given, "--thickness", thickness);
        given.removeAll(List.of(allowed));
        if (!given.isEmpty()) {
            throw new BadInputException(given.get(0) + " is not a size of a " + kind + ", which takes " + String.join(", ", allowed));
        }
    }

    private static void add(List<String> given, String name, Double value) {
        if (value != null) {
            given.add(name);
        }
    }

    private static double need(Double value, String name, String kind) {
        if (value == null) {
            throw new BadInputException("a " + kind + " needs " + name);
        }
        return value;
    }
}
