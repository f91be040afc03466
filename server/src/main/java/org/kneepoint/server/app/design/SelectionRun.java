package org.kneepoint.server.app.design;

import java.util.List;
import org.kneepoint.fitter.select.RankingOrder;
import org.kneepoint.fitter.select.Requirements;

/** A selection that ran: the requirements, the load line, the order and the ranked rows. */
public record SelectionRun(Requirements requirements, LoadLineSpec loadLine, RankingOrder order, List<SelectionRow> rows) {

    public SelectionRun {
        rows = List.copyOf(rows);
    }

    /** Whether any grade meets every requirement, in words ({@link Verdicts#selection}). */
    public Verdict verdict() {
        return Verdicts.selection(this);
    }

    /** The selection's JSON document (an array), the same for {@code select --json} and {@code /api/select}. */
    public List<SelectionDocument> document() {
        return rows.stream().map(row -> SelectionDocument.of(row, requirements)).toList();
    }
}
