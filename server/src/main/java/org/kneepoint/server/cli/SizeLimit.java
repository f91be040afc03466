package org.kneepoint.server.cli;

import org.kneepoint.fitter.error.BadInputException;
import org.kneepoint.fitter.error.InputLocation;
import org.kneepoint.importer.csv.ReadLimits;

/** The {@code --max-file-size} option's value as read limits, refusing nonsense. */
final class SizeLimit {

    private SizeLimit() {
    }

    static ReadLimits of(long maxFileSize) {
        if (maxFileSize <= 0) {
            throw new BadInputException(InputLocation.of("option --max-file-size"), "must be a positive number of bytes, got " + maxFileSize);
        }
        return new ReadLimits(maxFileSize);
    }
}
