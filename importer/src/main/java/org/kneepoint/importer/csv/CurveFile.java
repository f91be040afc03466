package org.kneepoint.importer.csv;

import java.util.List;
import org.kneepoint.fitter.curve.DemagnetizationCurve;

/**
 * A curve file after reading: its name, its metadata and one curve per temperature (one curve
 * when the file has no temperature column), in the order they first appear.
 */
public record CurveFile(String source, CurveMetadata metadata, List<DemagnetizationCurve> curves) implements FileContent {

    public CurveFile {
        curves = List.copyOf(curves);
    }
}
