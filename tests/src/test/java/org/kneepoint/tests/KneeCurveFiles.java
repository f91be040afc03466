package org.kneepoint.tests;

import static org.kneepoint.fitter.units.MagneticConstant.MU0;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Invented curve files of the tests' own knee formula J = (Br + μ0·(μrec − 1)·H)·(1 − exp(−(H + HcJ)/w)), μrec = 1.04,
 * w = 30 kA/m, at 20 °C from +200 to −1600 kA/m in steps of 2 kA/m. H = 0 and H = −HcJ (a whole number of 2 kA/m)
 * are grid points and J is written with 17 digits, so each file's Br and HcJ are exact by construction.
 */
final class KneeCurveFiles {

    private KneeCurveFiles() {
    }

    /** Writes the file into {@code folder}; {@code header} (metadata lines, each ending in a newline) goes first. */
    static Path write(Path folder, String name, String header, double br, int hcjKiloAmpere) throws IOException {
        List<String> lines = new ArrayList<>(List.of(header + "# temperature: 20 °C", "H [kA/m],J [T]"));
        for (int i = 0; i <= 900; i++) {
            int h = 200 - 2 * i;
            double hSi = 1e3 * h;
            double j = h <= -hcjKiloAmpere ? 0.0 : (br + MU0 * 0.04 * hSi) * (1 - Math.exp(-(hSi + 1e3 * hcjKiloAmpere) / 3e4));
            lines.add(h + "," + String.format(Locale.ROOT, "%.17g", j));
        }
        Path path = folder.resolve(name);
        Files.writeString(path, String.join("\n", lines) + "\n");
        return path;
    }
}
