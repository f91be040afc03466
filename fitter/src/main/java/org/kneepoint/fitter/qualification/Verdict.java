package org.kneepoint.fitter.qualification;

import java.util.Collection;
import java.util.Locale;

/**
 * The outcome of comparing a value with its lower limit, from best to worst: it passes, it passes
 * only within its measurement uncertainty or was not reached by the data (inconclusive), or it is
 * below the limit (fail).
 */
public enum Verdict {
    PASS, INCONCLUSIVE, FAIL;

    /** The word in JSON and tables: pass, inconclusive, fail. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The worst of the verdicts; {@code whenNone} when there are none. */
    public static Verdict worst(Collection<Verdict> verdicts, Verdict whenNone) {
        return verdicts.stream().max(Enum::compareTo).orElse(whenNone);
    }
}
