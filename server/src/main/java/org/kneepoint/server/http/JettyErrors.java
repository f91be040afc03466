package org.kneepoint.server.http;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import org.eclipse.jetty.http.HttpFields;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.http.HttpURI;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.handler.ErrorHandler;
import org.eclipse.jetty.util.Callback;

/**
 * The errors that Jetty answers by itself, before a route sees the request (a request line or headers too long, a
 * malformed URI or header, an unreadable message): the same JSON body or escaped page as every other error
 * ({@link ErrorMapper}), with the security headers, never Jetty's own page. A message that could not be read as a
 * request at all has no path, so it is answered in JSON.
 */
final class JettyErrors extends ErrorHandler {

    private final ErrorPage page;

    JettyErrors(ErrorPage page) {
        this.page = page;
    }

    @Override
    protected void generateResponse(Request request, Response response, int code, String message, Throwable cause, Callback callback) {
        HttpURI uri = request.getHttpURI();
        String path = uri == null ? null : uri.getPath();
        ErrorBody body = ErrorBody.of(path, request.getHeaders().get(HttpHeader.ACCEPT), code, page);
        HttpFields.Mutable headers = response.getHeaders();
        SecurityHeaders.apply(headers::put);
        headers.put(HttpHeader.CONTENT_TYPE, body.contentType());
        response.setStatus(code);
        response.write(true, ByteBuffer.wrap(body.text().getBytes(StandardCharsets.UTF_8)), callback);
    }
}
