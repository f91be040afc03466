package org.kneepoint.server.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.elements.TransverseRule;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.csv.ElementFileReader;
import org.kneepoint.server.app.design.GradeChoice;
import org.kneepoint.server.app.elements.Direction;
import org.kneepoint.server.app.elements.ElementCheckRequest;
import org.kneepoint.server.app.elements.ElementCheckRun;
import org.kneepoint.server.app.elements.ElementChecks;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;
import org.kneepoint.server.app.version.VersionInfo;
import org.kneepoint.server.text.ElementCheckView;
import org.kneepoint.server.web.ElementCheckReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint check-elements GRADE FILE... [--temperature T] [--direction x,y,z] [--loss-limit %] [--json]
 * [-o RESULTS.csv] [--report FILE.html [--plane xy|xz|yz]]}: every element of a field solver's result judged on the grade's curve over the load cases in
 * order (docs/element-fields.md); a typed-in grade (as {@code check} takes it) leaves GRADE out.
 */
@Command(name = "check-elements", mixinStandardHelpOptions = true,
        description = "Knee margin and irreversible loss of every element of a field solver's result, over load cases in order.")
final class CheckElementsCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "GRADE FILE",
            description = "A grade of the library, then the element-field files, one per load case in order"
                    + " (docs/element-fields.md); with a grade typed in (--br, --mu-rec, --hcj), only the files.")
    private List<String> arguments;

    @Mixin
    private GradeOptions grade;

    @Mixin
    private LibraryOption libraryOption;

    @Option(names = "--temperature", converter = QuantityConverters.Temperature.class,
            description = "Temperature of the elements whose file has no T column, e.g. 120C.")
    private Double temperature;

    @Option(names = "--direction", converter = DirectionConverter.class, paramLabel = "x,y,z",
            description = "Magnetization direction of the elements whose file has no mx, my, mz (default: 0,0,1).")
    private Direction direction;

    @Option(names = "--loss-limit", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Volume-weighted irreversible loss allowed (default: ${DEFAULT-VALUE}).")
    private double lossLimitPercent;

    @Option(names = "--transverse", paramLabel = "RULE", defaultValue = "along",
            description = "How a field across the magnetization counts: along (only the component along the magnetization"
                    + " acts; default) or astroid (Stoner-Wohlfarth; see docs/element-fields.md).")
    private String transverse;

    @Option(names = {"-o", "--output"}, paramLabel = "RESULTS.csv",
            description = "Also write every element's new remanence and recoil permeability, in file order, for the solver's next pass.")
    private Path results;

    @Option(names = "--max-file-size", paramLabel = "BYTES", defaultValue = "" + ElementFileReader.DEFAULT_MAX_BYTES,
            description = "Refuse files larger than this (default: ${DEFAULT-VALUE} bytes).")
    private long maxFileSize;

    @Option(names = "--report", paramLabel = "FILE.html",
            description = "Also write a self-contained HTML report (summary, map of the elements, worst elements, load cases,"
                    + " assumptions, sources, cautions).")
    private Path report;

    @Option(names = "--plane", paramLabel = "PLANE", defaultValue = "xy",
            description = "Plane the report's map is projected onto: xy, xz or yz (default: ${DEFAULT-VALUE}).")
    private String plane;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        GradeChoice typed = grade.choice(null);
        boolean named = !typed.typed().given();
        List<String> files = named ? arguments.subList(1, arguments.size()) : arguments;
        if (files.isEmpty()) {
            throw new BadInputException(InputLocation.of("arguments"), "name the grade, then at least one element-field FILE");
        }
        MapPlane mapPlane = MapPlane.named(plane, "option --plane");
        if (report != null && !report.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".html")) {
            throw new BadInputException(InputLocation.of("option --report"), "the report is an .html file, got '" + report + "'");
        }
        TransverseRule rule;
        try {
            rule = TransverseRule.named(transverse);
        } catch (BadInputException e) {
            throw new BadInputException(InputLocation.of("option --transverse"), e.getMessage());
        }
        ElementCheckRequest request = new ElementCheckRequest(grade.choice(named ? arguments.get(0) : null),
                ElementChecks.read(files.stream().map(Path::of).toList(), SizeLimit.of(maxFileSize).maxBytes()), temperature,
                direction, lossLimitPercent / 100.0, rule);
        ElementCheckRun run = ElementChecks.check(request, name -> GradeOptions.stored(name, libraryOption));
        if (results != null) {
            OutputFile.write(results, run.resultsCsv());
        }
        if (report != null) {
            String inputs = "kneepoint " + String.join(" ", spec.commandLine().getParseResult().originalArgs());
            OutputFile.write(report, ElementCheckReport.html(run.document(), ElementMap.of(run, ElementMap.MAX_DOTS), mapPlane, inputs,
                    VersionInfo.version()));
        }
        output.print(spec.commandLine().getOut(), run::document, () -> ElementCheckView.table(run));
        return 0;
    }
}
