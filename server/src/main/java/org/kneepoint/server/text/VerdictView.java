package org.kneepoint.server.text;

import org.kneepoint.server.app.design.Verdict;

/**
 * A verdict as the lines a table opens with: "Verdict: meets ..." or "Verdict: falls short: ..." and, below it, each
 * reason on its own line; in words only, so it reads the same on any terminal.
 */
public final class VerdictView {

    private VerdictView() {
    }

    /** The verdict's lines, each ending with a newline. */
    public static String lines(Verdict verdict) {
        StringBuilder out = new StringBuilder("  Verdict: ").append(PlainText.printable(verdict.summary())).append('\n');
        for (String reason : verdict.reasons()) {
            out.append("    - ").append(PlainText.printable(reason)).append('\n');
        }
        return out.toString();
    }
}
