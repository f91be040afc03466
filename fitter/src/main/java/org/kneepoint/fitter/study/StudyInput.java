package org.kneepoint.fitter.study;

/** One input of a study: its name, its nominal value (SI) and its band. */
public record StudyInput(String name, double nominal, ToleranceBand band) {

    /** The value at position {@code t} in the band (−1 lower end, +1 upper end). */
    public double value(double t) {
        return band.value(nominal, t);
    }
}
