/**
 * Fit use cases: what a fit works on (a file or a stored grade or material), the Jiles–Atherton fit shared by the
 * command and the fit jobs, and the rules for saving a fit to the library.
 */
package org.kneepoint.server.app.fits;
