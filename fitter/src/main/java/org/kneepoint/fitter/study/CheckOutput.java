package org.kneepoint.fitter.study;

/** The outputs of a check a tolerance study sums up, in the order {@link CheckSample} returns them, by their JSON names. */
public enum CheckOutput {
    B("b"), H("h"), J("j"), IRREVERSIBLE_LOSS("irreversibleLossPercent"), REVERSIBLE_LOSS("reversibleLossPercent"),
    MAX_WORKING_TEMPERATURE("maxWorkingTemperatureK");

    private final String key;

    CheckOutput(String key) {
        this.key = key;
    }

    /** The output's name in the study's result. */
    public String key() {
        return key;
    }
}
