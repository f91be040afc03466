package org.kneepoint.server.cli;

import org.kneepoint.fitter.loadline.AppliedField;
import org.kneepoint.server.app.design.FieldChoice;
import picocli.CommandLine.Option;

/**
 * The field against the magnetization, in one of the two conventions (docs/design.md §4): {@code --opposing-field} (circuit)
 * or {@code --external-field} (a uniform field on a free magnet); neither is no field.
 */
final class FieldOptions {

    @Option(names = "--opposing-field", converter = QuantityConverters.FieldStrength.class,
            description = "Field against the magnetization in the circuit convention, e.g. 200kA/m: the load line is"
                    + " B = −μ0·Pc·(H + Ha), Ha the ampere-turns of a coil per magnet length (default: 0).")
    Double opposing;

    @Option(names = "--external-field", converter = QuantityConverters.FieldStrength.class,
            description = "Uniform external field against the magnetization on a free magnet, e.g. 300kA/m: the internal"
                    + " field is H = −Hext − N·M with N = 1/(1 + Pc) (the factor behind the load line), a shift of Hext/(1 − N).")
    Double external;

    /** The field given (none: 0 in the circuit convention); both at once is refused. */
    AppliedField field() {
        return FieldChoice.of(opposing, external, "--opposing-field", "--external-field");
    }
}
