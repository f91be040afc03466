package org.kneepoint.server.web;

import org.kneepoint.server.text.Cautions;

/**
 * The frame of every page: head with the style sheet, a top bar with the sections, the
 * page's own content, and a footer that says when invented demo grades are in the library.
 */
final class Layout {

    /** The prefix of the names of the invented demo grades. */
    static final String DEMO_PREFIX = "DEMO";

    private Layout() {
    }

    /** A whole page; {@code title} is escaped here, {@code content} is markup built by the pages. */
    static String page(String title, String section, String content, boolean demoPresent) {
        return page(title, section, content, demoPresent, false);
    }

    /** A whole page that, when {@code reloading}, asks the browser to load it again every second. */
    static String page(String title, String section, String content, boolean demoPresent, boolean reloading) {
        return "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">"
                + (reloading ? "<meta http-equiv=\"refresh\" content=\"1\">" : "")
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">"
                + "<title>" + Html.text(title) + " · Kneepoint</title>"
                + "<link rel=\"stylesheet\" href=\"/style.css\"></head><body>"
                + "<header class=\"bar\"><span class=\"mark\">Kneepoint</span><nav>"
                + tab("/", "Library", section) + tab("/check", "Check", section) + tab("/select", "Select", section)
                + tab("/field", "Field", section) + tab("/import", "Import", section)
                + "</nav></header><main>" + content + "</main>" + footer(demoPresent) + "</body></html>\n";
    }

    /** The caution shown beside results that feed a safety decision. */
    static String caution() {
        return cautions(false);
    }

    /** The cautions of a result, with the note on extrapolation first when it rests on an extrapolated model. */
    static String cautions(boolean extrapolated) {
        StringBuilder out = new StringBuilder("<aside class=\"caution\"><strong>Caution.</strong> ");
        for (String line : Cautions.of(extrapolated)) {
            out.append(Html.text(line)).append(' ');
        }
        return out.append("</aside>").toString();
    }

    static boolean isDemo(String grade) {
        return grade.startsWith(DEMO_PREFIX);
    }

    private static String tab(String href, String label, String section) {
        String current = label.equals(section) ? " aria-current=\"page\"" : "";
        return "<a href=\"" + href + "\"" + current + ">" + label + "</a>";
    }

    private static String footer(boolean demoPresent) {
        String demo = demoPresent
                ? "<p class=\"demo-note\">Grades whose names start with DEMO are invented demonstration data, "
                        + "not measurements of any real product.</p>"
                : "";
        return "<footer>" + demo + "<p>Kneepoint: SI values inside, units shown on every column. "
                + "<a href=\"/api/openapi.json\">API description</a></p></footer>";
    }
}
