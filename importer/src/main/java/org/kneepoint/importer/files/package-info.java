/**
 * The one entry for reading an input file: {@link org.kneepoint.importer.files.CurveFiles#read}
 * reads the file once, then chooses its reader once — JSON for a name ending in {@code .json},
 * else the delimited-text reader, whose header row tells a susceptibility table from a curve file.
 */
package org.kneepoint.importer.files;
