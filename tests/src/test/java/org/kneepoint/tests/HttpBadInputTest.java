package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.kneepoint.server.app.serving.ServerSettings;

class HttpBadInputTest {

    private static final String GRADE = "/api/grades/DEMO%20NdFeB%2042%2F100";

    @TempDir
    static Path folder;

    private static RunningServer server;
    private Map<String, Integer> before;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder, null);
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    @BeforeEach
    void count() {
        before = server.rowCounts();
    }

    @AfterEach
    void nothing_was_written() {
        assertEquals(before, server.rowCounts());
    }

    private static JsonNode error(HttpResponse<String> response, int status, String code) throws IOException {
        assertEquals(status, response.statusCode(), response.body());
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("application/json"));
        JsonNode error = RunningServer.json(response).get("error");
        assertEquals(code, error.get("code").asText());
        assertFalse(error.get("message").asText().isBlank());
        return error;
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        GRADE + "/curve|temperature",
        GRADE + "/curve?temperature=hot|temperature",
        GRADE + "/curve?temperature=-300C|temperature",
        GRADE + "/curve?temperature=1e9K|temperature",
        GRADE + "/export?temperature=20C&points=many|points",
        GRADE + "/export?temperature=20C&points=1|points",
        GRADE + "/export?temperature=20C&points=99999999999|points",
        GRADE + "/export?temperature=20C&format=xml|format",
        GRADE + "/export?temperature=20C&units=imperial|units",
        GRADE + "/export?temperature=20C&shifted=yes|shifted",
        GRADE + "/export?temperature=20C&format=json&bare=true|bare",
        "/api/permeance/cylinder?length=5mm|diameter",
        "/api/permeance/cylinder?diameter=-1mm&length=5mm|diameter",
        "/api/permeance/cylinder?diameter=10kg&length=5mm|diameter",
        "/api/permeance/cylinder?diameter=10mm&length=1e9m|length",
        "/api/permeance/cylinder?diameter=10mm&length=5mm&innerDiameter=12mm|inner",
        "/api/permeance/block?width=20mm&depth=10mm&thickness=5mm&onSteel=maybe|onSteel",
        "/api/permeance/spheroid?diameter=10mm&length=10mm&onSteel=true|onSteel",
        "/api/check?grade=DEMO%20SmCo%2028%2F200&temperature=120C|load line",
        "/api/check?pc=2&temperature=120C|grade",
        "/api/check?pc=many&grade=DEMO%20SmCo%2028%2F200&temperature=120C|pc",
        "/api/check?pc=-1&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C|permeance",
        "/api/check?pc=2&grade=DEMO%20SmCo%2028%2F200&br=1.3T&temperature=120C|not both",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&lossLimit=1|lossLimit",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&alpha=-0.12|alpha",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&opposingField=-5kA%2Fm|opposing field",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1e99A%2Fm&temperature=120C|hcj",
        "/api/check?diameter=10mm&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C|length",
        "/api/check?diameter=10mm&length=5mm&factor=worst&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C|factor",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&tolerance=br%3D%C2%B1|tolerance",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&tolerance=flux%3D1%25|tolerance",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&tolerance=br%3D%C2%B11%25&samples=1|samples",
        "/api/check?pc=2&br=1.3T&muRec=1.05&hcj=1600kA%2Fm&temperature=120C&tolerance=br%3D%C2%B11%25&distribution=flat|distribution",
        "/api/select?pc=2|temperature",
        "/api/select?pc=2&temperature=100C&sort=cost|sort",
        "/api/select?pc=2&temperature=100C&minFluxDensity=1kg|minFluxDensity",
        "/api/select?pc=2&temperature=100C&maxLoss=150%25|loss",
        "/api/field/cylinder?diameter=10mm&length=5mm&br=1.3T|at",
        "/api/field/cylinder?diameter=10mm&length=5mm&br=1.3T&at=1,2mm|at",
        "/api/field/cylinder?diameter=10mm&length=5mm&br=1.3T&at=1,2,3|at",
        "/api/field/ring?diameter=10mm&length=5mm&br=1.3T&at=1,2,3mm|innerDiameter",
        "/api/field/block?width=10mm&depth=8mm&thickness=4mm&at=1,2,3mm|br",
    })
    void bad_query_parameters_are_bad_input_naming_the_parameter(String request, String named) throws Exception {
        JsonNode error = error(server.get(request), 400, "BAD_INPUT");
        assertTrue(error.get("message").asText().toLowerCase().contains(named.toLowerCase()), error.toString());
    }

    @Test
    void an_unknown_grade_is_not_found() throws Exception {
        error(server.get("/api/grades/No%20Such%20Grade"), 404, "NOT_FOUND");
        error(server.get("/api/grades/No%20Such%20Grade/curve?temperature=20C"), 404, "NOT_FOUND");
        error(server.get("/api/grades/No%20Such%20Grade/export?temperature=20C"), 404, "NOT_FOUND");
        error(server.get("/grades/No%20Such%20Grade"), 404, "NOT_FOUND");
        error(server.get("/api/check?grade=No%20Such%20Grade&pc=2&temperature=20C"), 404, "NOT_FOUND");
        error(server.get("/api/materials/No%20Such%20Material"), 404, "NOT_FOUND");
    }

    @Test
    void an_unknown_route_is_not_found_as_json() throws Exception {
        error(server.get("/api/nothing-here"), 404, "NOT_FOUND");
    }

    @Test
    void an_import_without_a_file_is_bad_input() throws Exception {
        error(server.upload("/api/import", Map.of(), Map.of("note", "no file")), 400, "BAD_INPUT");
    }

    @Test
    void an_import_of_a_file_without_its_grade_names_the_file_and_writes_nothing() throws Exception {
        String curve = "# family: sintered NdFeB\n# temperature: 20 C\nH [kA/m],J [T]\n0,1.2\n-900,1.1\n-1100,0\n";
        JsonNode error = error(server.upload("/api/import", Map.of("no-grade.csv", curve), Map.of()), 400, "BAD_INPUT");
        assertTrue(error.get("message").asText().contains("no-grade.csv"), error.toString());
    }

    @Test
    void an_import_whose_second_file_is_broken_stores_neither() throws Exception {
        String good = "# grade: Invented Good\n# family: sintered NdFeB\n# temperature: 20 C\nH [kA/m],J [T]\n0,1.2\n-900,1.1\n-1100,0\n";
        String broken = "# grade: Invented Broken\n# family: sintered NdFeB\n# temperature: 20 C\nH [kA/m],J [T]\n0,1.2\n-900,abc\n";
        JsonNode error = error(server.upload("/api/import", Map.of("good.csv", good, "broken.csv", broken), Map.of()), 400, "BAD_INPUT");
        assertTrue(error.get("message").asText().contains("broken.csv"), error.toString());
    }

    @Test
    void an_oversize_streamed_upload_is_refused_as_too_large() throws Exception {
        String boundary = "kneepoint-oversize";
        byte[] head = ("--" + boundary + "\r\nContent-Disposition: form-data; name=\"file\"; filename=\"big.csv\"\r\n\r\n")
                .getBytes(StandardCharsets.UTF_8);
        byte[] tail = ("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8);
        long zeros = ServerSettings.MAX_UPLOAD_BYTES + 1024;
        HttpResponse<String> response = server.post("/api/import", HttpRequest.BodyPublishers.ofInputStream(() -> new SequenceInputStream(
                Collections.enumeration(List.of(new ByteArrayInputStream(head), new ZeroStream(zeros), new ByteArrayInputStream(tail))))),
                "multipart/form-data; boundary=" + boundary);
        error(response, 413, "TOO_LARGE");
    }

    /** {@code length} zero bytes, without holding them in memory. */
    private static final class ZeroStream extends InputStream {
        private long left;

        ZeroStream(long length) {
            left = length;
        }

        @Override
        public int read() {
            return left-- > 0 ? 0 : -1;
        }

        @Override
        public int read(byte[] buffer, int offset, int length) {
            if (left <= 0) {
                return -1;
            }
            int count = (int) Math.min(length, left);
            Arrays.fill(buffer, offset, offset + count, (byte) 0);
            left -= count;
            return count;
        }
    }

    @Test
    void an_oversize_body_is_refused_before_it_is_read() throws Exception {
        HttpResponse<String> response = server.post("/api/import", HttpRequest.BodyPublishers.ofByteArray(new byte[100 * 1024]),
                "application/octet-stream");
        error(response, 413, "TOO_LARGE");
    }
}
