package org.kneepoint.server.cli;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.library.GradeInfo;
import org.kneepoint.fitter.library.StoredGrade;
import org.kneepoint.server.app.grades.GradeEdit;
import org.kneepoint.server.app.grades.GradeDocument;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.text.PlainText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code kneepoint edit GRADE [--supplier S] [--density D] [--notes N] [--price P] [--from-version V]}:
 * changes a grade's details. The edit is made from the version read (or the one given), so an
 * edit by someone else in between is reported (exit 2) rather than overwritten.
 */
@Command(name = "edit", mixinStandardHelpOptions = true, description = {
        "Change a grade's supplier, density, notes or price (an empty value clears one).",
        "Refused when someone changed the grade since the version it was made from."})
final class EditCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Parameters(paramLabel = "GRADE", description = "The grade's name as the library has it.")
    private String grade;

    @Option(names = "--supplier", paramLabel = "TEXT", description = "Supplier text.")
    private String supplier;

    @Option(names = "--density", paramLabel = "DENSITY", description = "Density with its unit, e.g. 7.55g/cm3.")
    private String density;

    @Option(names = "--notes", paramLabel = "TEXT", description = "Free text.")
    private String notes;

    @Option(names = "--price", paramLabel = "NUMBER", description = "Price per kilogram, in the team's one currency.")
    private String price;

    @Option(names = "--from-version", paramLabel = "N",
            description = "The grade's version the edit was made from (as 'edit' or the API shows it). Default: the version now.")
    private Integer version;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        Map<String, String> changes = new LinkedHashMap<>();
        putIfGiven(changes, "supplier", supplier);
        putIfGiven(changes, "density", density);
        putIfGiven(changes, "notes", notes);
        putIfGiven(changes, "price", price);
        if (changes.isEmpty()) {
            throw new BadInputException("nothing to change: give --supplier, --density, --notes or --price");
        }
        StoredGrade edited;
        try (Library library = libraryOption.open()) {
            edited = new GradeEdit(changes, "--%s").applyTo(library, grade, version);
        }
        var out = spec.commandLine().getOut();
        out.println(output.json ? Json.write(GradeDocument.details(edited)) : describe(edited));
        out.flush();
        return 0;
    }

    private static void putIfGiven(Map<String, String> changes, String field, String value) {
        if (value != null) {
            changes.put(field, value);
        }
    }

    private static String describe(StoredGrade stored) {
        GradeInfo grade = stored.grade();
        return String.format(Locale.ROOT, "%s (version %d): supplier %s, density %s, price %s, notes %s",
                PlainText.printable(grade.name()), stored.version(), shown(grade.supplier()),
                grade.density() == null ? "-" : String.format(Locale.ROOT, "%.4g kg/m³", grade.density()),
                grade.price() == null ? "-" : String.format(Locale.ROOT, "%.2f per kg", grade.price()), shown(grade.notes()));
    }

    private static String shown(String text) {
        return text == null ? "-" : PlainText.printable(text);
    }
}
