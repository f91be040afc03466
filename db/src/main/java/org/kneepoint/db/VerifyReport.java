package org.kneepoint.db;

import java.util.List;
import java.util.Map;

/**
 * What {@code kneepoint verify} found: the rows checked per table, and one line for each damaged
 * row or missing part (empty when the library is sound).
 *
 * @param checked rows checked, by table name
 * @param damaged what is damaged, each naming its grade and curve, material, file or fit
 */
public record VerifyReport(Map<String, Integer> checked, List<String> damaged) {

    public VerifyReport {
        checked = Map.copyOf(checked);
        damaged = List.copyOf(damaged);
    }

    public boolean clean() {
        return damaged.isEmpty();
    }
}
