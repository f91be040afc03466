package org.kneepoint.server.http;

import io.javalin.http.Handler;
import java.util.List;

/**
 * One JSON route of the API: its method and path (Javalin's {@code {name}} path parameters), what
 * it does, its parameters and its handler. The routes are registered and described in the OpenAPI
 * document from the same list, so the two cannot drift apart. {@code status} is the status of
 * success; {@code upload} says the body is multipart files.
 */
record ApiRoute(String method, String path, String summary, List<ApiParameter> parameters, Handler handler, int status,
        boolean upload) {

    ApiRoute {
        parameters = List.copyOf(parameters);
        if (!method.equals("get") && !method.equals("post")) {
            throw new IllegalArgumentException("unsupported method " + method);
        }
    }

    static ApiRoute get(String path, String summary, Handler handler, ApiParameter... parameters) {
        return new ApiRoute("get", path, summary, List.of(parameters), handler, 200, false);
    }

    static ApiRoute post(String path, String summary, Handler handler, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, 200, true);
    }

    /** A POST whose input is its query parameters, answering 200. */
    static ApiRoute change(String path, String summary, Handler handler, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, 200, false);
    }

    /** A POST without a body that starts a background job and answers 202 Accepted. */
    static ApiRoute start(String path, String summary, Handler handler, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, 202, false);
    }

    /** A POST of multipart files that starts a background job with them and answers 202 Accepted. */
    static ApiRoute startUpload(String path, String summary, Handler handler, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, 202, true);
    }

    /** A path or query parameter, with an example value. */
    record ApiParameter(String name, String in, boolean required, String description, String example) {

        static ApiParameter path(String name, String description, String example) {
            return new ApiParameter(name, "path", true, description, example);
        }

        static ApiParameter query(String name, boolean required, String description, String example) {
            return new ApiParameter(name, "query", required, description, example);
        }
    }
}
