package org.kneepoint.server.app.lots;

import java.util.List;

/** A grade's lots, by name, with their samples and measurement temperatures. */
public record LotListDocument(String grade, List<Entry> lots) {

    /** One lot; {@code measuredOn} as an ISO date (2026-11-30), or null. */
    public record Entry(String lot, String measuredOn, String notes, List<String> samples, List<Double> temperaturesK, int curves) {
    }
}
