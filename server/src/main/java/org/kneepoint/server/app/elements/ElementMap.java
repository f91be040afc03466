package org.kneepoint.server.app.elements;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.WorstElement;

/**
 * The elements of a check as a map draws them: at most {@code maxDots} of them, so that a map of 10⁶ elements stays
 * small. Every one of the worst elements is kept; then every element that passed the knee, or when they are more
 * than there is room for, an even sample of them (every k-th in the files' order); then an even sample of the rest
 * in the room left. The sample depends only on the files, so the same check draws the same map. The dots are in
 * drawing order, largest margin first, so the elements nearest or past the knee lie on top.
 *
 * @param elements         how many elements the check judged
 * @param pastKnee         how many of them passed the knee in some load case
 * @param drawnPastKnee    how many of those are drawn
 * @param positions        the drawn elements' positions, m: {@code positions[axis][dot]}
 * @param margins          their knee margins, A/m (NaN where the curve has no knee)
 * @param worst            the worst elements, worst first (all drawn, marked and numbered from 1)
 */
public record ElementMap(int elements, int pastKnee, int drawnPastKnee, double[][] positions, double[] margins,
        List<WorstElement> worst) {

    /** How many dots a map draws at most. */
    public static final int MAX_DOTS = 12_000;

    public ElementMap {
        positions = new double[][] {positions[0].clone(), positions[1].clone(), positions[2].clone()};
        margins = margins.clone();
        worst = List.copyOf(worst);
    }

    /** How many dots the map draws. */
    public int drawn() {
        return margins.length;
    }

    /** Whether some elements were left out of the drawing. */
    public boolean thinned() {
        return drawn() < elements;
    }

    /** The map of a check that ran, at most {@code maxDots} dots. */
    public static ElementMap of(ElementCheckRun run, int maxDots) {
        return of(run.files().get(0).field(), run.result(), maxDots);
    }

    /** The map of {@code result}, the positions from {@code first} (the first load case's table). */
    public static ElementMap of(ElementField first, ElementCheckResult result, int maxDots) {
        int n = result.elements();
        boolean[] worst = new boolean[n];
        result.worstElements().forEach(element -> worst[element.index()] = true);
        int pastKnee = 0;
        for (int i = 0; i < n; i++) {
            pastKnee += result.pastKnee(i) && !worst[i] ? 1 : 0;
        }
        int room = Math.max(0, maxDots - result.worstElements().size());
        int pastKneeStride = stride(pastKnee, room);
        int pastKneeDrawn = pastKnee == 0 || pastKneeStride == 0 ? 0 : (pastKnee + pastKneeStride - 1) / pastKneeStride;
        int others = n - pastKnee - result.worstElements().size();
        int otherStride = stride(others, room - pastKneeDrawn);
        List<Integer> chosen = new ArrayList<>();
        int seenPastKnee = 0;
        int seenOther = 0;
        int drawnWorstPastKnee = 0;
        for (int i = 0; i < n; i++) {
            if (worst[i]) {
                chosen.add(i);
                drawnWorstPastKnee += result.pastKnee(i) ? 1 : 0;
            } else if (result.pastKnee(i)) {
                if (pastKneeStride > 0 && seenPastKnee++ % pastKneeStride == 0) {
                    chosen.add(i);
                }
            } else if (otherStride > 0 && seenOther++ % otherStride == 0) {
                chosen.add(i);
            }
        }
        Integer[] order = chosen.toArray(Integer[]::new);
        Arrays.sort(order, (a, b) -> Double.compare(key(result.margin(b)), key(result.margin(a))));
        double[][] positions = new double[3][order.length];
        double[] margins = new double[order.length];
        for (int k = 0; k < order.length; k++) {
            for (int axis = 0; axis < 3; axis++) {
                positions[axis][k] = first.position(order[k], axis);
            }
            margins[k] = result.margin(order[k]);
        }
        return new ElementMap(n, pastKnee + drawnWorstPastKnee, pastKneeDrawn + drawnWorstPastKnee, positions, margins,
                result.worstElements());
    }

    /** Every how many of {@code count} elements one is drawn to fill at most {@code room} dots; 0 when there is no room. */
    private static int stride(int count, int room) {
        if (count <= 0) {
            return 1;
        }
        return room <= 0 ? 0 : (count + room - 1) / room;
    }

    /** A margin for the drawing order: one without a knee is drawn first, under the rest. */
    private static double key(double margin) {
        return Double.isNaN(margin) ? Double.POSITIVE_INFINITY : margin;
    }
}
