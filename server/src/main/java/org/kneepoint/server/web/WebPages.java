package org.kneepoint.server.web;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import io.javalin.http.Handler;
import io.javalin.http.HttpStatus;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.chart.CheckChart;
import org.kneepoint.server.chart.ElementMapChart;
import org.kneepoint.server.app.elements.ElementCheckDocument;
import org.kneepoint.server.app.elements.ElementCheckRun;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;
import org.kneepoint.server.http.ElementsApi;
import org.kneepoint.server.chart.FieldChart;
import org.kneepoint.server.chart.GradeChart;
import org.kneepoint.server.http.DesignRequests;
import org.kneepoint.server.http.ErrorStatus;
import org.kneepoint.server.http.FieldRequest;
import org.kneepoint.server.http.FormTokens;
import org.kneepoint.server.http.SecurityHeaders;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.http.GradeEditRequests;
import org.kneepoint.server.http.JobRequests;
import org.kneepoint.server.app.jobs.JobStatus;
import org.kneepoint.server.app.design.CheckRun;
import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.design.SelectionRun;
import org.kneepoint.server.app.serving.ServerSettings;
import org.kneepoint.server.http.Uploads;
import org.kneepoint.server.app.grades.GradeCurves;
import org.kneepoint.server.app.imports.ImportPlan;
import org.kneepoint.server.app.imports.ImportRun;
import org.kneepoint.server.app.wording.Temperatures;
import org.kneepoint.server.app.version.VersionInfo;

/** The pages and charts of the web application and the routes that serve them. */
final class WebPages {

    private static final int CHART_WIDTH = 960;
    private static final int CHART_HEIGHT = 560;
    private static final int ELEMENT_MAP_HEIGHT = 640;

    private final Library library;
    private final boolean tokenRequired;
    private final ImportStaging staging;
    private final String styleSheet;
    private final JobRegistry jobs;
    private final FormTokens forms;
    private final GradeModelCache models;
    private final KeptElementChecks keptChecks = new KeptElementChecks();

    WebPages(Library library, ServerSettings settings, ImportStaging staging, JobRegistry jobs, FormTokens forms, GradeModelCache models) {
        this.library = library;
        this.forms = forms;
        this.models = models;
        this.jobs = jobs;
        this.tokenRequired = settings.tokenRequired();
        this.staging = staging;
        this.styleSheet = resource("/web/kneepoint.css");
    }

