package org.kneepoint.importer.json;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;

/**
 * The whole library as one JSON document and back, losslessly: SI values written with the
 * shortest decimal that reads back to the same double, times as ISO-8601 instants, everything in
 * the fixed order of {@link LibrarySnapshot}, so that backup → restore → backup gives the same
 * bytes. The document is described in docs/backup-format.md.
 */
public final class BackupCodec {

    public static final String FORMAT = "kneepoint-library-backup";
    /** Version 2 adds specifications, lots and lot curves; version 1 documents (without them) are still read. */
    public static final int VERSION = 2;

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private BackupCodec() {
    }

    public static String write(LibrarySnapshot snapshot) {
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("format", FORMAT);
        document.put("version", VERSION);
        document.put("imports", snapshot.imports().stream().map(BackupCodec::importJson).toList());
        document.put("grades", snapshot.grades().stream().map(BackupCodec::gradeJson).toList());
        document.put("curves", snapshot.curves().stream().map(BackupCodec::curveJson).toList());
        document.put("susceptibility", snapshot.susceptibility().stream().map(BackupCodec::susceptibilityJson).toList());
        document.put("fits", snapshot.fits().stream().map(BackupCodec::fitJson).toList());
        document.put("specifications", snapshot.specifications().stream().map(QualificationJson::specification).toList());
        document.put("lots", snapshot.lots().stream().map(QualificationJson::lot).toList());
        document.put("lotCurves", snapshot.lotCurves().stream().map(QualificationJson::lotCurve).toList());
        try {
            return MAPPER.writeValueAsString(document) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the backup", e);
        }
    }

    private static Map<String, Object> importJson(ImportInfo info) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("fileName", info.fileName());
        json.put("sha256", info.sha256());
        json.put("importedAt", info.importedAt().toString());
        json.put("curves", info.curves());
        json.put("points", info.points());
        json.put("susceptibilityPoints", info.susceptibilityPoints());
        return json;
    }

    private static Map<String, Object> gradeJson(GradeInfo grade) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("name", grade.name());
        json.put("family", grade.family());
        json.put("supplier", grade.supplier());
        json.put("density", grade.density());
        json.put("notes", grade.notes());
        json.put("provenance", grade.provenance());
        json.put("price", grade.price());
        return json;
    }

    private static Map<String, Object> curveJson(LibraryCurve stored) {
        DemagnetizationCurve curve = stored.curve();
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("grade", stored.grade());
        json.put("temperatureK", curve.temperatureK());
        json.put("kind", curve.kind().name().toLowerCase(Locale.ROOT));
        json.put("quantity", curve.quantity().name());
        json.put("source", stored.source());
        json.put("importSha256", stored.importSha256());
        json.put("h", curve.h());
        json.put("values", curve.values());
        return json;
    }

    private static Map<String, Object> susceptibilityJson(SusceptibilityPoint point) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("material", point.material());
        json.put("temperatureK", point.temperatureK());
        json.put("chi", point.chi());
        json.put("form", point.form().name().toLowerCase(Locale.ROOT));
        json.put("density", point.density());
        json.put("molarMass", point.molarMass());
        json.put("source", point.source());
        json.put("importSha256", point.importSha256());
        return json;
    }

    private static Map<String, Object> fitJson(FitRecord fit) {
        Map<String, Object> json = new LinkedHashMap<>();
        json.put("grade", fit.grade());
        json.put("curveTemperatureK", fit.curveTemperatureK());
        json.put("curveKind", fit.curveKind());
        json.put("material", fit.material());
        json.put("model", fit.model());
        json.put("parameters", fit.parametersJson());
        json.put("residual", fit.residual());
        json.put("fittedAt", fit.fittedAt().toString());
        json.put("programVersion", fit.programVersion());
        return json;
    }

    /**
     * Reads a backup document; {@code source} names it in messages. Anything an import would refuse
     * is refused here too, naming the path of the element at fault.
     */
    public static LibrarySnapshot read(String source, String text) {
        return new BackupReader(source).read(text);
    }
}
