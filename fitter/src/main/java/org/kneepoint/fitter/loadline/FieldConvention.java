package org.kneepoint.fitter.loadline;

/**
 * The two meanings a field against the magnetization can have (docs/design.md §4), named in every output.
 */
public enum FieldConvention {
    /**
     * The circuit convention: Ha is the ampere-turns of a coil per magnet length (or any field the
     * circuit adds along the magnet), entering the load line as B = −μ0·Pc·(H + Ha) (P. Campbell,
     * "Magnetic circuit design", section 4C of magnetweb.com, 2001: the coil's N·i/lm adds to the load line).
     */
    OPPOSING,
    /**
     * A uniform external field Hext against the magnetization acting on a free magnet: the internal
     * field is H = −Hext − N·M with the demagnetizing factor N in use, so the load line is shifted by
     * Hext/(1 − N) (the ellipsoid relation H = H0 − N·M; J. A. Osborn, Phys. Rev. 67, 351, 1945, from memory).
     */
    EXTERNAL
}
