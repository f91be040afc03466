package org.kneepoint.server.text;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.kneepoint.fitter.model.ja.FitProgress;
import org.kneepoint.fitter.model.ja.FitStage;

/**
 * A one-line console progress bar for long fits, drawn on the writer it is given (the CLI gives
 * it standard error, never standard output). It stays silent for the first second, so quick fits
 * print nothing; after that it redraws at most every {@value #REDRAW_MILLIS} ms and ends its line
 * when the fit reports {@link FitStage#DONE}.
 */
public final class ProgressBar implements FitProgress {

    private static final long SILENT_NANOS = 1_000_000_000L;
    private static final long REDRAW_MILLIS = 100;
    private static final int WIDTH = 30;

    private final PrintWriter out;
    private final LongSupplier nanoClock;
    private final String label;
    private final long started;
    private long lastDrawn;
    private boolean drawn;

    /**
     * @param out       where the bar is drawn
     * @param nanoClock a monotonic clock in nanoseconds, e.g. {@code System::nanoTime}
     * @param label     what is running, e.g. "fit ja"
     */
    public ProgressBar(PrintWriter out, LongSupplier nanoClock, String label) {
        this.out = out;
        this.nanoClock = nanoClock;
        this.label = label;
        this.started = nanoClock.getAsLong();
    }

    @Override
    public void report(double fractionDone, FitStage stage) {
        long now = nanoClock.getAsLong();
        if (now - started < SILENT_NANOS) {
            return;
        }
        boolean done = stage == FitStage.DONE;
        if (!done && drawn && now - lastDrawn < REDRAW_MILLIS * 1_000_000L) {
            return;
        }
        if (done && !drawn) {
            return;
        }
        double fraction = Math.min(Math.max(fractionDone, 0), 1);
        int filled = (int) Math.round(fraction * WIDTH);
        out.print(String.format(Locale.ROOT, "\r%s [%s%s] %3d %% %-22s", label, "#".repeat(filled),
                ".".repeat(WIDTH - filled), Math.round(100 * fraction), stageName(stage)));
        if (done) {
            out.println();
        }
        out.flush();
        drawn = true;
        lastDrawn = now;
    }

    private static String stageName(FitStage stage) {
        return stage.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
