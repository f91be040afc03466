package org.kneepoint.server.app.lots;

import java.util.ArrayList;
import java.util.List;
import org.kneepoint.fitter.qualification.LotAssessment;
import org.kneepoint.fitter.qualification.QuantityCheck;
import org.kneepoint.fitter.qualification.SampleAssessment;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;
import org.kneepoint.fitter.qualification.Verdict;
import org.kneepoint.server.app.wording.Temperatures;

/** The reasons for a lot's verdict, in plain words: every failed and inconclusive check, and what could not be checked. */
final class LotReasons {

    private LotReasons() {
    }

    static List<String> of(LotAssessment lot, boolean specified) {
        List<String> reasons = new ArrayList<>();
        if (!specified) {
            reasons.add("the grade has no specification; set one with 'kneepoint spec set' to check lots against it");
        }
        for (SampleAssessment sample : lot.samples()) {
            String where = "sample " + sample.sample() + " at " + Temperatures.celsius(sample.temperatureK());
            if (specified && sample.specificationTemperatureK() == null) {
                reasons.add(where + ": no specification at this temperature, so nothing was checked");
            }
            for (QuantityCheck check : sample.checks()) {
                if (check.verdict() != Verdict.PASS) {
                    reasons.add(where + ": " + check(check));
                }
            }
            if (sample.referenceTemperatureK() == null) {
                reasons.add(where + ": the grade has no reference curve at this temperature to compare J(H) with");
            } else if (sample.deviation() == null) {
                reasons.add(where + ": the lot's curve and the reference curve share no field range to compare J(H) over");
            }
        }
        if (lot.verdict() == Verdict.PASS) {
            reasons.add(0, "every specified minimum is met by every sample measured at a specified temperature");
        }
        return reasons;
    }

    private static String check(QuantityCheck check) {
        String name = QuantityWording.name(check.quantity());
        String limit = QuantityWording.format(check.quantity(), check.limit());
        if (check.value() == null) {
            return name + " is not reached by the measured curve, so the minimum " + limit + " cannot be confirmed";
        }
        String value = QuantityWording.format(check.quantity(), check.value());
        if (check.verdict() == Verdict.FAIL) {
            return name + " " + value + " is below the minimum " + limit;
        }
        return name + " " + value + " is above the minimum " + limit + " by less than its uncertainty ±"
                + QuantityWording.format(check.quantity(), check.uncertainty());
    }
}
