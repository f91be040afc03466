package org.kneepoint.server.cli;

import org.kneepoint.server.app.design.Verdict;
import picocli.CommandLine.Option;

/**
 * {@code --fail-on-shortfall}, shared by {@code check}, {@code duty}, {@code sweep} and {@code select}: the command prints
 * its result as always and then exits with {@link ErrorReporting#SHORTFALL} (5) when its verdict falls short, so a script
 * can stop on it.
 */
final class ShortfallOption {

    @Option(names = "--fail-on-shortfall",
            description = "Exit with code 5 (after printing the result) when the verdict falls short; without it the exit code is 0.")
    boolean failOnShortfall;

    /** The exit code of a command that printed a result with this {@code verdict}. */
    int exitCode(Verdict verdict) {
        return failOnShortfall && !verdict.passes() ? ErrorReporting.SHORTFALL : 0;
    }
}
