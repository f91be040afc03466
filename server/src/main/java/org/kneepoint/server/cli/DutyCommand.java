package org.kneepoint.server.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.server.library.GradeModel;
import org.kneepoint.server.text.DutyView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint duty [GRADE] (--pc P | SHAPE) [--br ...] --steps "20C:0, 150C:300kA/m, 20C:0"}: flux and loss
 * after each (temperature, opposing field) step of a grade of the library or one typed in; the worst point so
 * far sets the recoil line.
 */
@Command(name = "duty", mixinStandardHelpOptions = true,
        description = "Flux and irreversible loss after each step of a duty sequence of temperatures and opposing fields.")
final class DutyCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LoadLineOptions loadLine;

    @Parameters(arity = "0..1", paramLabel = "GRADE",
            description = "A grade of the library (its temperature model); without it, type the grade in with --br, --mu-rec, --hcj.")
    private String gradeName;

    @Mixin
    private GradeOptions grade;

    @Mixin
    private LibraryOption libraryOption;

    @Option(names = "--steps", required = true, converter = DutyStepsConverter.class,
            description = "Steps TEMPERATURE:OPPOSING_FIELD separated by commas, e.g. \"20C:0, 150C:300kA/m, 20C:0\".")
    private DutyStepsConverter.Steps steps;

    @Option(names = "--json", description = "Print one JSON document (SI units).")
    private boolean json;

    @Override
    public Integer call() {
        double pc = loadLine.pc();
        GradeModel model = grade.model(gradeName, libraryOption);
        List<DutyStepResult> results = DutySequence.run(model.model(), pc, steps.list());
        boolean extrapolated = steps.list().stream().anyMatch(step -> model.extrapolated().test(step.temperature()));
        var out = spec.commandLine().getOut();
        out.print(json ? Json.write(DutyView.json(pc, results, extrapolated)) + System.lineSeparator()
                : DutyView.table(model.description(), loadLine.describe(), pc, results, extrapolated));
        out.flush();
        return 0;
    }
}
