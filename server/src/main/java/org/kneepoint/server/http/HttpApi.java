package org.kneepoint.server.http;

import org.kneepoint.server.app.design.GradeModelCache;
import org.kneepoint.server.app.jobs.JobRegistry;
import org.kneepoint.server.app.serving.ServerSettings;

import io.javalin.config.JavalinConfig;
import io.javalin.config.SizeUnit;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.version.VersionInfo;
import org.kneepoint.importer.export.CurveExportDocument;
import org.kneepoint.server.app.design.CheckDocument;
import org.kneepoint.server.app.design.DutyDocument;
import org.kneepoint.server.app.design.FieldDocument;
import org.kneepoint.server.app.design.PermeanceDocument;
import org.kneepoint.server.app.design.SelectionDocument;
import org.kneepoint.server.app.design.SweepDocument;
import org.kneepoint.server.app.elements.ElementCheckDocument;
import org.kneepoint.server.app.fits.CurieWeissFitDocument;
import org.kneepoint.server.app.fits.KneeFitDocument;
import org.kneepoint.server.app.fits.StoredFits;
import org.kneepoint.server.app.fits.TemperatureFitDocument;
import org.kneepoint.server.app.grades.CurveDocument;
import org.kneepoint.server.app.grades.GradeDocument;
import org.kneepoint.server.app.grades.GradeRow;
import org.kneepoint.server.app.grades.Materials;
import org.kneepoint.server.app.imports.ImportReport;
import org.kneepoint.server.app.jobs.JobDocument;
import org.kneepoint.server.http.ApiRoute.ApiParameter;
import org.kneepoint.server.http.ApiRoute.ApiResult;
import org.kneepoint.server.app.Json;

/**
 * The JSON API under {@code /api}: its routes, the OpenAPI document that lists them, and what
 * guards every request (body size limits, the write guard, the one error mapper).
 */
public final class HttpApi {

    private HttpApi() {
    }

    /**
     * Installs the guards, the error mapper (with the page it shows browsers, also for Jetty's own errors) and the API
     * routes into a Javalin configuration; {@code forms} checks the form tokens of the pages' writes, {@code models} keeps
     * the grades' computed models for the design routes.
     */
    public static void install(JavalinConfig config, Library library, JobRegistry jobs, ServerSettings settings, ErrorPage errorPage,
            FormTokens forms, GradeModelCache models) {
        config.http.maxRequestSize = ServerSettings.MAX_OTHER_BYTES;
        config.jetty.multipartConfig.maxTotalRequestSize(ServerSettings.MAX_UPLOAD_BYTES, SizeUnit.BYTES);
        config.jetty.multipartConfig.maxFileSize(ServerSettings.MAX_UPLOAD_BYTES, SizeUnit.BYTES);
        JettyErrors jettyErrors = new JettyErrors(errorPage);
        config.jetty.modifyServer(server -> server.setErrorHandler(jettyErrors));
        config.jetty.modifyServletContextHandler(handler -> handler.setErrorHandler(jettyErrors));
        ErrorMapper.install(config, errorPage);
        HostGuard hosts = HostGuard.boundTo(settings.bind());
        WriteGuard guard = new WriteGuard(settings.token(), forms);
        config.routes.before(context -> {
            SecurityHeaders.apply(context::header);
            hosts.check(context.header("Host"));
            checkSize(context);
            guard.check(context);
        });
        AtomicReference<String> document = new AtomicReference<>();
        List<ApiRoute> routes = new ArrayList<>(routes(library, jobs, models));
        routes.add(ApiRoute.get("/api/openapi.json", "this document: the OpenAPI 3 description of the API",
                context -> context.contentType("application/json").result(document.get()), new ApiResult(Object.class, ApiResult.Form.OPENAPI)));
        document.set(Json.write(OpenApiDocument.of(routes, VersionInfo.version())));
        for (ApiRoute route : routes) {
            if (route.method().equals("get")) {
                config.routes.get(route.path(), route.handler());
                config.routes.head(route.path(), route.handler());
            } else {
                config.routes.post(route.path(), route.handler());
            }
        }
    }

    /**
     * Refuses a body larger than its kind may be: uploads (multipart) 64 MiB, anything else 64 KiB. A body without a
     * Content-Length (chunked) that is not an upload is read here up to its limit (Javalin keeps it for the handler);
     * an upload is held to its limit while it streams ({@link Uploads}).
     */
    private static void checkSize(Context context) {
        long length = context.req().getContentLengthLong();
        String type = context.contentType();
        boolean upload = type != null && type.startsWith("multipart/form-data");
        long limit = upload ? ServerSettings.MAX_UPLOAD_BYTES : ServerSettings.MAX_OTHER_BYTES;
        if (length > limit) {
            throw new RequestRefused(413, "TOO_LARGE", "the request body has " + length + " bytes; at most " + limit
                    + (upload ? " bytes may be uploaded at once" : " bytes are accepted here"));
        }
        if (length < 0 && !upload && context.header("Transfer-Encoding") != null) {
            try {
                context.bodyAsBytes();
            } catch (HttpResponseException e) {
                throw new RequestRefused(413, "TOO_LARGE", "the request body has more than " + limit + " bytes; at most " + limit
                        + " bytes are accepted here");
            }
        }
    }

