/**
 * Kneepoint's plain-text curve files: optional {@code # key: value} metadata lines, one header row
 * naming each column's quantity and unit ({@code H [kOe]}, {@code J [kG]}, {@code B [T]},
 * {@code M [kA/m]}, {@code T [°C]}), then rows of numbers separated by commas, semicolons or tabs.
 * Readers convert to SI on the way in and report every problem with file, line and column; the
 * format is described in docs/curve-file-format.md. Element-field files (a field solver's result, one row
 * per element; docs/element-fields.md) share the same scanner, headers and errors ({@code ElementFileReader}).
 */
package org.kneepoint.importer.csv;
