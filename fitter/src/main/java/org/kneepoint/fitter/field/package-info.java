/**
 * Magnetic flux density B (tesla) and field strength H = B/μ0 − M (A/m) around and inside magnets
 * magnetized uniformly along +z with remanence Br = μ0·M, origin at the magnet's centre, lengths in
 * metres. Cylinders and rings: Derby and Olbert, Am. J. Phys. 78, 229 (2010); blocks: the closed-form
 * field of the charged pole faces (as in Engel-Herbert and Hesjedal, J. Appl. Phys. 97, 074504, 2005);
 * spheroids: the potential of a uniformly magnetized ellipsoid (Osborn, Phys. Rev. 67, 351, 1945).
 * Beyond 25 radii of the enclosing sphere, cylinders, rings and blocks switch to a multipole
 * expansion summed without cancellation ({@code MultipoleExpansion}, Jackson §4.1 and §5.9). On the
 * sharp edges of a pole face the field is infinite: {@link MagnetField#sample} then gives a
 * {@link FieldSample} with a reason instead of a value.
 */
package org.kneepoint.fitter.field;
