package org.kneepoint.fitter.elements;

import java.util.Locale;
import org.kneepoint.fitter.error.BadInputException;

/**
 * How a field across an element's magnetization counts towards demagnetizing it. Both rules give the field
 * H∥ along the magnetization when there is no transverse field H⊥.
 */
public enum TransverseRule {

    /**
     * Only the component along the magnetization acts: the element works at H∥ on the grade's curve, whatever H⊥.
     * This is the reversal field rising as 1/cos θ with the angle θ between field and easy axis, the law of
     * reversal by the pinning of domain walls (E. Kondorsky, "On the nature of coercive force and irreversible
     * changes in magnetization", Zh. Eksp. Teor. Fiz. 10, 420, 1940 — from memory), which measured sintered
     * rare-earth and ferrite magnets follow for moderate angles; the default.
     */
    ALONG,

    /**
     * The Stoner–Wohlfarth astroid: reversal by coherent rotation, where a field at θ to the easy axis switches
     * when |h∥|^(2/3) + |h⊥|^(2/3) = 1 in units of the anisotropy field (E. C. Stoner, E. P. Wohlfarth, "A mechanism
     * of magnetic hysteresis in heterogeneous alloys", Phil. Trans. R. Soc. A 240, 599, 1948 — from memory). An
     * element with H∥ &lt; 0 works at the astroid's norm −(|H∥|^(2/3) + |H⊥|^(2/3))^(3/2), never weaker than H∥
     * alone (the rule carried from switching fields to the whole curve is our own, a conservative bound for grades
     * whose reversal is by rotation rather than by walls); an element with H∥ ≥ 0 is not pushed towards reversal.
     */
    ASTROID;

    /** The field along the magnetization the element works at, A/m, from H∥ and H⊥ ≥ 0. */
    public double effective(double along, double across) {
        if (this == ALONG || along >= 0.0 || across == 0.0) {
            return along;
        }
        double norm = Math.cbrt(along * along) + Math.cbrt(across * across);
        return -norm * Math.sqrt(norm);
    }

    /** The rule named {@code text} ({@code along} or {@code astroid}, any case). */
    public static TransverseRule named(String text) {
        for (TransverseRule rule : values()) {
            if (rule.name().equalsIgnoreCase(text.strip())) {
                return rule;
            }
        }
        throw new BadInputException("unknown transverse-field rule '" + text.strip() + "'; expected along or astroid");
    }

    /** The rule's name as options and JSON write it. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
