package org.kneepoint.server.text;

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

    private Cautions() {
    }

    /** The cautions as a table section. */
    public static String table() {
        StringBuilder out = new StringBuilder("Cautions:\n");
        SAFETY.forEach(caution -> out.append("  - ").append(caution).append('\n'));
        return out.toString();
    }
}
