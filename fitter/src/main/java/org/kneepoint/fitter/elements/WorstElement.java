package org.kneepoint.fitter.elements;

/**
 * One of the elements that fare worst, at the point that set its recoil line: the case of its largest loss (of
 * equal losses, the one nearest the knee).
 *
 * @param index     the element's place in the tables, from 0
 * @param x         position, m (from the first table)
 * @param y         position, m
 * @param z         position, m
 * @param hParallel H along the magnetization at that point, A/m
 * @param margin    H − H_knee at that point, A/m (the field the rule makes act, {@link TransverseRule}); null without a knee
 * @param loss      the element's irreversible loss after every case, a fraction of Br
 */
public record WorstElement(int index, double x, double y, double z, double hParallel, Double margin, double loss) {
}
