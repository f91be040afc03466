package org.kneepoint.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FieldPageTest {

    private static final String CYLINDER = "shape=cylinder&diameter=10mm&length=5mm&br=1.3T";

    @TempDir
    static Path folder;

    private static RunningServer server;

    @BeforeAll
    static void start() {
        server = RunningServer.withDemo(folder, null);
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static HttpResponse<String> get(String path) throws Exception {
        HttpResponse<String> response = server.get(path);
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith(path.startsWith("/charts") ? "image/svg+xml" : "text/html"));
        return response;
    }

    @Test
    void the_empty_page_shows_the_form_and_every_page_links_to_it() throws Exception {
        HttpResponse<String> response = get("/field");
        assertEquals(200, response.statusCode());
        String html = response.body();
        assertTrue(html.contains("<form class=\"design\" method=\"get\" action=\"/field\">"));
        for (String name : new String[] {"shape", "diameter", "length", "innerDiameter", "width", "depth", "thickness", "br"}) {
            assertTrue(html.contains("name=\"" + name + "\""), name);
        }
        assertTrue(html.contains("<a href=\"/field\" aria-current=\"page\">Field</a>"));
        assertFalse(html.contains("/charts/field.svg"));
        assertTrue(get("/check").body().contains("<a href=\"/field\">Field</a>"));
    }

    @Test
    void a_sent_form_shows_the_magnet_and_links_the_chart_with_the_same_parameters() throws Exception {
        String html = get("/field?" + CYLINDER).body();
        assertTrue(html.contains("Field of a cylinder D = 10 mm, L = 5 mm, Br = 1.300 T"), html);
        assertTrue(html.contains("src=\"/charts/field.svg?" + CYLINDER.replace("&", "&amp;") + "\""));
        assertTrue(html.contains("value=\"10mm\""));
        String ring = get("/field?shape=ring&diameter=20mm&innerDiameter=8mm&length=6mm&br=1.2T").body();
        assertTrue(ring.contains("Field of a ring D = 20 mm, Di = 8 mm, L = 6 mm"), ring);
    }

    @Test
    void the_chart_has_axes_in_millimetres_a_colour_scale_in_tesla_and_a_legend() throws Exception {
        for (String query : new String[] {CYLINDER, "shape=ring&diameter=20mm&innerDiameter=8mm&length=6mm&br=1.2T",
                "shape=block&width=20mm&depth=10mm&thickness=4mm&br=0.4T"}) {
            HttpResponse<String> chart = get("/charts/field.svg?" + query);
            assertEquals(200, chart.statusCode(), chart.body());
            String svg = chart.body();
            assertTrue(svg.startsWith("<svg") || svg.startsWith("<?xml"));
            assertTrue(svg.contains("x (mm), across the magnetization"));
            assertTrue(svg.contains("z (mm), along the magnetization"));
            assertTrue(svg.contains("|B| (T)"));
            assertTrue(svg.contains("field lines"));
            assertTrue(svg.contains("magnet (section)"));
        }
    }

    @Test
    void bad_input_gives_a_400_page_naming_the_problem() throws Exception {
        Map<String, String> cases = Map.of(
                "shape=cylinder&diameter=-10mm&length=5mm&br=1.3T", "query parameter 'diameter'",
                "shape=cylinder&diameter=10mm&length=5mm", "query parameter 'br'",
                "shape=sphere&diameter=10mm&length=5mm&br=1.3T", "expected one of cylinder, ring, block",
                "diameter=10mm&length=5mm&br=1.3T", "query parameter 'shape'",
                "shape=cylinder&diameter=10mm&length=50m&br=1.3T", "length/diameter");
        for (Map.Entry<String, String> bad : cases.entrySet()) {
            HttpResponse<String> response = get("/field?" + bad.getKey());
            assertEquals(400, response.statusCode(), bad.getKey());
            assertTrue(response.body().contains("role=\"alert\""), bad.getKey());
            assertTrue(response.body().contains(bad.getValue()), bad.getKey() + ": " + response.body());
            assertFalse(response.body().contains("/charts/field.svg"));
            assertEquals(400, server.get("/charts/field.svg?" + bad.getKey()).statusCode(), bad.getKey());
        }
    }
}
