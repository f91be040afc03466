package org.kneepoint.server.app.design;

import java.util.List;
import java.util.Objects;

/**
 * Whether a check, a duty sequence, a sweep, a grade or a whole selection meets what was asked, in words: the one-line
 * {@code summary} ("meets the 1 % limit: ...", "falls short: 41.9 % loss against 1 %") and one sentence per shortfall
 * in {@code reasons} (empty exactly when it passes). The same record on the command line, in JSON (key
 * {@code verdict}) and on the pages; {@link Verdicts} makes it.
 *
 * @param passes  whether nothing falls short
 * @param summary one line, starting "meets" or "falls short" (or "not assessed" for a grade that could not be checked)
 * @param reasons each shortfall in words
 */
public record Verdict(boolean passes, String summary, List<String> reasons) {

    public Verdict {
        Objects.requireNonNull(summary, "summary");
        reasons = List.copyOf(reasons);
        if (passes != reasons.isEmpty()) {
            throw new IllegalArgumentException("a verdict passes exactly when it has no reasons, got " + passes + " with " + reasons);
        }
    }
}
