/**
 * Kneepoint's plain-text curve files: optional {@code # key: value} metadata lines, one header row
 * naming each column's quantity and unit ({@code H [kOe]}, {@code J [kG]}, {@code B [T]},
 * {@code M [kA/m]}, {@code T [°C]}), then rows of numbers separated by commas, semicolons or tabs.
 * Readers convert to SI on the way in and report every problem with file, line and column; the
 * format is described in docs/curve-file-format.md.
 */
package org.kneepoint.importer.csv;
