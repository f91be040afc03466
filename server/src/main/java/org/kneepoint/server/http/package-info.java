/**
 * The JSON API under {@code /api} on Javalin: routes for the library, characterization, export,
 * import and permeance that answer what the CLI prints with {@code --json}; background jobs (a
 * Jiles–Atherton fit, an import) with their generic progress; the OpenAPI document
 * built from the same route list; body size limits, the write guard (token when bound beyond
 * loopback, same-origin writes) and the one error mapper. Every value is SI.
 */
package org.kneepoint.server.http;
