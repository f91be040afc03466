package org.kneepoint.server.app.grades;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.kneepoint.db.LibraryReader;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityConverter;
import org.kneepoint.fitter.units.SusceptibilityForm;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.importer.csv.SusceptibilityFileReader;
import org.kneepoint.importer.csv.SusceptibilityTable;

/**
 * The (T, χ) points a Curie–Weiss fit runs on, as SI volume susceptibility: a mass or molar table
 * is converted with the density (and molar mass) it states, by {@link SusceptibilityConverter};
 * without them it is refused, never guessed.
 *
 * @param source       file name or "material NAME"
 * @param material     the material
 * @param form         the form the data were given in
 * @param temperatureK kelvin
 * @param chiVolume    SI volume susceptibility, one per temperature
 */
public record SusceptibilityData(String source, String material, SusceptibilityForm form, double[] temperatureK,
        double[] chiVolume) {

    public SusceptibilityData {
        temperatureK = temperatureK.clone();
        chiVolume = chiVolume.clone();
    }

    public static SusceptibilityData fromFile(Path file) {
        SusceptibilityTable table = new SusceptibilityFileReader(ReadLimits.defaults()).read(file);
        List<double[]> points = table.points();
        double[] t = new double[points.size()];
        double[] chi = new double[points.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = points.get(i)[0];
            chi[i] = toVolume(points.get(i)[1], table.form(), table.density(), table.molarMass(), table.source());
        }
        return new SusceptibilityData(table.source(), table.material(), table.form(), t, chi);
    }

    public static SusceptibilityData fromLibrary(LibraryReader reader, String material) {
        List<SusceptibilityPoint> points = reader.susceptibility(material);
        String where = "material " + material;
        double[] t = new double[points.size()];
        double[] chi = new double[points.size()];
        for (int i = 0; i < t.length; i++) {
            SusceptibilityPoint point = points.get(i);
            t[i] = point.temperatureK();
            chi[i] = toVolume(point.chi(), point.form(), point.density(), point.molarMass(), where);
        }
        SusceptibilityForm form = points.stream().map(SusceptibilityPoint::form).distinct().count() == 1
                ? points.get(0).form() : SusceptibilityForm.VOLUME;
        return new SusceptibilityData(where, material, form, t, chi);
    }

    private static double toVolume(double chi, SusceptibilityForm form, Double density, Double molarMass, String where) {
        if (form == SusceptibilityForm.VOLUME) {
            return chi;
        }
        String name = form.name().toLowerCase(Locale.ROOT);
        if (density == null || form == SusceptibilityForm.MOLAR && molarMass == null) {
            throw new BadInputException(InputLocation.of(where), "gives " + name + " susceptibility but no "
                    + (density == null ? "density" : "molar mass") + "; a Curie–Weiss fit uses volume susceptibility,"
                    + " so add '# density: ...'" + (form == SusceptibilityForm.MOLAR ? " and '# molar-mass: ...'" : ""));
        }
        try {
            return new SusceptibilityConverter(density, molarMass == null ? Double.NaN : molarMass).toVolume(chi, form);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(InputLocation.of(where), e.getMessage());
        }
    }
}
