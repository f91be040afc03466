package org.kneepoint.server.app.lots;

import java.util.EnumMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.qualification.GuardBand;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/**
 * Reads a guard band as typed: {@code br=0.5%,hcj=1%}, each quantity's key (br, hcj, bhMax, hk,
 * squareness, hcb) with its expanded uncertainty in percent of the measured value.
 */
public final class Uncertainties {

    private static final Pattern ENTRY = Pattern.compile("\\s*([A-Za-z]+)\\s*=\\s*([0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)\\s*%\\s*");

    private Uncertainties() {
    }

    /** The guard band, or none for null; {@code place} names the option in messages. */
    public static GuardBand parse(String text, String place) {
        if (text == null) {
            return GuardBand.none();
        }
        Map<SpecifiedQuantity, Double> shares = new EnumMap<>(SpecifiedQuantity.class);
        for (String part : text.split(",", -1)) {
            Matcher matcher = ENTRY.matcher(part);
            if (!matcher.matches()) {
                throw new BadInputException(place + ": expected entries like br=0.5%,hcj=1%, got '" + part.strip() + "'");
            }
            SpecifiedQuantity quantity = SpecifiedQuantity.ofKey(matcher.group(1)).orElseThrow(() -> new BadInputException(place
                    + ": unknown quantity '" + matcher.group(1) + "' (expected br, hcj, bhMax, hk, squareness or hcb)"));
            double percent = Double.parseDouble(matcher.group(2));
            if (!(percent < 100)) {
                throw new BadInputException(place + ": an uncertainty of " + matcher.group(2) + " % of " + quantity.key()
                        + " leaves nothing to decide; expected less than 100 %");
            }
            if (shares.put(quantity, percent / 100) != null) {
                throw new BadInputException(place + ": " + quantity.key() + " is named twice");
            }
        }
        return new GuardBand(shares);
    }
}
