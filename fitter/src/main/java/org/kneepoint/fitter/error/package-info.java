/**
 * The error vocabulary shared by every module: bad input, not found, conflict,
 * numerical failure, and the codes of storage failures (unavailable, damaged) whose exceptions the
 * database module defines.
 * Code throws these; the CLI and the HTTP layer each render them in one place.
 */
package org.kneepoint.fitter.error;
