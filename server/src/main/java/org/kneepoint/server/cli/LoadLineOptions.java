package org.kneepoint.server.cli;

import java.util.Optional;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.DemagnetizingKind;
import org.kneepoint.fitter.shape.FlatPoleShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import picocli.CommandLine.Option;

/**
 * The load line's permeance coefficient: given as {@code --pc}, or from a cylinder, ring or block
 * (free or {@code --on-steel}) through the demagnetizing factor of the chosen kind (Nm by default, DESIGN §4).
 */
final class LoadLineOptions {

    @Option(names = "--pc", description = "Permeance coefficient of the load line, e.g. 2.5.")
    Double pc;

    @Option(names = "--diameter", converter = LengthConverter.class, description = "Cylinder or ring outer diameter.")
    Double diameter;

    @Option(names = "--length", converter = LengthConverter.class, description = "Cylinder or ring length along the magnetization.")
    Double length;

    @Option(names = "--inner-diameter", converter = LengthConverter.class, description = "Ring bore.")
    Double innerDiameter;

    @Option(names = "--width", converter = LengthConverter.class, description = "Block edge along x.")
    Double width;

    @Option(names = "--depth", converter = LengthConverter.class, description = "Block edge along y.")
    Double depth;

    @Option(names = "--thickness", converter = LengthConverter.class, description = "Block edge along the magnetization.")
    Double thickness;

    @Option(names = "--on-steel", description = "The magnet stands with one pole face on a large steel plate.")
    boolean onSteel;

    @Option(names = "--factor", defaultValue = "magnetometric",
            description = "Demagnetizing factor for the load line: magnetometric, fluxmetric or center (default: ${DEFAULT-VALUE}).")
    String factor;

    /** Pc of the load line. */
    double pc() {
        return shape().map(shape -> shape.demagnetizingFactors().permeanceCoefficients().coefficient(kind())).orElse(pc);
    }

    /** The magnet, free or on a steel plate, or empty when the load line was given by --pc. */
    Optional<MagnetShape> shape() {
        boolean cylinder = diameter != null || length != null || innerDiameter != null;
        boolean block = width != null || depth != null || thickness != null;
        if ((pc != null ? 1 : 0) + (cylinder ? 1 : 0) + (block ? 1 : 0) != 1) {
            throw new BadInputException("give the load line as --pc, or a cylinder (--diameter, --length, optional --inner-diameter),"
                    + " or a block (--width, --depth, --thickness), exactly one of them");
        }
        if (pc != null) {
            if (onSteel) {
                throw new BadInputException("--on-steel needs a shape, not --pc");
            }
            return Optional.empty();
        }
        return Optional.of(onSteel ? new MagnetOnSteelPlate(flatPole(cylinder)) : flatPole(cylinder));
    }

    /** How the load line was given, for the table's heading. */
    String describe() {
        if (pc != null) {
            return "load line given by its permeance coefficient";
        }
        String where = onSteel ? " on a steel plate" : "";
        String magnet = diameter != null || length != null
                ? (innerDiameter == null ? "cylinder" : "ring") + " D = " + Lengths.mm(diameter) + ", L = " + Lengths.mm(length)
                : "block " + Lengths.mm(width) + " × " + Lengths.mm(depth) + " × " + Lengths.mm(thickness);
        return magnet + where + " (" + factor + " factor)";
    }

    private FlatPoleShape flatPole(boolean cylinder) {
        if (cylinder) {
            if (diameter == null || length == null) {
                throw new BadInputException("a cylinder needs both --diameter and --length");
            }
            return innerDiameter == null ? new CylinderShape(diameter, length) : new RingShape(diameter, innerDiameter, length);
        }
        if (width == null || depth == null || thickness == null) {
            throw new BadInputException("a block needs --width, --depth and --thickness");
        }
        return new BlockShape(width, depth, thickness);
    }

    private DemagnetizingKind kind() {
        return switch (factor) {
            case "magnetometric" -> DemagnetizingKind.MAGNETOMETRIC;
            case "fluxmetric" -> DemagnetizingKind.FLUXMETRIC;
            case "center" -> DemagnetizingKind.CENTRE_POINT;
            default -> throw new BadInputException("--factor must be magnetometric, fluxmetric or center, got '" + factor + "'");
        };
    }
}
