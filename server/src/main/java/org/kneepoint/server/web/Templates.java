package org.kneepoint.server.web;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;

/**
 * The pages' templates ({@code server/src/main/jte}), compiled to Java classes of this package at
 * build time by the JTE Maven plugin. Their content type is HTML: every value a template outputs
 * is escaped for where it stands (element text, attribute, URL attribute), and raw output is
 * written {@code $unsafe{...}} beside a comment giving the reason.
 */
final class Templates {

    private static final TemplateEngine ENGINE = TemplateEngine.createPrecompiled(null, ContentType.Html,
            Templates.class.getClassLoader(), Templates.class.getPackageName());

    private Templates() {
    }

    /** The template {@code name} (e.g. {@code "library.jte"}) rendered with its one parameter, a view record. */
    static String render(String name, Object view) {
        StringOutput out = new StringOutput();
        ENGINE.render(name, view, out);
        return out.toString();
    }
}
