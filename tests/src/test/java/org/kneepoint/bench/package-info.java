/**
 * JMH benchmarks of the computations that have speed targets in the issues. Run them with
 * {@code tests/bench [PATTERN]}, which prints last one JSON object mapping each benchmark's name
 * to its median seconds per operation. Nothing here runs during {@code tests/run}.
 */
package org.kneepoint.bench;
