package org.kneepoint.server.app.design;

import org.kneepoint.server.app.wording.Lengths;

import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.DemagnetizingKind;
import org.kneepoint.fitter.shape.FlatPoleShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.study.ToleranceName;

/**
 * A load line as the command line and the HTTP routes take it: a permeance coefficient, or a cylinder, ring or
 * block (free or on a steel plate) through the demagnetizing factor of the chosen kind (Nm by default, docs/design.md §4).
 * The lengths are metres, null when not given; {@code factor} is magnetometric, fluxmetric or center.
 */
public record LoadLineSpec(Double pc, Double diameter, Double length, Double innerDiameter, Double width, Double depth,
        Double thickness, boolean onSteel, String factor) {

    /** Pc of the load line. */
    public double permeanceCoefficient() {
        return shape().map(shape -> shape.demagnetizingFactors().permeanceCoefficients().coefficient(kind())).orElse(pc);
    }

    /** The magnet, free or on a steel plate, or empty when the load line was given by its Pc. */
    public Optional<MagnetShape> shape() {
        boolean cylinder = diameter != null || length != null || innerDiameter != null;
        boolean block = width != null || depth != null || thickness != null;
        if ((pc != null ? 1 : 0) + (cylinder ? 1 : 0) + (block ? 1 : 0) != 1) {
            throw new BadInputException("give the load line as pc, or a cylinder (diameter, length, optional inner diameter),"
                    + " or a block (width, depth, thickness), exactly one of them");
        }
        if (pc != null) {
            if (onSteel) {
                throw new BadInputException("on steel needs a shape, not pc");
            }
            if (!(pc > 0) || pc.isInfinite()) {
                throw new BadInputException("permeance coefficient pc must be positive and finite, got " + pc);
            }
            return Optional.empty();
        }
        return Optional.of(onSteel ? new MagnetOnSteelPlate(flatPole(cylinder)) : flatPole(cylinder));
    }

    /** The sizes of the shape (metres) by their tolerance names; empty for a load line given by its Pc. */
    public Map<ToleranceName, Double> sizes() {
        Map<ToleranceName, Double> sizes = new EnumMap<>(ToleranceName.class);
        put(sizes, ToleranceName.DIAMETER, diameter);
        put(sizes, ToleranceName.INNER_DIAMETER, innerDiameter);
        put(sizes, ToleranceName.LENGTH, length);
        put(sizes, ToleranceName.WIDTH, width);
        put(sizes, ToleranceName.DEPTH, depth);
        put(sizes, ToleranceName.THICKNESS, thickness);
        return sizes;
    }

    /** The same load line with some sizes replaced (metres, by their tolerance names). */
    public LoadLineSpec withSizes(Map<ToleranceName, Double> sizes) {
        return new LoadLineSpec(pc, sizes.getOrDefault(ToleranceName.DIAMETER, diameter),
                sizes.getOrDefault(ToleranceName.LENGTH, length), sizes.getOrDefault(ToleranceName.INNER_DIAMETER, innerDiameter),
                sizes.getOrDefault(ToleranceName.WIDTH, width), sizes.getOrDefault(ToleranceName.DEPTH, depth),
                sizes.getOrDefault(ToleranceName.THICKNESS, thickness), onSteel, factor);
    }

    private static void put(Map<ToleranceName, Double> sizes, ToleranceName name, Double size) {
        if (size != null) {
            sizes.put(name, size);
        }
    }

    /** How the load line was given, for the table's heading. */
    public String describe() {
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
                throw new BadInputException("a cylinder needs both a diameter and a length");
            }
            return innerDiameter == null ? new CylinderShape(diameter, length) : new RingShape(diameter, innerDiameter, length);
        }
        if (width == null || depth == null || thickness == null) {
            throw new BadInputException("a block needs a width, a depth and a thickness");
        }
        return new BlockShape(width, depth, thickness);
    }

    private DemagnetizingKind kind() {
        return switch (factor) {
            case "magnetometric" -> DemagnetizingKind.MAGNETOMETRIC;
            case "fluxmetric" -> DemagnetizingKind.FLUXMETRIC;
            case "center" -> DemagnetizingKind.CENTRE_POINT;
            default -> throw new BadInputException("the factor must be magnetometric, fluxmetric or center, got '" + factor + "'");
        };
    }
}
