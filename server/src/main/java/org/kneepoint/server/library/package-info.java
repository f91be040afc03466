/**
 * The application's work on the material library: turning files into import batches (checksum,
 * validation, provenance), demo data, and the glue between the importer's formats and the
 * database stores. No SQL and no physics here.
 */
package org.kneepoint.server.library;