    static List<ApiRoute> routes(Library library, JobRegistry jobs, GradeModelCache models) {
        LibraryApi grades = new LibraryApi(library);
        ImportApi imports = new ImportApi(library);
        PermeanceApi permeance = new PermeanceApi();
        DesignApi design = new DesignApi(library, models);
        ElementsApi elements = new ElementsApi(library, models);
        MaterialApi materials = new MaterialApi(library);
        FitApi fits = new FitApi(library);
        JobApi jobApi = new JobApi(library, jobs);
        ApiParameter name = ApiParameter.path("name", "the grade's name", "DEMO N42SH");
        ApiParameter temperature = ApiParameter.query("temperature", true, "temperature with its unit: C, K or F", "120C");
        ApiParameter onSteel = ApiParameter.query("onSteel", false, "true: one pole face on a large steel plate", "false");
        return List.of(
                ApiRoute.get("/api/grades", "the grades in the library", grades::grades, ApiResult.list(GradeRow.class),
                        ApiParameter.query("family", false, "only grades of this family", "sintered NdFeB")),
                ApiRoute.get("/api/grades/{name}", "one grade and its stored curves", grades::grade, ApiResult.one(GradeDocument.class), name),
                ApiRoute.change("/api/grades/{name}/details", "edit a grade's supplier, density, notes or price, from the version read",
                        grades::editDetails, ApiResult.one(GradeDocument.class), name,
                        ApiParameter.query("version", true, "the grade's version the edit was made from; a newer one is a conflict (409)", "1"),
                        ApiParameter.query("supplier", false, "supplier text; empty clears it", "Invented Magnet Works"),
                        ApiParameter.query("density", false, "density with its unit; empty clears it", "7.55 g/cm3"),
                        ApiParameter.query("notes", false, "free text; empty clears it", "quoted 2026-11"),
                        ApiParameter.query("price", false, "price per kilogram, a plain number in the team's currency; empty clears it", "48.5")),
                ApiRoute.get("/api/grades/{name}/curve", "characterization at a temperature, stored or modeled", grades::curve, ApiResult.oneOrList(CurveDocument.class),
                        name, temperature),
                ApiRoute.get("/api/grades/{name}/export", "a curve at a temperature as CSV or JSON", grades::export, ApiResult.csvOr(CurveExportDocument.class), name, temperature,
                        ApiParameter.query("format", false, "csv (default) or json", "csv"),
                        ApiParameter.query("curve", false, "normal (B, default) or intrinsic (J)", "normal"),
                        ApiParameter.query("points", false, "resample to N points evenly spaced in H", "50"),
                        ApiParameter.query("units", false, "si (default) or cgs", "si"),
                        ApiParameter.query("shifted", false, "true: shift H by HcB so that B = 0 at H = 0", "false"),
                        ApiParameter.query("bare", false, "true: two columns of numbers, no header (CSV only)", "false"),
                        ApiParameter.query("after", false, "the curve of a magnet damaged by these steps TEMPERATURE:FIELD[:KIND] in order,"
                                + " as the duty route takes them; needs pc", "150C:300kA/m,20C:0"),
                        ApiParameter.query("pc", false, "permeance coefficient of the load line the 'after' steps act on", "2")),
                ApiRoute.post("/api/import", "import uploaded files in one transaction", imports::upload, ApiResult.one(ImportReport.class),
                        ApiParameter.query("dryRun", false, "true: check and report, store nothing", "true")),
                ApiRoute.get("/api/permeance/cylinder", "demagnetizing factors of a cylinder or ring", permeance::cylinder, ApiResult.one(PermeanceDocument.class),
                        ApiParameter.query("diameter", true, "outer diameter", "10mm"),
                        ApiParameter.query("length", true, "length along the magnetization", "5mm"),
                        ApiParameter.query("innerDiameter", false, "bore of a ring", "4mm"), onSteel),
                ApiRoute.get("/api/permeance/block", "demagnetizing factors of a block", permeance::block, ApiResult.one(PermeanceDocument.class),
                        ApiParameter.query("width", true, "edge along x", "20mm"),
                        ApiParameter.query("depth", true, "edge along y", "10mm"),
                        ApiParameter.query("thickness", true, "edge along the magnetization", "5mm"), onSteel),
                ApiRoute.get("/api/permeance/spheroid", "demagnetizing factors of a spheroid", permeance::spheroid, ApiResult.one(PermeanceDocument.class),
                        ApiParameter.query("diameter", true, "equatorial diameter", "10mm"),
                        ApiParameter.query("length", true, "polar diameter, along the magnetization", "10mm")),
                ApiRoute.get("/api/check", "a grade on its load line: operating point, knee margin, losses, maximum temperature",
                        design::check, ApiResult.one(CheckDocument.class), DesignParameters.checkWithTolerances()),
                ApiRoute.post("/api/check/elements", "every element of a field solver's result (uploaded element-field files, one"
                        + " per load case in order) judged on the grade's curve: knee margin, loss by the recoil line, the worst elements",
                        elements::check, ApiResult.one(ElementCheckDocument.class),
                        ApiParameter.query("grade", false, "a grade of the library (or the typed-in br, muRec, hcj,"
                                + " knee, alpha, beta, referenceTemperature as for /api/check)", "DEMO NdFeB 42/100"),
                        ApiParameter.query("temperature", false, "temperature of elements whose file has no T column", "120C"),
                        ApiParameter.query("direction", false, "magnetization direction x,y,z of elements whose file has no mx, my, mz"
                                + " (default 0,0,1)", "0,0,1"),
                        ApiParameter.query("lossLimit", false, "volume-weighted loss allowed (default 1%)", "1%"),
                        ApiParameter.query("transverse", false, "along (default) or astroid", "along")),
                ApiRoute.get("/api/sweep", "the check at every temperature of a range, with the working temperatures", design::sweep,
                        ApiResult.one(SweepDocument.class), DesignParameters.sweep()),
                ApiRoute.get("/api/duty", "flux and irreversible loss after each (temperature, opposing field) step", design::duty, ApiResult.one(DutyDocument.class),
                        DesignParameters.duty()),
                ApiRoute.get("/api/select", "every grade of the library ranked against the requirements", design::select, ApiResult.list(SelectionDocument.class),
                        DesignParameters.select()),
                ApiRoute.get("/api/field/cylinder", "flux density B at a point near a cylinder", design::cylinder, ApiResult.one(FieldDocument.class),
                        DesignParameters.field("diameter", "length")),
                ApiRoute.get("/api/field/ring", "flux density B at a point near a ring", design::ring, ApiResult.one(FieldDocument.class),
                        DesignParameters.field("diameter", "innerDiameter", "length")),
                ApiRoute.get("/api/field/block", "flux density B at a point near a block", design::block, ApiResult.one(FieldDocument.class),
                        DesignParameters.field("width", "depth", "thickness")),
                ApiRoute.get("/api/materials", "the materials with stored susceptibility points", materials::materials, ApiResult.list(Materials.MaterialRow.class)),
                ApiRoute.get("/api/materials/{name}", "one material's stored susceptibility points", materials::material, ApiResult.one(Materials.MaterialDocument.class),
                        ApiParameter.path("name", "the material's name", "DEMO copper")),
                ApiRoute.get("/api/fits", "every stored fit, by time", materials::fits, ApiResult.list(StoredFits.StoredFit.class)),
                ApiRoute.get("/api/fit/knee", "the knee model fitted to a grade's curves (stores nothing)", fits::knee, ApiResult.oneOrList(KneeFitDocument.class),
                        ApiParameter.query("grade", true, "a grade of the library", "DEMO NdFeB 42/100"),
                        ApiParameter.query("temperature", false, "only the curve at this temperature", "20C")),
                ApiRoute.get("/api/fit/temperature", "a grade's temperature model: α, β and a knee fit per temperature", fits::temperature, ApiResult.one(TemperatureFitDocument.class),
                        ApiParameter.query("grade", true, "a grade of the library", "DEMO NdFeB 42/100")),
                ApiRoute.get("/api/fit/curie-weiss", "the Curie–Weiss law fitted to a material's stored susceptibility", fits::curieWeiss, ApiResult.one(CurieWeissFitDocument.class),
                        ApiParameter.query("material", true, "a material of the library", "DEMO paramagnetic salt")),
                ApiRoute.start("/api/jobs/ja-fit", "start a Jiles–Atherton fit of a grade's stored loop in the background",
                        jobApi::jilesAthertonFit, ApiResult.one(JobDocument.Started.class), ApiParameter.query("grade", true, "the grade's name", "Invented soft iron"),
                        ApiParameter.query("temperature", false, "which curve, when there are several", "20C"),
                        ApiParameter.query("magnetizingField", false, "field magnetized at, for a second-quadrant curve", "3MA/m")),
                ApiRoute.startUpload("/api/jobs/import", "start an import of uploaded files (one transaction) in the background",
                        jobApi::importFiles, ApiResult.one(JobDocument.Started.class)),
                ApiRoute.get("/api/jobs/{id}", "a background job: kind, state, fraction done, stage, counts, result or error", jobApi::job, ApiResult.one(JobDocument.class),
                        ApiParameter.path("id", "the job's id, as answered when it was started", "0123456789abcdef0123456789abcdef")));
    }
}
