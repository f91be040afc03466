package org.kneepoint.server.app.wording;

import java.util.ArrayList;
import java.util.List;

/**
 * The short cautions shown with every result that feeds a safety decision (flux loss, maximum
 * temperature; docs/design.md §6), in JSON and in tables.
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

    /** Added when an operating point lies below the field range a grade's curve was measured to. */
    public static final String BEYOND_MEASURED_FIELD = "The operating point lies beyond the field range the grade's curve was"
            + " measured to: the fitted knee model stands in for the data there, so the point and the loss are less certain.";

    private Cautions() {
    }

    /** The cautions, with {@link #EXTRAPOLATED} first when the result was extrapolated. */
    public static List<String> of(boolean extrapolated) {
        return of(extrapolated, false);
    }

    /**
     * The cautions, with {@link #EXTRAPOLATED} first when the result was extrapolated and {@link #BEYOND_MEASURED_FIELD}
     * when an operating point lies beyond the measured field range.
     */
    public static List<String> of(boolean extrapolated, boolean beyondMeasuredField) {
        if (!extrapolated && !beyondMeasuredField) {
            return SAFETY;
        }
        List<String> all = new ArrayList<>(SAFETY.size() + 2);
        if (extrapolated) {
            all.add(EXTRAPOLATED);
        }
        if (beyondMeasuredField) {
            all.add(BEYOND_MEASURED_FIELD);
        }
        all.addAll(SAFETY);
        return List.copyOf(all);
    }

    /** The cautions as a table section, with {@link #EXTRAPOLATED} when the result was extrapolated. */
    public static String table(boolean extrapolated) {
        return table(extrapolated, false);
    }

    /** The cautions as a table section, as {@link #of(boolean, boolean)} gives them. */
    public static String table(boolean extrapolated, boolean beyondMeasuredField) {
        StringBuilder out = new StringBuilder("Cautions:\n");
        of(extrapolated, beyondMeasuredField).forEach(caution -> out.append("  - ").append(caution).append('\n'));
        return out.toString();
    }
}
