package org.kneepoint.server.chart;

import java.awt.Color;

/** The colours of the charts: one per temperature, from cool blue-green to hot brick, then ink and paper. */
final class TemperaturePalette {

    static final Color INK = new Color(0x1d2430);
    static final Color PAPER = new Color(0xfbfaf7);
    static final Color GRID = new Color(0xd9d5cc);

    private static final Color[] BY_TEMPERATURE = {
        new Color(0x1b5e86), new Color(0x2f8f7d), new Color(0x8a9a2b), new Color(0xc48a1c),
        new Color(0xc4571f), new Color(0x9e2f3c), new Color(0x5f3a7a), new Color(0x4a4a4a),
    };

    private TemperaturePalette() {
    }

    /** The colour of the {@code index}-th temperature, lowest first; repeats after eight. */
    static Color colour(int index) {
        return BY_TEMPERATURE[index % BY_TEMPERATURE.length];
    }
}
