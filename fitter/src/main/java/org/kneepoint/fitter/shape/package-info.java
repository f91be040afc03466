/**
 * Demagnetizing factors (magnetometric Nm, fluxmetric Nf, centre-point N0) and permeance
 * coefficients Pc = (1 − N)/N of cylinders, rings, rectangular blocks and spheroids magnetized
 * uniformly along +z, of magnets on a steel plate and of simple magnetic circuits. Every length is
 * in metres. Sources: Chen, Brug, Goldfarb (IEEE Trans. Magn. 27, 3601, 1991); Aharoni (J. Appl.
 * Phys. 83, 3432, 1998); Osborn (Phys. Rev. 67, 351, 1945); Derby, Olbert (Am. J. Phys. 78, 229, 2010).
 */
package org.kneepoint.fitter.shape;
