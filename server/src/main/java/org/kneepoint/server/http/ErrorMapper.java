package org.kneepoint.server.http;

import io.javalin.config.JavalinConfig;
import io.javalin.http.Context;
import java.util.LinkedHashMap;
import java.util.Map;
import org.kneepoint.fitter.error.KneepointException;
import org.kneepoint.server.text.Json;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The one place where the HTTP layer turns failures into responses: bad input 400, not found
 * 404, conflict 409, numerical failure 422, a refused write 401/403, a body over its limit 413,
 * anything else 500 with a generic message (the details go to the log, never to the client). The
 * body is {@code {"error": {"code": "BAD_INPUT", "message": "..."}}}.
 */
final class ErrorMapper {

    private static final Logger LOG = LoggerFactory.getLogger(ErrorMapper.class);

    private ErrorMapper() {
    }

    static void install(JavalinConfig config) {
        config.routes.exception(KneepointException.class, (error, context) -> known(error, context));
        config.routes.exception(RequestRefused.class, (error, context) -> respond(context, error.status(), error.code(), error.getMessage()));
        config.routes.exception(Exception.class, (error, context) -> {
            LOG.error("internal error on {} {}", context.method(), context.path(), error);
            respond(context, 500, "INTERNAL", "internal error; the server log has the details");
        });
        config.routes.error(404, context -> {
            String type = context.res().getContentType();
            if (type == null || !type.startsWith("application/json")) {
                respond(context, 404, "NOT_FOUND", "no such page or route: " + context.path());
            }
        });
        config.routes.error(405, context -> respond(context, 405, "METHOD_NOT_ALLOWED", context.method() + " is not allowed on " + context.path()));
    }

    private static void known(KneepointException error, Context context) {
        int status = switch (error.code()) {
            case BAD_INPUT -> 400;
            case NOT_FOUND -> 404;
            case CONFLICT -> 409;
            case NUMERICAL_FAILURE -> 422;
        };
        respond(context, status, error.code().name(), error.getMessage());
    }

    /** Writes the error body; pages get the same JSON, which a browser shows as text. */
    static void respond(Context context, int status, String code, String message) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("code", code);
        body.put("message", message);
        context.status(status).contentType("application/json").result(Json.write(Map.of("error", body)));
    }
}