    void install(JavalinConfig config) {
        get(config, "/", context -> html(context, LibraryPage.render(library.reader(), blankToNull(context.queryParam("family")),
                context.queryParam("sort"), context.queryParam("order"))));
        get(config, "/grades/{name}", context -> html(context, GradePage.render(library.reader(), context.pathParam("name"), access(context), demoPresent())));
        config.routes.post("/grades/{name}/details", context -> {
            GradeEditRequests.fromForm(context, library);
            context.redirect(Links.grade(context.pathParam("name")), HttpStatus.SEE_OTHER);
        });
        get(config, "/charts/grades/{name}.svg", context -> {
            String name = context.pathParam("name");
            String svg = GradeChart.svg(name, GradeCurves.stored(library.reader(), name), CHART_WIDTH, CHART_HEIGHT);
            svg(context, svg);
        });
        get(config, "/check", this::check);
        config.routes.post("/check/elements", this::checkElements);
        get(config, "/check/elements/{key}", context -> {
            String key = context.pathParam("key");
            MapPlane plane = MapPlane.named(context.queryParam("plane"), "query parameter 'plane'");
            KeptElementChecks.Kept kept = keptChecks.get(key).orElseThrow(() -> new NotFoundException("no element check '" + key
                    + "' (the server keeps the last few only); upload the files again"));
            elementPage(context, new ElementSection.View(ElementSection.form(library.reader(), name -> null,
                    access(context)), null, ElementSection.results(key, kept, plane)));
        });
        get(config, "/check/elements/{key}/report.html", context -> {
            String key = context.pathParam("key");
            MapPlane plane = MapPlane.named(context.queryParam("plane"), "query parameter 'plane'");
            KeptElementChecks.Kept kept = keptChecks.get(key).orElseThrow(() -> new NotFoundException("no element check '" + key
                    + "' (the server keeps the last few only); upload the files again"));
            context.header("Content-Disposition", "attachment; filename=\"element-check.html\"");
            html(context, ElementCheckReport.html(kept.document(), kept.map(), plane, "element files uploaded to the Check page: "
                    + String.join(", ", kept.document().loadCases().stream().map(ElementCheckDocument.LoadCase::file).toList()),
                    VersionInfo.version()));
        });
        get(config, "/charts/elements/{key}.svg", context -> {
            String key = context.pathParam("key");
            MapPlane plane = MapPlane.named(context.queryParam("plane"), "query parameter 'plane'");
            KeptElementChecks.Kept kept = keptChecks.get(key).orElseThrow(() -> new NotFoundException("no element check '" + key
                    + "' (the server keeps the last few only)"));
            svg(context, ElementMapChart.svg("Knee margin of " + kept.map().elements() + " elements, " + plane.label() + " plane",
                    kept.map(), plane, CHART_WIDTH, ELEMENT_MAP_HEIGHT));
        });
        get(config, "/charts/check.svg", context -> {
            CheckRun run = DesignRequests.check(context, library.reader(), models);
            String title = "Operating point at " + Temperatures.celsius(run.result().temperature());
            String svg = CheckChart.svg(title, run.model().model(), CheckChart.temperaturesOf(run.model().model(),
                    run.result().temperature(), run.result().maxWorkingTemperature()), run.result().loadLine(), CHART_WIDTH, CHART_HEIGHT);
            svg(context, svg);
        });
        get(config, "/select", this::select);
        get(config, "/field", this::field);
        get(config, "/charts/field.svg", context -> {
            FieldRequest request = FieldRequest.of(context);
            String svg = FieldChart.svg("Field of a " + request.describe(), request.shape(), request.field(), FieldPage.CHART_WIDTH,
                    FieldPage.CHART_HEIGHT);
            svg(context, svg);
        });
        get(config, "/import", context -> html(context, ImportPage.form(access(context), demoPresent())));
        config.routes.post("/import", this::checkUpload);
        config.routes.post("/import/commit", this::commit);
        config.routes.post("/jobs/ja-fit", context -> context.redirect("/jobs/" + JobRequests.jilesAthertonFit(context, library, jobs),
                HttpStatus.SEE_OTHER));
        config.routes.post("/jobs/import", this::commitInBackground);
        get(config, "/jobs/{id}", context -> {
            String id = context.pathParam("id");
            JobStatus status = jobs.status(id).orElseThrow(() -> new NotFoundException("no job with id '" + id
                    + "' (jobs are kept for a while only)"));
            html(context, JobPage.render(status, demoPresent()));
        });
        get(config, "/style.css", context -> context.contentType("text/css; charset=utf-8").result(styleSheet));
    }

    /** A page or chart for GET, and the same answer without its body for HEAD (same status, type and length). */
    private static void get(JavalinConfig config, String path, Handler handler) {
        config.routes.get(path, handler);
        config.routes.head(path, handler);
    }

    private void check(Context context) {
        CheckRun run = null;
        String problem = null;
        if (!context.queryParamMap().isEmpty()) {
            try {
                run = DesignRequests.check(context, library.reader(), models);
            } catch (KneepointException e) {
                context.status(ErrorStatus.of(e));
                problem = e.getMessage();
            }
        }
        html(context, CheckPage.render(library.reader(), context::queryParam, context.queryString(), run, problem, demoPresent(),
                new ElementSection.View(ElementSection.form(library.reader(), name -> null, access(context)), null, null)));
    }

    /** An upload of element-field files from the Check page: its results, or the form again with the problem. */
    private void checkElements(Context context) {
        ElementSection.View section;
        try {
            MapPlane plane = MapPlane.named(context.formParam("plane"), "form field 'plane'");
            ElementCheckRun run = ElementsApi.fromForm(context, library, models);
            KeptElementChecks.Kept kept = new KeptElementChecks.Kept(run.document(), ElementMap.of(run, ElementMap.MAX_DOTS));
            String key = keptChecks.keep(kept);
            section = new ElementSection.View(ElementSection.form(library.reader(), context::formParam, access(context)), null,
                    ElementSection.results(key, kept, plane));
        } catch (KneepointException e) {
            context.status(ErrorStatus.of(e));
            section = new ElementSection.View(ElementSection.form(library.reader(), context::formParam, access(context)),
                    "Nothing was checked. " + e.getMessage(), null);
        }
        elementPage(context, section);
    }

