package org.kneepoint.server.app.fits;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;
import org.kneepoint.fitter.model.knee.KneeFit;
import org.kneepoint.fitter.model.knee.TemperatureFit;

/**
 * A temperature fit ({@code kneepoint fit temperature --json}, {@code GET /api/fit/temperature}): the model's
 * parameters, then the measured temperature range and the range the model covers (beyond the measured range it
 * extrapolates), K.
 */
public record TemperatureFitDocument(@JsonUnwrapped TemperatureFitParameters parameters, List<Double> measuredRangeK,
        List<Double> modelRangeK) {

    /** The document of one temperature fit. */
    public static TemperatureFitDocument of(TemperatureFit fit) {
        List<KneeFit> fits = fit.fits();
        return new TemperatureFitDocument(TemperatureFitParameters.of(fit),
                List.of(fits.get(0).temperatureK(), fits.get(fits.size() - 1).temperatureK()),
                List.of(fit.model().lowestTemperature(), fit.model().highestTemperature()));
    }
}
