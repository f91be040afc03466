package org.kneepoint.fitter.library;

import java.util.List;

/** What one lot file brings: its import record, the lot (created when new) and its curves. */
public record LotBatch(ImportInfo info, LotInfo lot, List<LotCurve> curves) {

    public LotBatch {
        curves = List.copyOf(curves);
    }
}
