package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.server.app.design.FieldDocument;
import org.kneepoint.server.app.design.Position;
import org.kneepoint.server.text.FieldView;
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

        @Mixin
        OutputOptions output;

        @Spec(Spec.Target.MIXEE)
        CommandSpec spec;

        int print(MagnetShapeOptions magnet, String kind) {
            MagnetShape shape = magnet.shape(kind, false);
            String description = magnet.describe(kind);
            MagnetField field = MagnetField.of(shape, br);
            output.print(spec.commandLine().getOut(), () -> FieldDocument.at(field, at), () -> FieldView.table(description,
                    at.toArray(), field.sample(at.x(), at.y(), at.z()), field.isInside(at.x(), at.y(), at.z())));
            return 0;
        }
    }

    @Command(name = "cylinder", mixinStandardHelpOptions = true, description = "Axially magnetized solid cylinder, axis along z.")
    static final class Cylinder implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(magnet, "cylinder");
        }
    }

    @Command(name = "ring", mixinStandardHelpOptions = true, description = "Axially magnetized ring, axis along z.")
    static final class Ring implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(magnet, "ring");
        }
    }

    @Command(name = "block", mixinStandardHelpOptions = true, description = "Block with edges width, depth, thickness along x, y, z.")
    static final class Block implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Point point;

        @Override
        public Integer call() {
            return point.print(magnet, "block");
        }
    }
}
