package org.kneepoint.server.app.lots;

/** A grade's lots to compare at one temperature, K (null: the specification's temperature nearest 20 °C, else 20 °C). */
public record LotHistoryRequest(String grade, Double temperatureK) {
}
