package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.jupiter.api.extension.ParameterContext;
import org.junit.jupiter.api.extension.ParameterResolver;

/**
 * One server over the demo library and one command-line library with the same demo grades, started once for every
 * HTTP test class that only reads ({@code @ExtendWith(SharedDemoServer.class)}, the fixture as a parameter) and stopped when the whole run ends.
 * A class that writes starts its own {@link RunningServer}.
 */
final class SharedDemoServer implements BeforeAllCallback, ParameterResolver {

    private static final ExtensionContext.Namespace NAMESPACE = ExtensionContext.Namespace.create(SharedDemoServer.class);

    @Override
    public void beforeAll(ExtensionContext context) {
        fixture(context);
    }

    @Override
    public boolean supportsParameter(ParameterContext parameter, ExtensionContext context) {
        return parameter.getParameter().getType() == Fixture.class;
    }

    @Override
    public Object resolveParameter(ParameterContext parameter, ExtensionContext context) {
        return fixture(context);
    }

    /** The running fixture (started by the first class that asks). */
    static Fixture fixture(ExtensionContext context) {
        return context.getRoot().getStore(NAMESPACE).computeIfAbsent(Fixture.class, type -> Fixture.start(), Fixture.class);
    }

    /** The server, the command-line library's folder and the temporary folder holding both. */
    record Fixture(Path folder, RunningServer server, String cliDb) implements AutoCloseable {

        static Fixture start() {
            try {
                Path folder = Files.createTempDirectory("kneepoint-shared-server");
                RunningServer server = RunningServer.withDemo(folder.resolve("served"), null);
                String cliDb = folder.resolve("cli").toString();
                assertEquals(0, CliRun.of("demo", "--db", cliDb).exitCode());
                return new Fixture(folder, server, cliDb);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void close() throws IOException {
            server.close();
            try (Stream<Path> paths = Files.walk(folder)) {
                for (Path path : paths.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(path);
                }
            }
        }
    }
}
