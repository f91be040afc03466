package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import org.kneepoint.server.app.design.DesignChecks;
import org.kneepoint.server.app.design.DutyRequest;
import org.kneepoint.server.app.design.DutyRun;
import org.kneepoint.server.text.DutyView;
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
            description = "Steps TEMPERATURE:FIELD[:KIND] separated by commas, e.g. \"20C:0, 150C:300kA/m, 120C:200kA/m:external\";"
                    + " KIND is opposing (default: circuit convention, B = −μ0·Pc·(H + Ha)) or external (uniform field on a free"
                    + " magnet, H = −Hext − N·M, N = 1/(1 + Pc)).")
    private DutyStepsConverter.Steps steps;

    @Option(names = "--loss-limit", converter = QuantityConverters.Percent.class, defaultValue = "1%",
            description = "Irreversible loss allowed after the sequence, which its verdict holds it to (default: ${DEFAULT-VALUE}).")
    private double lossLimitPercent;

    @Mixin
    private OutputOptions output;

    @Mixin
    private ShortfallOption shortfall;

    @Override
    public Integer call() {
        DutyRun run = DesignChecks.duty(new DutyRequest(grade.choice(gradeName), loadLine.spec(), steps.list(),
                lossLimitPercent / 100.0), name -> GradeOptions.stored(name, libraryOption));
        output.print(spec.commandLine().getOut(), run::document, () -> DutyView.table(run));
        return shortfall.exitCode(run.verdict());
    }
}
