/**
 * The web application: server-rendered pages (Library, Grade, Import) in small template methods,
 * every stored string escaped by {@link org.kneepoint.server.web.Html}, one layout and style sheet
 * of our own, no scripts; {@link org.kneepoint.server.web.WebApplication} starts the pages and the
 * JSON API on one server.
 */
package org.kneepoint.server.web;
