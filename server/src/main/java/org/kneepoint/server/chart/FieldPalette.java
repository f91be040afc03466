package org.kneepoint.server.chart;

import java.awt.Color;
import java.awt.Paint;
import org.jfree.chart.renderer.PaintScale;

/**
 * The colours of the field map: |B| from 0 to an upper value through paper, pale sea green, teal and slate blue to
 * deep aubergine, with the square root of |B|/upper as the position so the weak field outside a magnet still shows
 * its shape; values above the upper value or not finite (on an edge) take the last colour.
 */
final class FieldPalette implements PaintScale {

    /** The colour of the magnet's outline, apart from every colour of the map. */
    static final Color OUTLINE = new Color(0xd4682a);

    private static final Color[] STOPS = {
        new Color(0xf6f3ea), new Color(0xb9dccf), new Color(0x5aa6a0), new Color(0x3c5f8f), new Color(0x35204a),
    };

    private final double upper;

    FieldPalette(double upper) {
        this.upper = upper;
    }

    @Override
    public double getLowerBound() {
        return 0.0;
    }

    @Override
    public double getUpperBound() {
        return upper;
    }

    @Override
    public Paint getPaint(double value) {
        double position = Double.isFinite(value) ? Math.sqrt(Math.max(0.0, Math.min(1.0, value / upper))) : 1.0;
        double scaled = position * (STOPS.length - 1);
        int below = Math.min((int) scaled, STOPS.length - 2);
        double share = scaled - below;
        return mix(STOPS[below], STOPS[below + 1], share);
    }

    private static Color mix(Color from, Color to, double share) {
        return new Color(channel(from.getRed(), to.getRed(), share), channel(from.getGreen(), to.getGreen(), share),
                channel(from.getBlue(), to.getBlue(), share));
    }

    private static int channel(int from, int to, double share) {
        return (int) Math.round(from + (to - from) * share);
    }
}
