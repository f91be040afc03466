package org.kneepoint.server.web;

import java.util.List;

/**
 * The frame of every page ({@code layout.jte}): head with the style sheet, a top bar with the
 * sections, the page's own content, and a footer that says when invented demo grades are in the
 * library; and the cautions beside results ({@code caution.jte}).
 */
final class Layout {

    /** The prefix of the names of the invented demo grades. */
    static final String DEMO_PREFIX = "DEMO";

    /** The sections of the top bar, as {link, label}; a page names its section by the label. */
    static final List<Tab> TABS = List.of(new Tab("/", "Library"), new Tab("/check", "Check"), new Tab("/select", "Select"),
            new Tab("/field", "Field"), new Tab("/import", "Import"));

    private Layout() {
    }

    /**
     * What the frame needs of a page: its title, the section it belongs to (a tab's label, or empty), whether invented
     * demo grades are in the library, and whether the browser should load the page again every second.
     */
    record Frame(String title, String section, boolean demoPresent, boolean reloading) {

        Frame(String title, String section, boolean demoPresent) {
            this(title, section, demoPresent, false);
        }
    }

    /** One section of the top bar. */
    record Tab(String href, String label) {
    }

    static boolean isDemo(String grade) {
        return grade.startsWith(DEMO_PREFIX);
    }
}
