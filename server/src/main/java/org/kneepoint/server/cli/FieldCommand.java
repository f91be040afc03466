package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.field.FieldVector;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.server.library.Lengths;
import org.kneepoint.server.library.Position;
import org.kneepoint.server.text.FieldView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint field SHAPE ... --br B --at x,y,z}: the flux density B at one point inside or
 * outside a uniformly magnetized cylinder, ring or block (origin at its centre, M along +z).
 */
@Command(name = "field", mixinStandardHelpOptions = true,
        description = "Flux density B at a point near a cylinder, ring or block magnet.",
        subcommands = {FieldCommand.Cylinder.class, FieldCommand.Ring.class, FieldCommand.Block.class})
final class FieldCommand implements Runnable {

    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        throw new ParameterException(spec.commandLine(), "name a shape: cylinder, ring or block");
    }

    /** Options every shape shares. */
    static final class Point {
        @Option(names = "--br", required = true, converter = QuantityConverters.FluxDensity.class,
                description = "Remanence Br = μ0·M of the magnet, e.g. 1.3T.")
        double br;

        @Option(names = "--at", required = true, converter = PositionConverter.class,
                description = "The point x,y,z; a unit after the last number applies to all three, e.g. 2,0,3mm.")
        Position at;

        @Option(names = "--json", description = "Print one JSON document (SI units).")
        boolean json;

        @Spec(Spec.Target.MIXEE)
        CommandSpec spec;

        int print(MagnetShape shape, String description) {
            MagnetField field = MagnetField.of(shape, br);
            double[] point = {at.x(), at.y(), at.z()};
            FieldVector b = field.fluxDensity(at.x(), at.y(), at.z());
            var out = spec.commandLine().getOut();
            out.print(json ? Json.write(FieldView.json(point, b)) + System.lineSeparator()
                    : FieldView.table(description, point, b, field.isInside(at.x(), at.y(), at.z())));
            out.flush();
            return 0;
        }
    }

    @Command(name = "cylinder", mixinStandardHelpOptions = true, description = "Axially magnetized solid cylinder, axis along z.")
    static final class Cylinder implements Callable<Integer> {
        @Option(names = "--diameter", required = true, converter = LengthConverter.class, description = "Diameter, e.g. 10mm.")
        double diameter;

        @Option(names = "--length", required = true, converter = LengthConverter.class, description = "Length along z.")
        double length;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(new CylinderShape(diameter, length), "cylinder D = " + Lengths.mm(diameter) + ", L = " + Lengths.mm(length));
        }
    }

    @Command(name = "ring", mixinStandardHelpOptions = true, description = "Axially magnetized ring, axis along z.")
    static final class Ring implements Callable<Integer> {
        @Option(names = "--diameter", required = true, converter = LengthConverter.class, description = "Outer diameter.")
        double diameter;

        @Option(names = "--inner-diameter", required = true, converter = LengthConverter.class, description = "Bore.")
        double innerDiameter;

        @Option(names = "--length", required = true, converter = LengthConverter.class, description = "Length along z.")
        double length;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(new RingShape(diameter, innerDiameter, length),
                    "ring D = " + Lengths.mm(diameter) + ", Di = " + Lengths.mm(innerDiameter) + ", L = " + Lengths.mm(length));
        }
    }

    @Command(name = "block", mixinStandardHelpOptions = true, description = "Block with edges width, depth, thickness along x, y, z.")
    static final class Block implements Callable<Integer> {
        @Option(names = "--width", required = true, converter = LengthConverter.class, description = "Edge along x.")
        double width;

        @Option(names = "--depth", required = true, converter = LengthConverter.class, description = "Edge along y.")
        double depth;

        @Option(names = "--thickness", required = true, converter = LengthConverter.class, description = "Edge along z, the magnetization.")
        double thickness;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(new BlockShape(width, depth, thickness),
                    "block " + Lengths.mm(width) + " × " + Lengths.mm(depth) + " × " + Lengths.mm(thickness));
        }
    }
}
