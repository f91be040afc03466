package org.kneepoint.fitter.loadline;

/** Why a working-temperature limit ended where it did. */
public enum LimitReason {
    /** The irreversible loss reaches the loss limit there (a root of loss(T) − limit). */
    LIMIT_REACHED,
    /** The loss stays within the limit up to the edge of the model's temperature range, where the search stops. */
    MODEL_RANGE_EDGE,
    /** The loss exceeds the limit at every temperature the model describes: there is no working temperature. */
    NONE_IN_RANGE
}
