package org.kneepoint.server.http;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpResponseException;
import org.kneepoint.fitter.error.ErrorCode;
import org.kneepoint.fitter.error.KneepointException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The one place where the HTTP layer turns failures into responses: bad input 400, not found
 * 404, conflict 409, numerical failure 422, the database unreachable 503 (with Retry-After), damaged stored data 500 with code DAMAGED, a
 * refused write 401/403, a body over its limit 413,
 * anything else 500 with a generic message (the details go to the log, never to the client). The
 * body is {@code {"error": {"code": "BAD_INPUT", "message": "..."}}}, or an {@link ErrorPage} when
 * a browser asks for a page.
 */
final class ErrorMapper {

    private static final Logger LOG = LoggerFactory.getLogger(ErrorMapper.class);
    /** When a client may try again after the library's database was unreachable. */
    private static final String RETRY_AFTER_SECONDS = "5";

    private ErrorMapper() {
    }

    static void install(JavalinConfig config, ErrorPage page) {
        config.routes.exception(KneepointException.class, (error, context) -> known(error, context, page));
        config.routes.exception(RequestRefused.class,
                (error, context) -> respond(context, page, error.status(), error.code(), error.getMessage()));
        config.routes.exception(HttpResponseException.class, (error, context) -> {
            ErrorBody body = ErrorBody.of(context.path(), context.header("Accept"), error.getStatus(), page);
            context.status(error.getStatus()).contentType(body.contentType()).result(body.text());
        });
        config.routes.exception(Exception.class, (error, context) -> {
            LOG.error("internal error on {} {}", context.method(), context.path(), error);
            respond(context, page, 500, "INTERNAL", "internal error; the server log has the details");
        });
        config.routes.error(404, context -> {
            String type = context.res().getContentType();
            if (type == null || !(type.startsWith("application/json") || type.startsWith("text/html"))) {
                respond(context, page, 404, "NOT_FOUND", "no such page or route: " + context.path());
            }
        });
    }

    private static void known(KneepointException error, Context context, ErrorPage page) {
        if (error.code() == ErrorCode.UNAVAILABLE) {
            context.header("Retry-After", RETRY_AFTER_SECONDS);
        }
        respond(context, page, ErrorStatus.of(error), error.code().name(), error.getMessage());
    }

    /** Writes the error: an HTML page to a browser asking for a page outside {@code /api}, else the JSON body. */
    private static void respond(Context context, ErrorPage page, int status, String code, String message) {
        ErrorBody body = ErrorBody.of(context.path(), context.header("Accept"), status, code, message, page);
        context.status(status).contentType(body.contentType()).result(body.text());
    }
}
