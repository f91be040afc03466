package org.kneepoint.server.text;

import java.util.ArrayList;
import java.util.List;

/**
 * The short cautions shown with every result that feeds a safety decision (flux loss, maximum
 * temperature; DESIGN §6), in JSON and in tables.
 */
public final class Cautions {

    /** The cautions, one sentence each. */
    public static final List<String> SAFETY = List.of(
            "These are model estimates: confirm them by measurement and with the supplier's data.",
            "Follow local codes and licensed engineering practice for any safety decision.",
            "Strong magnets pinch and shatter, and they disturb implanted medical devices.");

    /** Added when a result rests on the temperature model outside the measured temperatures. */
    public static final String EXTRAPOLATED = "The temperature model was extrapolated beyond the measured temperatures:"
            + " these values are less certain than the rest.";

    private Cautions() {
    }

    /** The cautions, with {@link #EXTRAPOLATED} first when the result was extrapolated. */
    public static List<String> of(boolean extrapolated) {
        if (!extrapolated) {
            return SAFETY;
        }
        List<String> all = new ArrayList<>(SAFETY.size() + 1);
        all.add(EXTRAPOLATED);
        all.addAll(SAFETY);
        return List.copyOf(all);
    }

    /** The cautions as a table section, with {@link #EXTRAPOLATED} when the result was extrapolated. */
    public static String table(boolean extrapolated) {
        StringBuilder out = new StringBuilder("Cautions:\n");
        of(extrapolated).forEach(caution -> out.append("  - ").append(caution).append('\n'));
        return out.toString();
    }
}
