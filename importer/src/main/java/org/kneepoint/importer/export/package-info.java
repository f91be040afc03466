/**
 * Writers for exported curves: plain CSV with a metadata header (re-readable by the curve-file
 * reader), the JSON curve format, or a bare two-column table of numbers; SI or CGS units; and the
 * demagnetized state of a field solver's elements after an element check, for the solver's next pass.
 */
package org.kneepoint.importer.export;
