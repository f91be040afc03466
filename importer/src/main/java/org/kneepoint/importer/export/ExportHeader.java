package org.kneepoint.importer.export;

/**
 * What an exported file says about itself: grade, family, temperature (K), the curve kind and
 * where the points came from.
 */
public record ExportHeader(String grade, String family, double temperatureK, String kind, String source, String notes) {
}
