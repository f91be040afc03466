package org.kneepoint.tests;

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
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Load on the check endpoint, bounded and on loopback only: 8 clients for 30 s (at most 500,000
 * requests), every answer must be 200 with the check's JSON. Throughput and latency percentiles are
 * written to tests/target/load-check.txt for the record; no time is asserted.
 */
@Tag("slow")
class CheckEndpointLoadTest {

    private static final int CLIENTS = 8;
    private static final long DURATION_NANOS = 30_000_000_000L;
    private static final int MAX_REQUESTS = 500_000;

    @Test
    void eight_clients_for_thirty_seconds_get_no_errors(@TempDir Path folder) throws Exception {
        try (RunningServer server = RunningServer.withDemo(folder, null)) {
            URI uri = server.uri("/api/check?grade=DEMO%20NdFeB%2040%2F160&diameter=10mm&length=5mm&temperature=120C"
                    + "&opposingField=100kA%2Fm");
            assertTrue(uri.getHost().equals("127.0.0.1"), "loopback only");
            HttpClient client = HttpClient.newHttpClient();
            AtomicInteger issued = new AtomicInteger();
            long end = System.nanoTime() + DURATION_NANOS;
            ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
            List<Future<long[]>> results = new ArrayList<>();
            for (int c = 0; c < CLIENTS; c++) {
                results.add(pool.submit(() -> {
                    long[] latencies = new long[1 << 16];
                    int count = 0;
                    HttpRequest request = HttpRequest.newBuilder(uri).GET().build();
                    while (System.nanoTime() < end && issued.incrementAndGet() <= MAX_REQUESTS) {
                        long start = System.nanoTime();
                        HttpResponse<String> response = client.send(request, HttpResponse.BodyHandlers.ofString());
                        long took = System.nanoTime() - start;
                        if (response.statusCode() != 200 || !response.body().contains("\"operatingPoint\"")) {
                            throw new AssertionError("answer " + response.statusCode() + ": " + response.body());
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
            String report = String.format(Locale.ROOT, "%d requests by %d clients in %.0f s: %.0f requests/s; latency p50 %.2f ms,"
                    + " p99 %.2f ms, max %.2f ms%n", all.length, CLIENTS, DURATION_NANOS / 1e9, all.length / (DURATION_NANOS / 1e9),
                    all[all.length / 2] / 1e6, all[(int) (all.length * 0.99)] / 1e6, all[all.length - 1] / 1e6);
            Files.writeString(Path.of("target", "load-check.txt"), report);
            System.out.print(report);
        }
    }
}
