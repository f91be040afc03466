package org.kneepoint.server.cli;

import java.util.Optional;
import org.kneepoint.fitter.shape.MagnetShape;
import org.kneepoint.server.library.LoadLineSpec;
import picocli.CommandLine.Option;

/**
 * The load line's options: {@code --pc}, or a cylinder, ring or block (free or {@code --on-steel}) through the
 * demagnetizing factor of the chosen kind ({@link LoadLineSpec}).
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

    /** The load line these options give. */
    LoadLineSpec spec() {
        return new LoadLineSpec(pc, diameter, length, innerDiameter, width, depth, thickness, onSteel, factor);
    }

    /** Pc of the load line. */
    double pc() {
        return spec().permeanceCoefficient();
    }

    /** The magnet, free or on a steel plate, or empty when the load line was given by --pc. */
    Optional<MagnetShape> shape() {
        return spec().shape();
    }

    /** How the load line was given, for the table's heading. */
    String describe() {
        return spec().describe();
    }
}
