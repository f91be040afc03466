package org.kneepoint.server.chart;

import java.awt.Color;
import java.awt.Paint;
import org.jfree.chart.renderer.PaintScale;

/**
 * The colours of the element map: the knee margin in kA/m from its smallest value (darkest: nearest to or past the
 * knee) to its largest (palest) along one indigo hue, so that the order survives a grey print and needs no telling
 * of red from green, in {@value #LEVELS} steps (so that the dots of one step share one style in the SVG and the map
 * stays small). An element whose curve has no knee (NaN) is drawn in a neutral grey that is said under the map.
 */
final class MarginPalette implements PaintScale {

    /** The colour of elements without a knee margin. */
    static final Color NO_KNEE = new Color(0xb3b0a8);

    /** How many colours the scale has. */
    static final int LEVELS = 32;

    private static final Color[] STOPS = {
        new Color(0x1a1238), new Color(0x3b3573), new Color(0x6e6aa8), new Color(0xa9a6cf), new Color(0xe9e7f3),
    };

    private final double lower;
    private final double upper;

    MarginPalette(double lower, double upper) {
        this.lower = lower;
        this.upper = upper;
    }

    @Override
    public double getLowerBound() {
        return lower;
    }

    @Override
    public double getUpperBound() {
        return upper;
    }

    @Override
    public Paint getPaint(double value) {
        if (Double.isNaN(value)) {
            return NO_KNEE;
        }
        double share = Math.max(0.0, Math.min(1.0, (value - lower) / (upper - lower)));
        double position = Math.min(LEVELS - 1, (int) (share * LEVELS)) / (double) (LEVELS - 1);
        double scaled = position * (STOPS.length - 1);
        int below = Math.min((int) scaled, STOPS.length - 2);
        double part = scaled - below;
        Color from = STOPS[below];
        Color to = STOPS[below + 1];
        return new Color(channel(from.getRed(), to.getRed(), part), channel(from.getGreen(), to.getGreen(), part),
                channel(from.getBlue(), to.getBlue(), part));
    }

    private static int channel(int from, int to, double share) {
        return (int) Math.round(from + (to - from) * share);
    }
}
