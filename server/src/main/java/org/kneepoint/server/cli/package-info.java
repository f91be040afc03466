/**
 * The {@code kneepoint} command line (picocli): one class per subcommand, a readable table by
 * default and one JSON document with {@code --json} (SI units, camelCase keys). Errors are rendered
 * in one place, {@link org.kneepoint.server.cli.ErrorReporting}: one line on standard error and
 * exit code 2 for bad input, never a stack trace.
 */
package org.kneepoint.server.cli;
