package org.kneepoint.server.cli;

import java.util.Locale;
import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.grades.GradeRow;
import org.kneepoint.server.app.grades.Grades;
import org.kneepoint.server.app.Json;
import org.kneepoint.server.text.PlainText;
import org.kneepoint.server.app.wording.Temperatures;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint grades}: the grades in the library, with their families and the temperatures of their curves. */
@Command(name = "grades", mixinStandardHelpOptions = true, description = "List the grades in the library.")
final class GradesCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Option(names = "--family", paramLabel = "FAMILY", description = "Only grades of this family, e.g. 'sintered NdFeB'.")
    private String family;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        List<GradeRow> grades;
        try (Library library = libraryOption.open()) {
            grades = Grades.list(library.reader(), family);
        }
        var out = spec.commandLine().getOut();
        if (output.json) {
            out.println(Json.write(grades));
        } else if (grades.isEmpty()) {
            out.println(family == null ? "The library has no grades yet; 'kneepoint import FILE' or 'kneepoint demo' adds some."
                    : "No grades of family '" + family + "'.");
        } else {
            int width = Math.min(40, grades.stream().mapToInt(grade -> grade.name().length()).max().orElse(5));
            out.printf("%-" + width + "s  %-18s  %10s  %s%n", "grade", "family", "price /kg", "curves at");
            for (GradeRow grade : grades) {
                out.printf("%-" + width + "s  %-18s  %10s  %s%n", PlainText.printable(grade.name()), PlainText.printable(grade.family()),
                        grade.price() == null ? "-" : String.format(Locale.ROOT, "%.2f", grade.price()), Temperatures.list(grade.temperaturesK()));
            }
        }
        out.flush();
        return 0;
    }
}
