package org.kneepoint.server.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code kneepoint} command: permanent-magnet curves, fits and design checks. */
@Command(name = "kneepoint",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Demagnetization curves, fits and design checks for permanent magnets.",
        subcommands = {CurveCommand.class, ImportCommand.class, GradesCommand.class, ExportCommand.class,
            BackupCommand.class, RestoreCommand.class, VerifyCommand.class, DemoCommand.class, FitCommand.class, JilesAthertonCommand.class,
            PermeanceCommand.class, FieldCommand.class, CheckCommand.class, CheckElementsCommand.class, SweepCommand.class,
            DutyCommand.class, SelectCommand.class,
            ServeCommand.class, PlotCommand.class, EditCommand.class, SpecCommand.class, LotCommand.class,
            CommandLine.HelpCommand.class})
public final class KneepointCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(commandLine().execute(args));
    }

    /** The configured command line, with the program's one error renderer; tests run it in-process. */
    public static CommandLine commandLine() {
        CommandLine commandLine = new CommandLine(new KneepointCommand());
        ErrorReporting.install(commandLine);
        return commandLine;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
