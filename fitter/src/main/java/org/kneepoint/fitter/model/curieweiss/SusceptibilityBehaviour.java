package org.kneepoint.fitter.model.curieweiss;

/** Sign of the measured volume susceptibility over the measured temperatures. */
public enum SusceptibilityBehaviour {
    /** χ &lt; 0 at every measured temperature. */
    DIAMAGNETIC,
    /** χ &gt; 0 at every measured temperature. */
    PARAMAGNETIC,
    /** χ changes sign in the measured range, e.g. a Curie tail over a diamagnetic background. */
    SIGN_CHANGING
}
