/**
 * The element check use case (docs/element-fields.md): the element-field files of a field solver's load cases read,
 * the grade's temperature model chosen as a design check chooses it, every element judged on the grade's curve
 * ({@code fitter.elements}), and the result answered as one record — the summary document for {@code --json} and
 * the API, and the per-element state for the solver's next pass.
 */
package org.kneepoint.server.app.elements;
