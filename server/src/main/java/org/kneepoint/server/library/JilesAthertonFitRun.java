package org.kneepoint.server.library;

import java.util.Map;
import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.kneepoint.fitter.model.ja.JilesAthertonFit;
import org.kneepoint.fitter.model.ja.JilesAthertonFitter;
import org.kneepoint.server.text.JilesAthertonFitView;

/**
 * A Jiles–Atherton fit of prepared data and its JSON document, shared by {@code fit ja} and the
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

    /** The fit's keys followed by where the data came from and whether the fit was saved. */
    public static Map<String, Object> json(JilesAthertonFitData data, JilesAthertonFit fit, boolean saved) {
        Map<String, Object> document = JilesAthertonFitView.json(fit);
        document.put("source", data.source());
        document.put("grade", data.grade());
        document.put("curveKind", data.curve().kind().name().toLowerCase());
        document.put("temperatureK", data.curve().temperatureK());
        document.put("magnetizingField", data.magnetizingField());
        document.put("saved", saved);
        return document;
    }
}
