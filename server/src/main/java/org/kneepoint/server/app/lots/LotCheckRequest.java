package org.kneepoint.server.app.lots;

import org.kneepoint.fitter.qualification.GuardBand;

/** A lot of a grade to check, with the guard band for measurement uncertainty (none when not given). */
public record LotCheckRequest(String grade, String lot, GuardBand band) {
}
