package org.kneepoint.server.web;

import io.javalin.Javalin;
import io.javalin.util.JavalinBindException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.http.FormTokens;
import org.kneepoint.server.http.HttpApi;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.serving.ServerSettings;

/**
 * The running web application: the JSON API and the pages on one Javalin server, over one
 * library. {@link #start} listens; {@link #close} stops the server (the library stays open, its
 * owner closes it).
 */
public final class WebApplication implements AutoCloseable {

    private final Javalin server;
    private final ImportStaging staging;
    private final List<String> routes;
    private final JobRegistry jobs;

    private WebApplication(Javalin server, ImportStaging staging, List<String> routes, JobRegistry jobs) {
        this.server = server;
        this.staging = staging;
        this.routes = routes;
        this.jobs = jobs;
    }

    /** Starts listening with the standard job registry; an address or port that cannot be used is bad input. */
    public static WebApplication start(Library library, ServerSettings settings) {
        return start(library, settings, JobRegistry.standard());
    }

    /** Starts listening; the application owns {@code jobs} from now on and closes it with itself. */
    public static WebApplication start(Library library, ServerSettings settings, JobRegistry jobs) {
        ImportStaging staging = new ImportStaging();
        List<String> routes = Collections.synchronizedList(new ArrayList<>());
        FormTokens forms = new FormTokens();
        GradeModelCache models = new GradeModelCache();
        WebPages pages = new WebPages(library, settings, staging, jobs, forms, models);
        Javalin server = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            config.startup.showOldJavalinVersionWarning = false;
            config.events.handlerAdded(info -> routes.add(info.getHttpMethod().name() + " " + info.getPath()));
            HttpApi.install(config, library, jobs, settings, pages::error, forms, models);
            pages.install(config);
        });
        try {
            server.start(settings.bind(), settings.port());
        } catch (JavalinBindException e) {
            staging.close();
            jobs.close();
            throw new BadInputException("cannot listen on " + settings.bind() + " port " + settings.port()
                    + " (in use, or not an address of this machine); choose another --port, or --port 0 for any free one");
        }
        return new WebApplication(server, staging, routes, jobs);
    }

    /** The port the server listens on (the real one when 0 was asked for). */
    public int port() {
        return server.port();
    }

    /** Every registered route as "METHOD path", e.g. "GET /api/grades/{name}", in the order of registration. */
    public List<String> routes() {
        synchronized (routes) {
            return List.copyOf(routes);
        }
    }

    @Override
    public void close() {
        server.stop();
        staging.close();
        jobs.close();
    }
}
