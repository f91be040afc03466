package org.kneepoint.fitter.shape;

import org.kneepoint.fitter.error.BadInputException;

/**
 * A magnet standing with one pole face on a large steel plate, treated as infinitely permeable:
 * by the method of images the field above the plate is that of the magnet joined to its mirror
 * image, a magnet of twice the length along the magnetization (method of images for a magnetic
 * charge in front of an infinitely permeable half-space: image charge of the same sign; standard,
 * from memory).
 *
 * <p>Nm is exact for that ideal plate: the volume average over the real half equals the average
 * over the doubled magnet by symmetry. Nf and N0 of the doubled magnet belong to its mid-plane and
 * centre, which lie on the contact face: they are exact for the flux through the contact face and
 * for the centre of that face, and only approximate the magnet's own mid-plane and centre values
 * (which are larger). A real plate of finite thickness and permeability gives larger factors.
 * The doubled magnet must itself lie in the accepted size range; the constructor checks it.
 *
 * @param magnet the free magnet
 */
public record MagnetOnSteelPlate(FlatPoleShape magnet) implements MagnetShape {

    public MagnetOnSteelPlate {
        if (magnet == null) {
            throw new BadInputException("magnet on a steel plate must be given a cylinder, ring or block, got null");
        }
        magnet.withLengthAlongMagnetization(2.0 * magnet.lengthAlongMagnetization());
    }

    /** The magnet joined to its mirror image. */
    public FlatPoleShape imagePair() {
        return magnet.withLengthAlongMagnetization(2.0 * magnet.lengthAlongMagnetization());
    }

    @Override
    public DemagnetizingFactors demagnetizingFactors() {
        return imagePair().demagnetizingFactors();
    }

    @Override
    public double volume() {
        return magnet.volume();
    }
}
