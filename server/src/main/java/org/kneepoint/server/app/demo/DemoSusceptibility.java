package org.kneepoint.server.app.demo;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Invented susceptibility tables of the demo: a diamagnetic metal (near the copper value
 * −9.6e-6 SI, Callister Table 20.2), a weak paramagnet (near aluminium's 2.2e-5, HyperPhysics
 * table), a Curie–Weiss paramagnetic steel and a paramagnetic salt following a Curie law with a
 * Curie constant near that of a spin-5/2 ion (about 4.4 cm³·K/mol, from memory). All invented.
 */
final class DemoSusceptibility {

    private DemoSusceptibility() {
    }

    static Map<String, String> files() {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("demo-copper-like-metal.csv", table("DEMO copper-like metal", "8.96 g/cm³", null, "T [K],chi [SI]",
                t -> -9.6e-6 + 1e-10 * (t - 293)));
        files.put("demo-aluminium-like-metal.csv", table("DEMO aluminium-like metal", "2.70 g/cm³", null, "T [K],chi [SI]",
                t -> 2.2e-5 * (1 - 1e-4 * (t - 293))));
        files.put("demo-paramagnetic-steel.csv", table("DEMO paramagnetic stainless steel", "7.9 g/cm³", null, "T [°C],chi [SI]",
                t -> 1.0 / (t + 10.0)));
        files.put("demo-paramagnetic-salt.csv", table("DEMO paramagnetic salt", "1.8 g/cm³", "0.2 kg/mol", "T [K],chi [cm³/mol]",
                t -> 4.4 / (t + 2.0)));
        return files;
    }

    private static String table(String material, String density, String molarMass, String header,
            java.util.function.DoubleUnaryOperator chiOfKelvin) {
        StringBuilder out = new StringBuilder("# DEMO DATA — invented for the Kneepoint demo scenario; not a measurement\n");
        out.append("# material: ").append(material).append('\n');
        out.append("# density: ").append(density).append('\n');
        if (molarMass != null) {
            out.append("# molar-mass: ").append(molarMass).append('\n');
        }
        out.append("# source: demo data (invented)\n");
        out.append(header).append('\n');
        boolean celsius = header.startsWith("T [°C]");
        for (double kelvin : new double[] {4, 10, 20, 50, 77, 100, 150, 200, 250, 293.15, 350, 400}) {
            if (celsius && kelvin < 200) {
                continue;
            }
            double written = celsius ? kelvin - 273.15 : kelvin;
            out.append(String.format(Locale.ROOT, "%.6g,%.6g%n", written, chiOfKelvin.applyAsDouble(kelvin)));
        }
        return out.toString();
    }
}
