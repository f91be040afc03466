package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code kneepoint fit MODEL ...}: fits a model to a file or to data stored in the library. */
@Command(name = "fit", mixinStandardHelpOptions = true,
        description = "Fit a model to a file or to data stored in the library.",
        subcommands = {FitKneeCommand.class, FitTemperatureCommand.class, FitJilesAthertonCommand.class, FitCurieWeissCommand.class})
final class FitCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "missing model; expected one of "
                + String.join(", ", spec.subcommands().keySet()));
    }
}