    private void elementPage(Context context, ElementSection.View section) {
        html(context, CheckPage.render(library.reader(), name -> null, "", null, null, demoPresent(), section));
    }

    private void select(Context context) {
        SelectionRun run = null;
        String problem = null;
        if (!context.queryParamMap().isEmpty()) {
            try {
                run = DesignRequests.select(context, library.reader(), models);
            } catch (KneepointException e) {
                context.status(ErrorStatus.of(e));
                problem = e.getMessage();
            }
        }
        html(context, SelectPage.render(library.reader(), context::queryParam, run, problem, demoPresent()));
    }

    private void field(Context context) {
        FieldRequest request = null;
        String problem = null;
        if (!context.queryParamMap().isEmpty()) {
            try {
                request = FieldRequest.of(context);
            } catch (KneepointException e) {
                context.status(ErrorStatus.of(e));
                problem = e.getMessage();
            }
        }
        html(context, FieldPage.render(context::queryParam, context.queryString(), request, problem, demoPresent()));
    }

    private void checkUpload(Context context) {
        Uploads uploads = null;
        try {
            uploads = Uploads.of(context);
            List<ImportPlan> plans = ImportRun.run(library, new ReadLimits(ServerSettings.MAX_UPLOAD_BYTES), uploads.files(), true);
            String key = staging.keep(uploads);
            html(context, ImportPage.preview(plans, key, access(context), demoPresent()));
        } catch (KneepointException e) {
            if (uploads != null) {
                uploads.close();
            }
            context.status(400);
            html(context, ImportPage.refused(e.getMessage(), access(context), demoPresent()));
        }
    }

    private void commit(Context context) {
        Uploads uploads = staged(context);
        if (uploads == null) {
            return;
        }
        try (uploads) {
            List<ImportPlan> plans = ImportRun.run(library, new ReadLimits(ServerSettings.MAX_UPLOAD_BYTES), uploads.files(), false);
            html(context, ImportPage.done(plans, demoPresent()));
        } catch (KneepointException e) {
            context.status(400);
            html(context, ImportPage.refused(e.getMessage(), access(context), demoPresent()));
        }
    }

    /** The checked files stored by a background job; answered by the job's page (303). */
    private void commitInBackground(Context context) {
        Uploads uploads = staged(context);
        if (uploads != null) {
            context.redirect("/jobs/" + JobRequests.importFiles(library, uploads, jobs), HttpStatus.SEE_OTHER);
        }
    }

    /** The uploads waiting under the form's key, or null after answering 400 when they are no longer waiting. */
    private Uploads staged(Context context) {
        Uploads uploads = staging.take(context.formParam("staged")).orElse(null);
        if (uploads == null) {
            context.status(400);
            html(context, ImportPage.refused("These files are no longer waiting (the server keeps only the last few checks); "
                    + "choose them again.", access(context), demoPresent()));
        }
        return uploads;
    }

    /** The page shown to a browser for a failed request (template {@code error.jte}). */
    String error(int status, String message) {
        String title = status == 404 ? "Not found" : "Error";
        return Templates.render("error.jte", new ErrorView(new Layout.Frame(title, "", false),
                status == 404 ? "Not found" : "The request could not be served", message));
    }

    /** A failed request's page: its heading and the error's message. */
    record ErrorView(Layout.Frame frame, String heading, String message) {
    }

    /** What the forms of the page being answered need: the session's form token, and whether to ask for the server's token. */
    private FormAccess access(Context context) {
        return new FormAccess(forms.issue(context), tokenRequired);
    }

    /** A chart: SVG with its own inline styles, so with the policy of charts instead of that of pages. */
    private static void svg(Context context, String svg) {
        context.header("Content-Security-Policy", SecurityHeaders.CHART_POLICY).contentType("image/svg+xml").result(svg);
    }

    private boolean demoPresent() {
        return library.reader().grades(null).stream().anyMatch(grade -> Layout.isDemo(grade.name()));
    }

    private static void html(Context context, String page) {
        context.contentType("text/html; charset=utf-8").result(page);
    }

    private static String blankToNull(String value) {
        return value == null || value.isBlank() ? null : value;
    }

    private static String resource(String name) {
        try (InputStream in = WebPages.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
