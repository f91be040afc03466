package org.kneepoint.fitter.loadline;

import org.kneepoint.fitter.error.BadInputException;

/**
 * A field against the magnetization and the convention it is given in ({@link FieldConvention}). The load
 * line always takes the circuit form B = −μ0·Pc·(H + Ha); an external field Hext on a free magnet of
 * demagnetizing factor N = 1/(1 + Pc) (the factor behind Pc = (1 − N)/N) becomes Ha = Hext/(1 − N) =
 * Hext·(1 + Pc)/Pc. Derivation: H = −Hext − N·M and M = B/μ0 − H give (1 − N)·H = −Hext − N·B/μ0, i.e.
 * B = −μ0·((1 − N)/N)·(H + Hext/(1 − N)).
 *
 * @param convention which meaning
 * @param field      the field's magnitude, A/m, zero or positive
 */
public record AppliedField(FieldConvention convention, double field) {

    /** No field. */
    public static final AppliedField NONE = new AppliedField(FieldConvention.OPPOSING, 0.0);

    public AppliedField {
        if (convention == null) {
            throw new BadInputException("a field against the magnetization needs its convention (opposing or external)");
        }
        if (!(field >= 0.0) || !Double.isFinite(field)) {
            throw new BadInputException((convention == FieldConvention.EXTERNAL ? "external" : "opposing")
                    + " field must be zero or positive and finite in A/m, got " + field);
        }
    }

    /** A field in the circuit convention, Ha. */
    public static AppliedField opposing(double field) {
        return new AppliedField(FieldConvention.OPPOSING, field);
    }

    /** A uniform external field on a free magnet, Hext. */
    public static AppliedField external(double field) {
        return new AppliedField(FieldConvention.EXTERNAL, field);
    }

    /** The demagnetizing factor behind a permeance coefficient, N = 1/(1 + Pc). */
    public static double demagnetizingFactor(double pc) {
        return 1.0 / (1.0 + pc);
    }

    /** Ha of the load line with permeance coefficient {@code pc}: the field itself, or Hext·(1 + Pc)/Pc. */
    public double circuitField(double pc) {
        return convention == FieldConvention.OPPOSING ? field : field * (1.0 + pc) / pc;
    }

    /** The load line of permeance coefficient {@code pc} under this field. */
    public LoadLine loadLine(double pc) {
        if (!(pc > 0.0) || !Double.isFinite(pc)) {
            throw new BadInputException("permeance coefficient must be positive and finite, got " + pc);
        }
        return new LoadLine(pc, circuitField(pc));
    }
}
