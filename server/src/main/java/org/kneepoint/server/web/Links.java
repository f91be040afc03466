package org.kneepoint.server.web;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;

/**
 * Links into the application built from stored names: a name is percent-encoded for one URL path
 * segment or query value. The templates escape the whole link for its attribute.
 */
final class Links {

    private Links() {
    }

    /** A name encoded for one URL path segment or query value (a space becomes %20, never +). */
    static String segment(String value) {
        return URLEncoder.encode(value, StandardCharsets.UTF_8).replace("+", "%20");
    }

    /** The link to a grade's page. */
    static String grade(String name) {
        return "/grades/" + segment(name);
    }

    /** A link and its label, for lists of links in the templates. */
    record Link(String href, String label) {

        /** The link to a grade's page, labelled with its name. */
        static Link toGrade(String name) {
            return new Link(grade(name), name);
        }
    }
}
