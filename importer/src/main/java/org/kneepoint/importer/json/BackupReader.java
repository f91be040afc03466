package org.kneepoint.importer.json;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.curve.Quantity;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.library.FitRecord;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.ImportInfo;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.fitter.library.LibrarySnapshot;
import org.kneepoint.fitter.library.SusceptibilityPoint;
import org.kneepoint.fitter.units.SusceptibilityForm;
import org.kneepoint.importer.input.Excerpt;

/**
 * Reads a backup document back into a {@link LibrarySnapshot}, refusing with the path of the
 * element at fault ({@code curves[3].values[17]}) anything the import of a file would refuse:
 * missing or mistyped fields, names with control or bidirectional formatting characters, values
 * beyond the physical limits, implausible curves, content after the document.
 */
final class BackupReader {

    private static final ObjectMapper READER = new ObjectMapper(JsonInput.FACTORY);

    private final String source;
    private final BackupPlausibility plausible;

    BackupReader(String source) {
        this.source = source;
        this.plausible = new BackupPlausibility();
    }

    LibrarySnapshot read(String text) {
        JsonNode root = tree(text);
        int version = root == null ? 0 : root.path("version").asInt();
        if (root == null || !BackupCodec.FORMAT.equals(root.path("format").asText()) || version < 1 || version > BackupCodec.VERSION) {
            throw new BadInputException(InputLocation.of(source), "not a Kneepoint backup (expected \"format\": \"" + BackupCodec.FORMAT
                    + "\", \"version\": 1 to " + BackupCodec.VERSION + ")");
        }
        BackupFields top = new BackupFields(source, "");
        var imports = each(top, root, "imports", this::importInfo);
        var grades = each(top, root, "grades", this::grade);
        var curves = each(top, root, "curves", this::curve);
        var susceptibility = each(top, root, "susceptibility", this::susceptibility);
        var fits = each(top, root, "fits", this::fit);
        if (version == 1) {
            return new LibrarySnapshot(imports, grades, curves, susceptibility, fits);
        }
        QualificationJson qualification = new QualificationJson(plausible);
        return new LibrarySnapshot(imports, grades, curves, susceptibility, fits, each(top, root, "specifications", qualification::specification),
                each(top, root, "lots", qualification::lot), each(top, root, "lotCurves", qualification::lotCurve));
    }

    private JsonNode tree(String text) {
        JsonParser parser = null;
        try {
            parser = JsonInput.FACTORY.createParser(text);
            JsonNode root = READER.readTree(parser);
            JsonInput.requireEnd(source, parser);
            return root;
        } catch (JsonProcessingException e) {
            throw JsonInput.refusal(source, e, parser);
        } catch (IOException e) {
            throw new BadInputException(InputLocation.of(source), "cannot read the backup: " + e.getMessage());
        }
    }

    /** One element of a backup array, read from its fields. */
    interface Element<T> {
        T read(BackupFields fields, JsonNode node);
    }

    <T> List<T> each(BackupFields top, JsonNode root, String array, Element<T> element) {
        List<T> values = new ArrayList<>();
        JsonNode nodes = top.array(root, array);
        for (int i = 0; i < nodes.size(); i++) {
            BackupFields fields = top.at(array + "[" + i + "]");
            JsonNode node = nodes.get(i);
            values.add(valid(fields, () -> element.read(fields, node)));
        }
        return values;
    }

    /** Builds a value, turning a record's own validation into bad input at the element. */
    private static <T> T valid(BackupFields fields, Supplier<T> value) {
        try {
            return value.get();
        } catch (IllegalArgumentException | DateTimeParseException e) {
            throw new BadInputException(fields.element(), "invalid backup content: "
                    + Excerpt.of(String.valueOf(e.getMessage()), Excerpt.MESSAGE_LENGTH));
        }
    }

    private ImportInfo importInfo(BackupFields fields, JsonNode node) {
        return new ImportInfo(plausible.name(fields, node, "fileName"), fields.text(node, "sha256"),
                Instant.parse(fields.text(node, "importedAt")), fields.count(node, "curves"), fields.count(node, "points"),
                fields.count(node, "susceptibilityPoints"));
    }

    private GradeInfo grade(BackupFields fields, JsonNode node) {
        return new GradeInfo(plausible.name(fields, node, "name"), plausible.name(fields, node, "family"),
                plausible.optionalName(fields, node, "supplier"), plausible.density(fields, node, "density"), plausible.freeText(fields, node, "notes"),
                plausible.freeText(fields, node, "provenance"), fields.optionalNumber(node, "price"));
    }

    private LibraryCurve curve(BackupFields fields, JsonNode node) {
        DemagnetizationCurve curve = new DemagnetizationCurve(fields.choice(node, "kind", CurveKind.class),
                fields.choice(node, "quantity", Quantity.class), fields.numbers(node, "h"), fields.numbers(node, "values"),
                fields.optionalNumber(node, "temperatureK"));
        return new LibraryCurve(plausible.name(fields, node, "grade"), plausible.curve(fields, curve), plausible.freeText(fields, node, "source"),
                fields.optionalText(node, "importSha256"));
    }

    private SusceptibilityPoint susceptibility(BackupFields fields, JsonNode node) {
        SusceptibilityForm form = fields.choice(node, "form", SusceptibilityForm.class);
        Double density = plausible.density(fields, node, "density");
        Double molarMass = plausible.molarMass(fields, node, "molarMass");
        return new SusceptibilityPoint(plausible.name(fields, node, "material"), plausible.susceptibilityTemperature(fields, node),
                plausible.chi(fields, node, form, density, molarMass), form, density, molarMass, plausible.freeText(fields, node, "source"),
                fields.optionalText(node, "importSha256"));
    }

    private FitRecord fit(BackupFields fields, JsonNode node) {
        return new FitRecord(plausible.optionalName(fields, node, "grade"), fields.optionalNumber(node, "curveTemperatureK"),
                fields.optionalText(node, "curveKind"), plausible.optionalName(fields, node, "material"), plausible.name(fields, node, "model"),
                plausible.freeText(fields, node, "parameters"), fields.optionalNumber(node, "residual"),
                Instant.parse(fields.text(node, "fittedAt")), plausible.name(fields, node, "programVersion"));
    }
}
