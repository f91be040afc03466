package org.kneepoint.server.app.design;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.loadline.AppliedField;

/**
 * The field against the magnetization as a front end takes it: an opposing field in the circuit convention, or a
 * uniform external field on a free magnet, or neither (no field) — never both (docs/design.md §4, two conventions).
 */
public final class FieldChoice {

    private FieldChoice() {
    }

    /**
     * The field from the two inputs (A/m, null when not given); {@code opposingName} and {@code externalName} are the
     * front end's names of them, for the message.
     */
    public static AppliedField of(Double opposing, Double external, String opposingName, String externalName) {
        if (opposing != null && external != null) {
            throw new BadInputException("give either " + opposingName + " (circuit convention) or " + externalName
                    + " (uniform field on a free magnet), not both");
        }
        return external != null ? AppliedField.external(external) : AppliedField.opposing(opposing == null ? 0.0 : opposing);
    }
}
