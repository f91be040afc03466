package org.kneepoint.server.app.fits;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonFitter;

/**
 * A Jiles–Atherton fit of prepared data, shared by {@code fit ja} and the
 * fit jobs of the web application so that both give the same answer.
 */
public final class JilesAthertonFitRun {

    private JilesAthertonFitRun() {
    }

    /** Fits a loop or a second-quadrant curve; bad input without a place is placed at the data's source. */
    public static JilesAthertonFit fit(JilesAthertonFitData data, FitProgress progress) {
        JilesAthertonFitter fitter = new JilesAthertonFitter();
        try {
            return data.isLoop() ? fitter.fitLoop(data.loop(), progress) : fitter.fitSecondQuadrant(data.loop(), progress);
        } catch (BadInputException e) {
            throw e.location().isPresent() ? e : new BadInputException(InputLocation.of(data.source()), e.getMessage());
        }
    }
}
