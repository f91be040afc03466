/**
 * Grade use cases over the library: a grade's curves and temperature model, a curve at a temperature for export,
 * susceptibility data, and edits of a grade's details.
 */
package org.kneepoint.server.app.grades;
