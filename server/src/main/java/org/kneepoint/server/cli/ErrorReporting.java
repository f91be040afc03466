package org.kneepoint.server.cli;

import java.io.PrintWriter;
import org.kneepoint.fitter.error.KneepointException;
import picocli.CommandLine;

/**
 * The one place where the CLI turns failures into output and exit codes: a single line on
 * standard error, no stack trace. Exit codes: 0 success; 2 bad input, unknown names, conflicts and
 * bad command-line arguments, and damaged stored data (a
 * value that failed its checksum); 3 a computation that failed numerically; 4 the library's database
 * cannot be reached, another program holds it, its folder or file is read-only or its disk is full
 * (nothing was written; run the command again when the cause is gone); 1 an internal error (a
 * bug: set {@code KNEEPOINT_DEBUG=1} to see its stack trace); 5 a result that falls short of what was asked, only with
 * {@code --fail-on-shortfall} ({@link ShortfallOption}; the result is printed all the same).
 */
public final class ErrorReporting {

    public static final int BAD_INPUT = 2;
    public static final int NUMERICAL_FAILURE = 3;
    public static final int INTERNAL_ERROR = 1;
    public static final int UNAVAILABLE = 4;
    public static final int SHORTFALL = 5;

    private ErrorReporting() {
    }

    static void install(CommandLine commandLine) {
        commandLine.setExecutionExceptionHandler(ErrorReporting::onExecutionError);
        commandLine.setParameterExceptionHandler(ErrorReporting::onParameterError);
    }

    private static int onExecutionError(Exception error, CommandLine commandLine, CommandLine.ParseResult parsed) {
        PrintWriter err = commandLine.getErr();
        if (error instanceof KneepointException known) {
            err.println("kneepoint: " + known.getMessage());
            err.flush();
            return switch (known.code()) {
                case NUMERICAL_FAILURE -> NUMERICAL_FAILURE;
                case UNAVAILABLE -> UNAVAILABLE;
                case BAD_INPUT, NOT_FOUND, CONFLICT, DAMAGED -> BAD_INPUT;
            };
        }
        err.println("kneepoint: internal error: " + error);
        if (System.getenv("KNEEPOINT_DEBUG") != null) {
            error.printStackTrace(err);
        }
        err.flush();
        return INTERNAL_ERROR;
    }

    private static int onParameterError(CommandLine.ParameterException error, String[] args) {
        PrintWriter err = error.getCommandLine().getErr();
        err.println("kneepoint: " + error.getMessage() + " (see '"
                + error.getCommandLine().getCommandSpec().qualifiedName() + " --help')");
        err.flush();
        return BAD_INPUT;
    }
}
