/**
 * Imports: files turned into one import batch (checksum, validation, provenance) and stored in one transaction,
 * with the steps reported as progress.
 */
package org.kneepoint.server.app.imports;
