package org.kneepoint.server.web;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.kneepoint.server.app.fits.JilesAthertonFitDocument;
import org.kneepoint.server.app.fits.JilesAthertonFitParameters;
import org.kneepoint.server.app.imports.ImportReport;
import org.kneepoint.server.app.jobs.JobKind;
import org.kneepoint.server.app.jobs.JobProgress;
import org.kneepoint.server.app.jobs.JobStatus;

/**
 * A job's page shows the grade, file, stage and failure it was given as text: the template escapes them, so
 * a script element or a quote in a stored name is never markup.
 */
class JobPageEscapingTest {

    private static final String GRADE = "<script>alert(\"grade\")</script> 'N42'";
    private static final String GRADE_TEXT = "&lt;script&gt;alert(\"grade\")&lt;/script&gt; 'N42'";
    private static final String GRADE_LINK = "href=\"/grades/%3Cscript%3Ealert%28%22grade%22%29%3C%2Fscript%3E%20%27N42%27\"";
    private static final String FILE = "<b onmouseover=\"alert(1)\">x.csv";
    private static final String FILE_TEXT = "&lt;b onmouseover=\"alert(1)\"&gt;x.csv";

    @Test
    void a_finished_fit_links_its_grade_by_an_encoded_name_and_shows_it_as_text() {
        JilesAthertonFitDocument result = new JilesAthertonFitDocument(new JilesAthertonFitParameters(1.6e6, 1100.0, 400.0, 0.2, 1.6e-3),
                0.004, 100, new JilesAthertonFitDocument.StandardErrors(1.0e3, 7.0, 16.0, 0.03, 1.0e-5), List.of(), 10, 50, -1e6, 1e6,
                "library", GRADE, "loop\"<i>", 293.15, null, false);
        String page = JobPage.render(new JobStatus(JobKind.JA_FIT, JobStatus.State.DONE, JobProgress.NONE, result, null), false);
        assertTrue(page.contains("<a " + GRADE_LINK + ">" + GRADE_TEXT + "</a>"), page);
        assertTrue(page.contains("fit to the loop\"&lt;i&gt; curve"), page);
        assertTrue(page.contains("<td class=\"number\">1600</td>"), page);
        assertFalse(page.contains("<script") || page.contains("<i>"), page);
    }

    @Test
    void a_finished_import_shows_its_files_and_grades_as_text() {
        ImportReport.FileReport file = new ImportReport.FileReport(FILE, "imported", "00", null, null, List.of(GRADE, "Plain"), 2, 10, 0,
                List.of(293.15));
        ImportReport.FileReport skipped = new ImportReport.FileReport("again.csv", ImportReport.FileReport.ALREADY_IMPORTED, "00",
                "2026-12-01T00:00:00Z", FILE, null, null, null, null, null);
        String page = JobPage.render(new JobStatus(JobKind.IMPORT, JobStatus.State.DONE, JobProgress.NONE,
                new ImportReport(false, List.of(file, skipped)), null), false);
        assertTrue(page.contains("<td>" + FILE_TEXT + "</td>"), page);
        assertTrue(page.contains("<a " + GRADE_LINK + ">" + GRADE_TEXT + "</a>, <a href=\"/grades/Plain\">Plain</a>"), page);
        assertTrue(page.contains("already imported as " + FILE_TEXT + "; skipped"), page);
        assertFalse(page.contains("<script") || page.contains("<b "), page);
    }

    @Test
    void a_running_job_shows_its_stage_and_counts_as_text_and_reloads() {
        JobProgress progress = new JobProgress(0.25, "reading " + FILE, List.of(new JobProgress.Count("files <i>", 1, 3)));
        String page = JobPage.render(new JobStatus(JobKind.IMPORT, JobStatus.State.RUNNING, progress, null, null), true);
        assertTrue(page.contains("Running: 25 %, reading " + FILE_TEXT), page);
        assertTrue(page.contains("<li>files &lt;i&gt;: 1 of 3</li>"), page);
        assertTrue(page.contains("<meta http-equiv=\"refresh\" content=\"1\">"), page);
        assertFalse(page.contains("<b ") || page.contains("<i>"), page);
    }

    @Test
    void a_failed_import_says_nothing_was_imported_and_shows_the_message_as_text() {
        JobStatus failed = new JobStatus(JobKind.IMPORT, JobStatus.State.FAILED, JobProgress.NONE, null,
                new JobStatus.Failure("BAD_INPUT", FILE + ": line 3, column 'J': expected a number"));
        String page = JobPage.render(failed, false);
        assertTrue(page.contains("<strong>Nothing was imported.</strong> " + FILE_TEXT + ": line 3, column 'J'"), page);
        assertFalse(page.contains("<b ") || page.contains("http-equiv"), page);
    }
}
