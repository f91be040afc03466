/**
 * Value types of the material library — grades, stored curves, susceptibility points, fits and
 * import records — shared by the database stores, the file formats and the application. Plain
 * records in SI; they know nothing of SQL or files.
 */
package org.kneepoint.fitter.library;
