/**
 * Writers for exported curves: plain CSV with a metadata header (re-readable by the curve-file
 * reader), the JSON curve format, or a bare two-column table of numbers; SI or CGS units.
 */
package org.kneepoint.importer.export;
