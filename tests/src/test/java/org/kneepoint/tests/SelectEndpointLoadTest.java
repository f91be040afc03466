package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.IntFunction;
import java.util.function.Predicate;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.db.DatabaseLocation;

/**
 * Load on {@code /api/select} and {@code /api/check} over a library of 1,000 generated invented grades, on loopback
 * only: the first selection (which computes every grade's model) is timed on its own, then 8 clients for 15 s on
 * each route, once repeating one request (answered from the kept results) and once cycling through 100 distinct
 * requests (more than the server keeps, so each is computed on the kept models); every answer must be 200 with the
 * route's JSON. The numbers are written to
 * tests/target/load-select.txt for the record; no time is asserted.
 */
@Tag("slow")
class SelectEndpointLoadTest {

    private static final int GRADES = 1000;
    private static final int CLIENTS = 8;
    private static final long DURATION_NANOS = 15_000_000_000L;
    private static final int VARIED = 100;
    private static final int MAX_REQUESTS = 500_000;
    private static final String LOAD_LINE = "diameter=10mm&length=5mm&temperature=120C&opposingField=100kA%2Fm";

    @Test
    void eight_clients_select_and_check_over_a_thousand_grades_without_errors(@TempDir Path folder) throws Exception {
        long loading = System.nanoTime();
        try (RunningServer server = RunningServer.over(DatabaseLocation.ofFolder(folder.resolve("library")))) {
            GeneratedGrades.load(server.library, folder.resolve("files"), GRADES, 20261205L);
            assertEquals(GRADES, server.library.reader().grades(null).size());
            String loaded = String.format(Locale.ROOT, "%d generated grades imported in %.1f s%n", GRADES, (System.nanoTime() - loading) / 1e9);
            URI select = server.uri("/api/select?" + LOAD_LINE);
            HttpClient client = HttpClient.newHttpClient();
            long first = System.nanoTime();
            HttpResponse<String> cold = client.send(HttpRequest.newBuilder(select).GET().build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, cold.statusCode(), cold.body());
            assertEquals(GRADES, RunningServer.json(cold).size());
            String firstSelect = String.format(Locale.ROOT, "first /api/select (every grade's model computed): %.0f ms%n",
                    (System.nanoTime() - first) / 1e6);
            String selects = load("/api/select, one request repeated", client, i -> select,
                    body -> body.contains("\"irreversibleLossPercent\""));
            String variedSelects = load("/api/select, " + VARIED + " temperatures in turn", client,
                    i -> server.uri("/api/select?" + variedLoadLine(i)), body -> body.contains("\"irreversibleLossPercent\""));
            String check = "/api/check?grade=" + GeneratedGrades.name(517).replace(" ", "%20") + "&";
            String checks = load("/api/check, one request repeated", client, i -> server.uri(check + LOAD_LINE),
                    body -> body.contains("\"operatingPoint\""));
            String variedChecks = load("/api/check, " + VARIED + " grades and temperatures in turn", client,
                    i -> server.uri("/api/check?grade=" + GeneratedGrades.name(i % GRADES).replace(" ", "%20") + "&" + variedLoadLine(i)),
                    body -> body.contains("\"operatingPoint\""));
            String report = loaded + firstSelect + selects + variedSelects + checks + variedChecks + "machine: " + Runtime.getRuntime().availableProcessors()
                    + " processors, load average before the run " + String.format(Locale.ROOT, "%.1f",
                    java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage()) + "\n";
            Files.writeString(Path.of("target", "load-select.txt"), report);
            System.out.print(report);
        }
    }

    /** The load line at the {@code i}th of {@code VARIED} temperatures (more than the server keeps results of). */
    private static String variedLoadLine(int i) {
        return LOAD_LINE.replace("temperature=120C", "temperature=" + (60 + i % VARIED) + "C");
    }

    /** {@code CLIENTS} clients sending the {@code i}th request in turn for the duration; the throughput and latency percentiles. */
    private static String load(String route, HttpClient client, IntFunction<URI> uri, Predicate<String> expected) throws Exception {
        long end = System.nanoTime() + DURATION_NANOS;
        java.util.concurrent.atomic.AtomicInteger issued = new java.util.concurrent.atomic.AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
        List<Future<long[]>> results = new ArrayList<>();
        for (int c = 0; c < CLIENTS; c++) {
            results.add(pool.submit(() -> {
                long[] latencies = new long[1 << 12];
                int count = 0;
                int number;
                while (System.nanoTime() < end && (number = issued.incrementAndGet()) <= MAX_REQUESTS) {
                    HttpRequest request = HttpRequest.newBuilder(uri.apply(number)).GET().build();
                    long start = System.nanoTime();
                    HttpResponse<String> response = client.send(request, HttpResponse.BodyHandlers.ofString());
                    long took = System.nanoTime() - start;
                    if (response.statusCode() != 200 || !expected.test(response.body())) {
                        throw new AssertionError(route + " answered " + response.statusCode() + ": " + response.body());
                    }
                    if (count == latencies.length) {
                        latencies = Arrays.copyOf(latencies, count * 2);
                    }
                    latencies[count++] = took;
                }
                return Arrays.copyOf(latencies, count);
            }));
        }
        long[] all = new long[0];
        for (Future<long[]> result : results) {
            long[] part = result.get();
            long[] joined = Arrays.copyOf(all, all.length + part.length);
            System.arraycopy(part, 0, joined, all.length, part.length);
            all = joined;
        }
        pool.shutdown();
        Arrays.sort(all);
        assertTrue(all.length > 0, "requests were answered");
        return String.format(Locale.ROOT, "%s: %d requests by %d clients in %.0f s: %.0f requests/s; latency p50 %.2f ms, p99 %.2f ms,"
                + " max %.2f ms%n", route, all.length, CLIENTS, DURATION_NANOS / 1e9, all.length / (DURATION_NANOS / 1e9),
                all[all.length / 2] / 1e6, all[(int) (all.length * 0.99)] / 1e6, all[all.length - 1] / 1e6);
    }
}
