package org.kneepoint.importer.json;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.GradeSpecification;
import org.kneepoint.fitter.library.LotCurve;
import org.kneepoint.fitter.library.LotInfo;
import org.kneepoint.fitter.qualification.Limit;
import org.kneepoint.fitter.qualification.Specification;
import org.kneepoint.fitter.qualification.SpecifiedQuantity;

/**
 * Specifications, lots and lot curves in a backup document (format version 2) and back; read with
 * the same limits and name rules as the rest of the document.
 */
final class QualificationJson {

    private final BackupPlausibility plausible;

    QualificationJson(BackupPlausibility plausible) {
        this.plausible = plausible;
    }

    static Map<String, Object> specification(GradeSpecification stored) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("grade", stored.grade());
        json.put("temperatureK", stored.specification().temperatureK());
        json.put("version", stored.version());
        json.put("limits", stored.specification().limits().stream().map(limit -> {
            Map<String, Object> limitJson = new LinkedHashMap<>();
            limitJson.put("quantity", limit.quantity().key());
            limitJson.put("minimum", limit.minimum());
            limitJson.put("typical", limit.typical());
            return limitJson;
        }).toList());
        return json;
    }

    static Map<String, Object> lot(LotInfo lot) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("grade", lot.grade());
        json.put("name", lot.name());
        json.put("measuredOn", lot.measuredOn() == null ? null : lot.measuredOn().toString());
        json.put("notes", lot.notes());
        return json;
    }

    static Map<String, Object> lotCurve(LotCurve stored) {
        DemagnetizationCurve curve = stored.curve();
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("grade", stored.grade());
        json.put("lot", stored.lot());
        json.put("sample", stored.sample());
        json.put("temperatureK", curve.temperatureK());
        json.put("kind", curve.kind().name().toLowerCase(Locale.ROOT));
        json.put("quantity", curve.quantity().name());
        json.put("source", stored.source());
        json.put("importSha256", stored.importSha256());
        json.put("h", curve.h());
        json.put("values", curve.values());
        return json;
    }

    GradeSpecification specification(BackupFields fields, JsonNode node) {
        JsonNode limitNodes = fields.array(node, "limits");
        List<Limit> limits = new ArrayList<>();
        for (int i = 0; i < limitNodes.size(); i++) {
            BackupFields limitFields = fields.at(fieldsPath(fields, "limits[" + i + "]"));
            JsonNode limit = limitNodes.get(i);
            String key = limitFields.text(limit, "quantity");
            SpecifiedQuantity quantity = SpecifiedQuantity.ofKey(key).orElseThrow(() -> new BadInputException(limitFields.place("quantity"),
                    "expected one of br, hcj, bhMax, hk, squareness, hcb"));
            limits.add(new Limit(quantity, limitFields.optionalNumber(limit, "minimum"), limitFields.optionalNumber(limit, "typical")));
        }
        return new GradeSpecification(plausible.name(fields, node, "grade"), new Specification(fields.number(node, "temperatureK"), limits),
                fields.count(node, "version"));
    }

    LotInfo lot(BackupFields fields, JsonNode node) {
        String measuredOn = fields.optionalText(node, "measuredOn");
        return new LotInfo(plausible.name(fields, node, "grade"), plausible.name(fields, node, "name"),
                measuredOn == null ? null : LocalDate.parse(measuredOn), plausible.freeText(fields, node, "notes"));
    }

    LotCurve lotCurve(BackupFields fields, JsonNode node) {
        DemagnetizationCurve curve = new DemagnetizationCurve(fields.choice(node, "kind", CurveKind.class),
                fields.choice(node, "quantity", Quantity.class), fields.numbers(node, "h"), fields.numbers(node, "values"),
                fields.optionalNumber(node, "temperatureK"));
        return new LotCurve(plausible.name(fields, node, "grade"), plausible.name(fields, node, "lot"), plausible.name(fields, node, "sample"),
                plausible.curve(fields, curve), plausible.freeText(fields, node, "source"), fields.optionalText(node, "importSha256"));
    }

    private static String fieldsPath(BackupFields fields, String child) {
        return fields.path() + "." + child;
    }
}
