/**
 * Design studies (issue 14): tolerance bands on a check's inputs, Monte Carlo over the check, statistics of its
 * outputs, the probability of exceeding the loss limit, the worst corner of the bands and each input's share of the
 * output variance. Every value is SI (T, A/m, m, K); a band is a 3σ process limit (common practice): a normal
 * distribution truncated at the band's ends with 3σ equal to its half-width, or uniform over it on request.
 */
package org.kneepoint.fitter.study;
