package org.kneepoint.fitter.study;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;
import org.kneepoint.fitter.units.Dimension;

/**
 * The inputs of a check a tolerance band may be put on, by the names the command line and the API take. An absolute
 * band is read in the input's dimension (none: a plain number); a relative one in percent of the nominal value.
 */
public enum ToleranceName {
    BR("br", Dimension.FLUX_DENSITY, Kind.CURVE),
    HCJ("hcj", Dimension.FIELD_STRENGTH, Kind.CURVE),
    MU_REC("mu-rec", null, Kind.CURVE),
    KNEE("knee", Dimension.FIELD_STRENGTH, Kind.CURVE),
    PC("pc", null, Kind.LOAD_LINE),
    DIAMETER("diameter", Dimension.LENGTH, Kind.SIZE),
    INNER_DIAMETER("inner-diameter", Dimension.LENGTH, Kind.SIZE),
    LENGTH("length", Dimension.LENGTH, Kind.SIZE),
    WIDTH("width", Dimension.LENGTH, Kind.SIZE),
    DEPTH("depth", Dimension.LENGTH, Kind.SIZE),
    THICKNESS("thickness", Dimension.LENGTH, Kind.SIZE),
    TEMPERATURE("temperature", Dimension.TEMPERATURE, Kind.CONDITION),
    OPPOSING_FIELD("opposing-field", Dimension.FIELD_STRENGTH, Kind.CONDITION),
    EXTERNAL_FIELD("external-field", Dimension.FIELD_STRENGTH, Kind.CONDITION);

    /** What part of the check an input perturbs. */
    public enum Kind { CURVE, LOAD_LINE, SIZE, CONDITION }

    private final String label;
    private final Dimension dimension;
    private final Kind kind;

    ToleranceName(String label, Dimension dimension, Kind kind) {
        this.label = label;
        this.dimension = dimension;
        this.kind = kind;
    }

    /** The name as typed, e.g. {@code mu-rec}. */
    public String label() {
        return label;
    }

    /** The dimension of an absolute band, or null for a plain number. */
    public Dimension dimension() {
        return dimension;
    }

    /** The part of the check the input perturbs. */
    public Kind kind() {
        return kind;
    }

    /** The input called {@code label}, if any. */
    public static Optional<ToleranceName> of(String label) {
        return Arrays.stream(values()).filter(name -> name.label.equals(label)).findFirst();
    }

    /** Every name, comma-separated, for messages. */
    public static String all() {
        return Arrays.stream(values()).map(ToleranceName::label).collect(Collectors.joining(", "));
    }
}
