package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.fitter.shape.MagneticCircuit;
import org.kneepoint.server.app.design.PermeanceDocument;
import org.kneepoint.server.app.wording.Lengths;
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
        @Mixin
        OutputOptions output;

        @Spec(Spec.Target.MIXEE)
        CommandSpec spec;

        int print(MagnetShapeOptions magnet, String kind, String suffix) {
            return print(magnet.shape(kind, true), magnet.describe(kind) + suffix, magnet.onSteel);
        }

        int print(MagnetShape shape, String description, boolean onSteel) {
            var factors = PermeanceDocument.seen(shape, onSteel, "--on-steel").demagnetizingFactors();
            String where = onSteel ? "on a steel plate (image: twice the length)" : "free, in open circuit";
            output.print(spec.commandLine().getOut(), () -> PermeanceDocument.of(factors),
                    () -> PermeanceView.table(description + ", " + where, factors));
            return 0;
        }
    }

    @Command(name = "cylinder", mixinStandardHelpOptions = true, description = "Axially magnetized cylinder, or ring with --inner-diameter.")
    static final class Cylinder implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(magnet, "cylinder", "");
        }
    }

    @Command(name = "block", mixinStandardHelpOptions = true, description = "Rectangular block magnetized along its thickness.")
    static final class Block implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(magnet, "block", " (thickness along M)");
        }
    }

    @Command(name = "spheroid", mixinStandardHelpOptions = true,
            description = "Spheroid magnetized along its axis of symmetry (a sphere when both diameters agree).")
    static final class Spheroid implements Callable<Integer> {
        @Mixin
        MagnetShapeOptions magnet;

        @Mixin
        Output output;

        @Override
        public Integer call() {
            return output.print(magnet, "spheroid", "");
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
                    "circuit Lm = " + Lengths.mm(magnetLength) + ", Lg = " + Lengths.mm(gapLength) + ", σ = " + leakage + ", f = " + reluctance,
                    false);
        }
    }
}
