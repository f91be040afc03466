package org.kneepoint.fitter.loadline;

/**
 * The local check of one magnet: how much of its volume works below the knee.
 *
 * @param resolution        cells per edge of the magnet's bounding box
 * @param cells             cells whose centre lies inside the magnet
 * @param fractionBelowKnee share of those cells whose local H along the magnetization lies below the knee field
 * @param averageDemagnetizingField volume average of the demagnetizing field H_z over the cells, A/m (−Nm·M for a free magnet)
 * @param worstField        the lowest local H, A/m
 * @param worstX            x of the worst cell's centre, m
 * @param worstY            y of the worst cell's centre, m
 * @param worstZ            z of the worst cell's centre, m
 * @param worstRegion       where the worst cell lies
 */
public record LocalKneeResult(int resolution, int cells, double fractionBelowKnee, double averageDemagnetizingField, double worstField,
        double worstX, double worstY, double worstZ, MagnetRegion worstRegion) {
}
