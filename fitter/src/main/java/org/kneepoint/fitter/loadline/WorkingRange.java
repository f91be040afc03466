package org.kneepoint.fitter.loadline;

/**
 * The temperatures at which a magnet on its load line stays within a loss limit: the minimum (relevant where
 * the loss grows on cooling, as in hard ferrites whose HcJ falls with temperature, β &gt; 0) and the maximum.
 *
 * @param minimum the lowest working temperature
 * @param maximum the highest working temperature
 */
public record WorkingRange(WorkingLimit minimum, WorkingLimit maximum) {
}
