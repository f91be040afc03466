package org.kneepoint.server.web;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;

/**
 * The one escaping helper of the pages: every stored or requested string goes through
 * {@link #text} (element content and quoted attribute values) or {@link #pathSegment} (a name
 * inside a URL) before it is put into HTML.
 */
public final class Html {

    private Html() {
    }

    /** Text safe inside an element or a double-quoted attribute; null becomes empty. */
    public static String text(String value) {
        if (value == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(value.length() + 16);
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }

    /** A name encoded for one URL path segment or query value, then escaped for an attribute. */
    public static String pathSegment(String value) {
        return text(URLEncoder.encode(value, StandardCharsets.UTF_8).replace("+", "%20"));
    }

    /** A link: {@code href} is built from {@link #pathSegment} parts, the label is escaped here. */
    public static String link(String href, String label) {
        return "<a href=\"" + href + "\">" + text(label) + "</a>";
    }
}
