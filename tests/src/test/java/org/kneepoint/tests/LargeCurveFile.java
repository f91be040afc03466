package org.kneepoint.tests;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/** A large invented curve file in the long layout (a T column), for the kill test and the import benchmark. */
public final class LargeCurveFile {

    private LargeCurveFile() {
    }

    /** {@code curves} invented curves of {@code points} points each. */
    public static Path write(Path file, int curves, int points) throws IOException {
        try (BufferedWriter out = Files.newBufferedWriter(file)) {
            out.write("# grade: Invented large grade\n# family: invented family\n# source: invented for a test\n");
            out.write("T [K],H [A/m],J [T]\n");
            for (int c = 0; c < curves; c++) {
                double temperature = 250 + 4 * c;
                for (int i = 0; i < points; i++) {
                    double h = 1e5 - 1.7e6 * i / (points - 1.0);
                    double j = h <= -1.5e6 ? 0 : (1.3 + 6.3e-8 * h) * (1 - Math.exp(-(h + 1.5e6) / 4e4));
                    out.write(String.format(Locale.ROOT, "%.2f,%.3f,%.6f%n", temperature, h, j));
                }
            }
        }
        return file;
    }
}
