package org.kneepoint.server.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.fitter.loadline.DutySequence;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.server.text.DutyView;
import org.kneepoint.server.text.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint duty (--pc P | SHAPE) --br ... --steps "20C:0, 150C:300kA/m, 20C:0"}: flux and loss
 * after each (temperature, opposing field) step; the worst point so far sets the recoil line.
 */
@Command(name = "duty", mixinStandardHelpOptions = true,
        description = "Flux and irreversible loss after each step of a duty sequence of temperatures and opposing fields.")
final class DutyCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LoadLineOptions loadLine;

    @Mixin
    private GradeOptions grade;

    @Option(names = "--steps", required = true, converter = DutyStepsConverter.class,
            description = "Steps TEMPERATURE:OPPOSING_FIELD separated by commas, e.g. \"20C:0, 150C:300kA/m, 20C:0\".")
    private DutyStepsConverter.Steps steps;

    @Option(names = "--json", description = "Print one JSON document (SI units).")
    private boolean json;

    @Override
    public Integer call() {
        double pc = loadLine.pc();
        List<DutyStepResult> results = DutySequence.run(grade.law(), pc, steps.list());
        var out = spec.commandLine().getOut();
        out.print(json ? Json.write(DutyView.json(pc, results)) + System.lineSeparator()
                : DutyView.table(loadLine.describe(), pc, results));
        out.flush();
        return 0;
    }
}
