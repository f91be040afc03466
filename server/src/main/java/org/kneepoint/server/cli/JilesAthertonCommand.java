package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code kneepoint ja ...}: the Jiles–Atherton hysteresis model on its own (simulation). */
@Command(name = "ja", mixinStandardHelpOptions = true,
        description = "Jiles–Atherton hysteresis model: simulate loops from its parameters.",
        subcommands = {JilesAthertonSimulateCommand.class})
final class JilesAthertonCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "missing subcommand; expected one of "
                + String.join(", ", spec.subcommands().keySet()));
    }
}
