package org.kneepoint.tests;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.kneepoint.server.cli.KneepointCommand;
import picocli.CommandLine;

/** One in-process run of the {@code kneepoint} command line, with what it printed. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine commandLine = KneepointCommand.commandLine();
        commandLine.setOut(new PrintWriter(out, true));
        commandLine.setErr(new PrintWriter(err, true));
        int exitCode = commandLine.execute(args);
        return new CliRun(exitCode, out.toString(), err.toString());
    }
}
