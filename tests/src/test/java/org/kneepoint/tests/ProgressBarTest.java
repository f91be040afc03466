package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.model.ja.FitStage;
import org.kneepoint.server.text.ProgressBar;

class ProgressBarTest {

    private final StringWriter text = new StringWriter();
    private final long[] now = {0};
    private final ProgressBar bar = new ProgressBar(new PrintWriter(text), () -> now[0], "fit ja");

    @Test
    void a_fit_that_ends_within_a_second_prints_nothing() {
        bar.report(0, FitStage.STARTING_VALUES);
        now[0] = 900_000_000L;
        bar.report(0.6, FitStage.LOCAL_LEAST_SQUARES);
        bar.report(1, FitStage.DONE);
        assertEquals("", text.toString());
    }

    @Test
    void a_longer_fit_draws_one_line_that_it_ends_when_done() {
        now[0] = 1_500_000_000L;
        bar.report(0.3, FitStage.GLOBAL_SEARCH);
        assertTrue(text.toString().startsWith("\rfit ja [#########.....................]  30 % global search"), text.toString());
        now[0] += 10_000_000L;
        bar.report(0.31, FitStage.GLOBAL_SEARCH);
        assertEquals(1, text.toString().chars().filter(c -> c == '\r').count(), "redrawn at most every 100 ms");
        now[0] += 200_000_000L;
        bar.report(1, FitStage.DONE);
        assertTrue(text.toString().contains("100 % done"), text.toString());
        assertTrue(text.toString().endsWith(System.lineSeparator()));
        assertEquals(1, text.toString().chars().filter(c -> c == '\n').count(), "one line, redrawn in place");
    }
}
