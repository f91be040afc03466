package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.shape.BlockShape;
import org.kneepoint.fitter.shape.CylinderShape;
import org.kneepoint.fitter.shape.FlatPoleShape;
import org.kneepoint.fitter.shape.MagnetOnSteelPlate;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.MagneticCircuit;
import org.kneepoint.fitter.shape.RingShape;
import org.kneepoint.fitter.shape.SpheroidShape;
import org.kneepoint.server.library.Lengths;
import org.kneepoint.server.text.Json;
import org.kneepoint.server.text.PermeanceView;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint permeance SHAPE ...}: the demagnetizing factors (magnetometric, fluxmetric,
 * centre point) of a magnet and the permeance coefficient Pc = (1 − N)/N of each.
 */
@Command(name = "permeance", mixinStandardHelpOptions = true,
        description = "Demagnetizing factors Nm, Nf, N0 and permeance coefficients of a magnet shape or a simple circuit.",
        subcommands = {PermeanceCommand.Cylinder.class, PermeanceCommand.Block.class, PermeanceCommand.Spheroid.class,
            PermeanceCommand.Circuit.class})
final class PermeanceCommand implements Runnable {

    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        throw new ParameterException(spec.commandLine(), "name a shape: cylinder, block, spheroid or circuit");
    }

    /** Options every shape shares. */
    static final class Output {
        @Option(names = "--json", description = "Print one JSON document (SI units).")
        boolean json;

        @Option(names = "--on-steel", description = "The magnet stands with one pole face on a large steel plate (image doubles its length).")
        boolean onSteel;

        @Spec(Spec.Target.MIXEE)
        CommandSpec spec;

        int print(MagnetShape shape, String description) {
            MagnetShape seen = shape;
            String where = "free, in open circuit";
            if (onSteel) {
                if (!(shape instanceof FlatPoleShape flat)) {
                    throw new BadInputException("--on-steel needs a magnet with a flat pole face (cylinder, ring or block)");
                }
                seen = new MagnetOnSteelPlate(flat);
                where = "on a steel plate (image: twice the length)";
            }
            var factors = seen.demagnetizingFactors();
            var out = spec.commandLine().getOut();
            out.print(json ? Json.write(PermeanceView.json(factors)) + System.lineSeparator()
                    : PermeanceView.table(description + ", " + where, factors));
            out.flush();
            return 0;
        }
    }

    @Command(name = "cylinder", mixinStandardHelpOptions = true, description = "Axially magnetized cylinder, or ring with --inner-diameter.")
    static final class Cylinder implements Callable<Integer> {
        @Option(names = "--diameter", required = true, converter = LengthConverter.class, description = "Outer diameter, e.g. 10mm.")
        double diameter;

        @Option(names = "--length", required = true, converter = LengthConverter.class, description = "Length along the magnetization.")
        double length;

        @Option(names = "--inner-diameter", converter = LengthConverter.class, description = "Bore of a ring.")
        Double innerDiameter;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            if (innerDiameter == null) {
                return output.print(new CylinderShape(diameter, length), "cylinder D = " + Lengths.mm(diameter) + ", L = " + Lengths.mm(length));
            }
            return output.print(new RingShape(diameter, innerDiameter, length),
                    "ring D = " + Lengths.mm(diameter) + ", Di = " + Lengths.mm(innerDiameter) + ", L = " + Lengths.mm(length));
        }
    }

    @Command(name = "block", mixinStandardHelpOptions = true, description = "Rectangular block magnetized along its thickness.")
    static final class Block implements Callable<Integer> {
        @Option(names = "--width", required = true, converter = LengthConverter.class, description = "Edge along x.")
        double width;

        @Option(names = "--depth", required = true, converter = LengthConverter.class, description = "Edge along y.")
        double depth;

        @Option(names = "--thickness", required = true, converter = LengthConverter.class, description = "Edge along the magnetization (z).")
        double thickness;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(new BlockShape(width, depth, thickness),
                    "block " + Lengths.mm(width) + " × " + Lengths.mm(depth) + " × " + Lengths.mm(thickness) + " (thickness along M)");
        }
    }

    @Command(name = "spheroid", mixinStandardHelpOptions = true,
            description = "Spheroid magnetized along its axis of symmetry (a sphere when both diameters agree).")
    static final class Spheroid implements Callable<Integer> {
        @Option(names = "--diameter", required = true, converter = LengthConverter.class, description = "Equatorial diameter.")
        double diameter;

        @Option(names = "--length", required = true, converter = LengthConverter.class, description = "Polar diameter, along the magnetization.")
        double length;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(new SpheroidShape(diameter, length), "spheroid D = " + Lengths.mm(diameter) + ", L = " + Lengths.mm(length));
        }
    }

    @Command(name = "circuit", mixinStandardHelpOptions = true,
            description = "Simple magnetic circuit: Pc = (Lm·Ag)/(Am·Lg)·(σ/f) (common practice).")
    static final class Circuit implements Callable<Integer> {
        @Option(names = "--magnet-length", required = true, converter = LengthConverter.class, description = "Lm, along the magnetization.")
        double magnetLength;

        @Option(names = "--magnet-area", required = true, converter = AreaConverter.class, description = "Am, pole area, e.g. 100mm².")
        double magnetArea;

        @Option(names = "--gap-length", required = true, converter = LengthConverter.class, description = "Lg, air gap length.")
        double gapLength;

        @Option(names = "--gap-area", required = true, converter = AreaConverter.class, description = "Ag, air gap area.")
        double gapArea;

        @Option(names = "--leakage", defaultValue = "1", description = "Leakage factor σ ≥ 1 (default: ${DEFAULT-VALUE}).")
        double leakage;

        @Option(names = "--reluctance", defaultValue = "1", description = "Reluctance factor f ≥ 1 (default: ${DEFAULT-VALUE}).")
        double reluctance;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(new MagneticCircuit(magnetLength, magnetArea, gapLength, gapArea, leakage, reluctance),
                    "circuit Lm = " + Lengths.mm(magnetLength) + ", Lg = " + Lengths.mm(gapLength) + ", σ = " + leakage + ", f = " + reluctance);
        }
    }
}
