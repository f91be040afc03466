package org.kneepoint.server.cli;

import org.kneepoint.server.app.design.LoadLineSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The load line's options: {@code --pc}, or a cylinder, ring or block (free or {@code --on-steel}) through the
 * demagnetizing factor of the chosen kind ({@link LoadLineSpec}); the magnet's options are {@link MagnetShapeOptions}.
 */
final class LoadLineOptions {
    @Option(names = "--pc", description = "Permeance coefficient of the load line, e.g. 2.5.")
    Double pc;

    @Mixin
    MagnetShapeOptions magnet;

    /** The load line these options give. */
    LoadLineSpec spec() {
        return magnet.loadLine(pc);
    }
}
