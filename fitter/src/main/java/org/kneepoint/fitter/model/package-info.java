/**
 * The fitted models — knee and temperature ({@code .knee}), Jiles–Atherton ({@code .ja}), Curie–Weiss
 * ({@code .curieweiss}) — and what their results share.
 */
package org.kneepoint.fitter.model;
