/**
 * The demagnetization check of a field solver's results, element by element (docs/element-fields.md):
 * every element of a magnet, with its field from the solver in one or more load cases, is judged on the
 * grade's intrinsic curve at its temperature — the field along and across its magnetization, J, the margin
 * to the knee and the irreversible loss by the recoil line (docs/design.md §4), the worst point of each
 * element so far setting its recoil line as in a duty sequence. Every value is SI (m, m³, A/m, T, K).
 */
package org.kneepoint.fitter.elements;
