package org.kneepoint.importer.json;

import com.fasterxml.jackson.databind.JsonNode;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.limits.CurvePlausibility;
import org.kneepoint.fitter.limits.PhysicalLimits;
import org.kneepoint.fitter.units.SusceptibilityForm;
import org.kneepoint.importer.plausible.PlausibleInput;

/** The physical limits and name rules applied to the fields of a backup, each refusal naming the field's path. */
final class BackupPlausibility {

    /** A required name without forbidden characters. */
    String name(BackupFields fields, JsonNode node, String field) {
        return PlausibleInput.text(fields.place(field), field, fields.text(node, field), false);
    }

    /** An optional name (null when absent) without forbidden characters. */
    String optionalName(BackupFields fields, JsonNode node, String field) {
        return PlausibleInput.text(fields.place(field), field, fields.optionalText(node, field), false);
    }

    /** An optional free text, where line breaks are allowed. */
    String freeText(BackupFields fields, JsonNode node, String field) {
        return PlausibleInput.text(fields.place(field), field, fields.optionalText(node, field), true);
    }

    Double density(BackupFields fields, JsonNode node, String field) {
        Double density = fields.optionalNumber(node, field);
        return density == null ? null : PlausibleInput.within(fields.place(field), "density", density, PhysicalLimits.DENSITY);
    }

    Double molarMass(BackupFields fields, JsonNode node, String field) {
        Double molarMass = fields.optionalNumber(node, field);
        return molarMass == null ? null : PlausibleInput.within(fields.place(field), "molar mass", molarMass, PhysicalLimits.MOLAR_MASS);
    }

    double susceptibilityTemperature(BackupFields fields, JsonNode node) {
        return PlausibleInput.within(fields.place("temperatureK"), "temperature", fields.number(node, "temperatureK"),
                PhysicalLimits.SUSCEPTIBILITY_TEMPERATURE);
    }

    double chi(BackupFields fields, JsonNode node, SusceptibilityForm form, Double density, Double molarMass) {
        double chi = fields.number(node, "chi");
        if (!PhysicalLimits.plausibleSusceptibility(chi, form, density, molarMass)) {
            throw new BadInputException(fields.place("chi"), String.format("χ = %.6g (SI, %s) is outside what is plausible: as a volume"
                    + " susceptibility it must lie between −1 (perfect diamagnetism) and 1e6", chi, form.name().toLowerCase(java.util.Locale.ROOT)));
        }
        return chi;
    }

    /** The curve unchanged, or bad input naming the point ({@code curves[3].values[17]}) at fault. */
    DemagnetizationCurve curve(BackupFields fields, DemagnetizationCurve curve) {
        return PlausibleInput.curve(curve, finding -> fields.place(field(finding)));
    }

    private static String field(CurvePlausibility.Finding finding) {
        return switch (finding.part()) {
            case TEMPERATURE -> "temperatureK";
            case FIELD -> finding.point() < 0 ? "h" : "h[" + finding.point() + "]";
            case VALUE -> finding.point() < 0 ? "values" : "values[" + finding.point() + "]";
            case CURVE -> "values";
        };
    }
}
