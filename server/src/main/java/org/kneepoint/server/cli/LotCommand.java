package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code kneepoint lot import|list|check|history}: delivered lots of a grade and their qualification. */
@Command(name = "lot", mixinStandardHelpOptions = true,
        description = "Import, list and check delivered lots of a grade against its specification and reference curves.",
        subcommands = {LotImportCommand.class, LotListCommand.class, LotCheckCommand.class, LotHistoryCommand.class})
final class LotCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "missing subcommand; expected one of " + String.join(", ", spec.subcommands().keySet()));
    }
}
