/**
 * The application layer: one use case per sub-package, each taking a typed request record and answering a
 * complete result record. The command line ({@code server.cli}), the JSON API ({@code server.http}) and the pages
 * ({@code server.web}) only parse input, call this layer and render what it answers. No SQL, no physics, no
 * HTTP or picocli here: the physics is {@code fitter}, the storage {@code db}, the file formats {@code importer}.
 */
package org.kneepoint.server.app;
