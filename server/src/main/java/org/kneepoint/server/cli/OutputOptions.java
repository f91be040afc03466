package org.kneepoint.server.cli;

import java.io.PrintWriter;
import java.util.function.Supplier;
import org.kneepoint.server.app.Json;
import picocli.CommandLine.Option;

/**
 * The output option every command that answers a result shares: {@code --json} prints the result's JSON document
 * (the same one the API answers), otherwise a readable table.
 */
final class OutputOptions {

    @Option(names = "--json", description = "Print the result as JSON (SI units, camelCase keys; the API's document) instead of a table.")
    boolean json;

    /** Prints {@code document} as JSON with {@code --json}, else the table; flushes. */
    void print(PrintWriter out, Supplier<Object> document, Supplier<String> table) {
        out.print(json ? Json.write(document.get()) + System.lineSeparator() : table.get());
        out.flush();
    }
}
