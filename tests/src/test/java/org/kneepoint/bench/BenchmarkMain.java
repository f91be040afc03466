package org.kneepoint.bench;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs the JMH benchmarks whose names match the pattern and prints, as its last line, one JSON
 * object mapping each benchmark's short name to the median of its measurement iterations in
 * seconds per operation.
 */
public final class BenchmarkMain {

    private BenchmarkMain() {
    }

    public static void main(String[] args) throws RunnerException {
        String pattern = args.length > 0 ? args[0] : "org\\.kneepoint\\.bench\\..*";
        Collection<RunResult> results = new Runner(new OptionsBuilder().include(pattern).build()).run();
        Map<String, Double> medians = new LinkedHashMap<>();
        for (RunResult result : results) {
            String label = result.getParams().getBenchmark().replaceFirst("^org\\.kneepoint\\.bench\\.", "");
            String parameters = result.getParams().getParamsKeys().stream()
                    .map(key -> key + "=" + result.getParams().getParam(key))
                    .collect(java.util.stream.Collectors.joining(","));
            label = parameters.isEmpty() ? label : label + "[" + parameters + "]";
            medians.put(label, medianSeconds(result));
        }
        StringBuilder json = new StringBuilder("{");
        medians.forEach((name, seconds) -> json.append(json.length() > 1 ? ", " : "")
                .append('"').append(name).append("\": ").append(String.format(java.util.Locale.ROOT, "%.6g", seconds)));
        System.out.println(json.append('}'));
    }

    private static double medianSeconds(RunResult result) {
        TimeUnit unit = result.getParams().getTimeUnit();
        double toSeconds = 1.0 / unit.convert(1, TimeUnit.SECONDS);
        double[] scores = result.getBenchmarkResults().stream()
                .flatMap(benchmark -> benchmark.getIterationResults().stream())
                .mapToDouble(iteration -> iteration.getPrimaryResult().getScore())
                .sorted()
                .toArray();
        if (scores.length == 0) {
            return Double.NaN;
        }
        double median = scores.length % 2 == 1 ? scores[scores.length / 2]
                : 0.5 * (scores[scores.length / 2 - 1] + scores[scores.length / 2]);
        return median * toSeconds;
    }

}
