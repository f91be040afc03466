package org.kneepoint.server.http;

import org.kneepoint.server.app.jobs.JobKind;
import org.kneepoint.server.app.jobs.JobProgress;
import org.kneepoint.server.app.jobs.JobRegistry;

import io.javalin.http.Context;
import java.util.List;
import java.util.Locale;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.error.NotFoundException;
import org.kneepoint.fitter.model.ja.FitStage;
import org.kneepoint.fitter.units.Dimension;
import org.kneepoint.server.app.fits.JilesAthertonFitData;
import org.kneepoint.server.app.fits.JilesAthertonFitDocument;
import org.kneepoint.server.app.fits.JilesAthertonFitRun;

/**
 * Starts jobs from a request, for the API and the pages alike. What can be checked up front (the
 * query, the grade and its curve, the upload's parts) is checked before the job is queued, so such
 * a bad request is refused at once and starts nothing.
 */
public final class JobRequests {

    private JobRequests() {
    }

    /** Queues a Jiles–Atherton fit of {@code grade}'s stored loop (or second-quadrant curve) and answers the job's id. */
    public static String jilesAthertonFit(Context context, Library library, JobRegistry jobs) {
        Query query = new Query(context);
        String grade = query.required("grade", "Invented soft iron");
        Double temperatureK = query.optionalTemperatureK("temperature");
        Double magnetizingField = query.optionalQuantity("magnetizingField", Dimension.FIELD_STRENGTH, "3MA/m");
        if (library.reader().grade(grade).isEmpty()) {
            throw new NotFoundException("no grade named '" + grade + "' in the library");
        }
        JilesAthertonFitData data = JilesAthertonFitData.fromGrade(library.reader(), grade, temperatureK, magnetizingField);
        return jobs.submit(JobKind.JA_FIT, progress -> JilesAthertonFitDocument.of(data, JilesAthertonFitRun.fit(data, (fraction, stage) ->
                progress.accept(new JobProgress(Math.min(Math.max(fraction, 0), 1), words(stage), List.of()))), false)).orElseThrow(JobRequests::busy);
    }

    /**
     * Queues an import of the uploaded files, which the job owns from now on, and answers the job's
     * id. The upload itself (its parts, names and size) was checked when it was received; the
     * files' contents are read and checked inside the job, which fails with the one-line message
     * and stores nothing when a file is bad.
     */
    public static String importFiles(Library library, Uploads uploads, JobRegistry jobs) {
        return jobs.submit(JobKind.IMPORT, new ImportJob(library, uploads)).orElseThrow(JobRequests::busy);
    }

    private static RequestRefused busy() {
        return new RequestRefused(429, "BUSY", "the server is busy with other jobs; try again in a while");
    }

    /** A fit stage as the words shown to people, e.g. "global search". */
    private static String words(FitStage stage) {
        return stage.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
