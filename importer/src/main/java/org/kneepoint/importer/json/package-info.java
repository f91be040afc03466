/**
 * The JSON forms of Kneepoint's files: a curve file as one JSON object (the same content as the
 * text format: metadata fields, {@code columns} with units, {@code rows} of numbers) and the
 * whole-library backup. Errors name the file, the line and column of the JSON text, and the field.
 */
package org.kneepoint.importer.json;
