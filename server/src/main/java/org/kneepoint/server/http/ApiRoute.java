package org.kneepoint.server.http;

import io.javalin.http.Handler;
import java.util.List;

/**
 * One JSON route of the API: its method and path (Javalin's {@code {name}} path parameters), what
 * it does, its parameters and its handler. The routes are registered and described in the OpenAPI
 * document from the same list, so the two cannot drift apart. {@code result} is what it answers (the schema
 * is generated from it), {@code status} the status of success; {@code upload} says the body is multipart files.
 */
record ApiRoute(String method, String path, String summary, List<ApiParameter> parameters, Handler handler, ApiResult result,
        int status, boolean upload) {

    ApiRoute {
        parameters = List.copyOf(parameters);
        if (!method.equals("get") && !method.equals("post")) {
            throw new IllegalArgumentException("unsupported method " + method);
        }
    }

    static ApiRoute get(String path, String summary, Handler handler, ApiResult result, ApiParameter... parameters) {
        return new ApiRoute("get", path, summary, List.of(parameters), handler, result, 200, false);
    }

    static ApiRoute post(String path, String summary, Handler handler, ApiResult result, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, result, 200, true);
    }

    /** A POST whose input is its query parameters, answering 200. */
    static ApiRoute change(String path, String summary, Handler handler, ApiResult result, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, result, 200, false);
    }

    /** A POST without a body that starts a background job and answers 202 Accepted. */
    static ApiRoute start(String path, String summary, Handler handler, ApiResult result, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, result, 202, false);
    }

    /** A POST of multipart files that starts a background job with them and answers 202 Accepted. */
    static ApiRoute startUpload(String path, String summary, Handler handler, ApiResult result, ApiParameter... parameters) {
        return new ApiRoute("post", path, summary, List.of(parameters), handler, result, 202, true);
    }

    /**
     * What a route answers on success: one record, a list of them, one record or a list (one per curve), CSV or the
     * record in JSON, or the OpenAPI document itself. The OpenAPI schema is made from {@code type}.
     */
    record ApiResult(Class<?> type, Form form) {

        /** How the records are answered. */
        enum Form { ONE, LIST, ONE_OR_LIST, CSV_OR_JSON, OPENAPI }

        static ApiResult one(Class<?> type) {
            return new ApiResult(type, Form.ONE);
        }

        static ApiResult list(Class<?> type) {
            return new ApiResult(type, Form.LIST);
        }

        static ApiResult oneOrList(Class<?> type) {
            return new ApiResult(type, Form.ONE_OR_LIST);
        }

        static ApiResult csvOr(Class<?> type) {
            return new ApiResult(type, Form.CSV_OR_JSON);
        }
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
