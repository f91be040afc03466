package org.kneepoint.server.cli;

import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.server.app.serving.ServerSettings;
import org.kneepoint.server.app.demo.DemoLoader;
import org.kneepoint.server.web.WebApplication;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code kneepoint serve}: the web application and the JSON API on 127.0.0.1 (or another
 * address, then with a token for every write) until the process is stopped.
 */
@Command(name = "serve", mixinStandardHelpOptions = true,
        description = {"Serve the web pages and the JSON API over the library until stopped (Ctrl-C).",
            "Bound to an address other than loopback, every write needs the token (--token or $KNEEPOINT_TOKEN)."})
final class ServeCommand implements Callable<Integer> {

    static final String TOKEN_VARIABLE = "KNEEPOINT_TOKEN";

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Option(names = "--port", defaultValue = "8642", paramLabel = "N", description = "Port to listen on; 0 = any free port (default ${DEFAULT-VALUE}).")
    private int port;

    @Option(names = "--bind", defaultValue = ServerSettings.LOOPBACK, paramLabel = "ADDR",
            description = "Address to listen on (default ${DEFAULT-VALUE}, this machine only).")
    private String bind;

    @Option(names = "--token", paramLabel = "TOKEN",
            description = "Token every write must carry (Authorization: Bearer TOKEN); default $KNEEPOINT_TOKEN. Required with a non-loopback --bind.")
    private String token;

    @Option(names = "--demo", description = "Load the invented demo grades first when the library has no grades.")
    private boolean demo;

    @Override
    public Integer call() throws InterruptedException {
        ServerSettings settings = settings();
        var out = spec.commandLine().getOut();
        try (Library library = libraryOption.open()) {
            if (demo && library.reader().grades(null).isEmpty()) {
                DemoLoader.load(library);
                out.println("Loaded the demo grades (invented data, names start with DEMO).");
            }
            CountDownLatch stopped = new CountDownLatch(1);
            WebApplication application = WebApplication.start(library, settings);
            Runtime.getRuntime().addShutdownHook(new Thread(() -> {
                application.close();
                stopped.countDown();
            }, "kneepoint-stop"));
            try {
                String host = settings.bind().contains(":") ? "[" + settings.bind() + "]" : settings.bind();
                out.println("Kneepoint is serving " + libraryOption.location().describe());
                out.println("Open http://" + host + ":" + application.port() + "/" + (settings.tokenRequired() ? "  (writes need the token)" : ""));
                out.println("Stop with Ctrl-C.");
                out.flush();
                stopped.await();
            } finally {
                application.close();
            }
        }
        return 0;
    }

    private ServerSettings settings() {
        String chosen = token != null ? token : System.getenv(TOKEN_VARIABLE);
        if (chosen != null && chosen.isBlank()) {
            chosen = null;
        }
        try {
            return new ServerSettings(bind, port, chosen);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage());
        }
    }
}
