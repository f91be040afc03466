package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code kneepoint spec set|show}: a grade's specifications per temperature. */
@Command(name = "spec", mixinStandardHelpOptions = true,
        description = "Set or show a grade's specification (minimum and typical Br, HcJ, (BH)max, Hk, Hk/HcJ, HcB) per temperature.",
        subcommands = {SpecSetCommand.class, SpecShowCommand.class})
final class SpecCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "missing subcommand; expected one of " + String.join(", ", spec.subcommands().keySet()));
    }
}
