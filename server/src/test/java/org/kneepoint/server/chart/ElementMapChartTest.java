package org.kneepoint.server.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.elements.ElementCheck;
import org.kneepoint.fitter.elements.ElementCheckResult;
import org.kneepoint.fitter.elements.ElementField;
import org.kneepoint.fitter.elements.ElementSettings;
import org.kneepoint.fitter.elements.GivenField;
import org.kneepoint.fitter.loadline.LinearRecoilKnee;
import org.kneepoint.fitter.loadline.LinearTemperatureLaw;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;

class ElementMapChartTest {

    /** Invented: Br 1.3 T, μrec 1.05, HcJ 1600 kA/m, Hk 1450 kA/m at 20 °C, α −0.12 %/K, β −0.6 %/K. */
    private static final LinearTemperatureLaw GRADE = LinearTemperatureLaw.ofPercentPerKelvin(
            LinearRecoilKnee.withKneeField(1.3, 1.05, 1.6e6, 1.45e6), -0.12, -0.6, LinearTemperatureLaw.DEFAULT_REFERENCE_TEMPERATURE);

    /** A block of {@code n} elements on a grid whose opposing field grows towards one corner, past the knee there. */
    private static ElementField block(int n) {
        ElementField.Builder builder = ElementField.builder("invented block", GivenField.FIELD_STRENGTH, false, false);
        int side = (int) Math.ceil(Math.cbrt(n));
        for (int i = 0; i < n; i++) {
            double x = (i % side) * 1e-4;
            double y = (i / side % side) * 1e-4;
            double z = (double) (i / side / side) * 1e-4;
            double corner = (x + y + z) / (3 * (side - 1) * 1e-4);
            builder.add(0, x, y, z, 0, 0, -(1.0e6 + 0.6e6 * corner * corner * corner), 1e-12, 0, 0, 1, 0);
        }
        return builder.build();
    }

    private static ElementCheckResult check(ElementField field) {
        return ElementCheck.run(GRADE, List.of(field), ElementSettings.alongZ(293.15, 0.01));
    }

    @Test
    void a_million_elements_draw_at_most_twelve_thousand_dots_in_under_a_megabyte() {
        ElementField field = block(1_000_000);
        ElementCheckResult result = check(field);
        ElementMap map = ElementMap.of(field, result, ElementMap.MAX_DOTS);
        assertEquals(1_000_000, map.elements());
        assertTrue(map.drawn() <= ElementMap.MAX_DOTS && map.drawn() > ElementMap.MAX_DOTS / 2 + 1, "drawn " + map.drawn());
        assertTrue(map.pastKnee() > 0 && map.pastKnee() < map.elements(), "past the knee " + map.pastKnee());
        for (MapPlane plane : MapPlane.values()) {
            String svg = ElementMapChart.svg("Knee margin", map, plane, 960, 640);
            int bytes = svg.getBytes(StandardCharsets.UTF_8).length;
            assertTrue(bytes < 1_000_000, plane + ": " + bytes + " bytes");
            int squares = count(svg, "Z");
            assertTrue(squares >= map.drawn() && squares < map.drawn() + 50, "one closed square per dot: " + squares);
        }
    }

    @Test
    void every_element_past_the_knee_is_drawn_when_there_is_room_and_the_worst_always() {
        ElementField field = block(50_000);
        ElementCheckResult result = check(field);
        ElementMap map = ElementMap.of(field, result, 5_000);
        int pastKnee = 0;
        for (int i = 0; i < result.elements(); i++) {
            pastKnee += result.pastKnee(i) ? 1 : 0;
        }
        assertTrue(pastKnee > 10 && pastKnee < 5_000, "past the knee " + pastKnee);
        assertEquals(pastKnee, map.pastKnee());
        assertEquals(pastKnee, map.drawnPastKnee());
        assertTrue(map.drawn() <= 5_000);
        double[] margins = map.margins();
        int drawnPastKnee = 0;
        for (int k = 0; k < margins.length; k++) {
            drawnPastKnee += margins[k] < 0 ? 1 : 0;
            if (k > 0) {
                assertTrue(margins[k] <= margins[k - 1], "largest margin drawn first, the worst on top");
            }
        }
        assertEquals(pastKnee, drawnPastKnee);
        assertEquals(ElementMap.of(field, result, 5_000).margins().length, map.drawn(), "the same sample every time");
        assertEquals(10, map.worst().size());
        assertEquals(result.worstElements().get(0).margin(), margins[margins.length - 1], 0.0);
    }

    @Test
    void a_small_check_draws_every_element_with_its_scale_and_numbered_rings() {
        ElementField field = block(27);
        ElementMap map = ElementMap.of(field, check(field), ElementMap.MAX_DOTS);
        assertEquals(27, map.drawn());
        String svg = ElementMapChart.svg("Knee margin", map, MapPlane.XZ, 960, 640);
        assertTrue(svg.contains("knee margin (kA/m)"), "the scale's title");
        assertTrue(svg.contains(">x (mm)<") && svg.contains(">z (mm)<"), "the plane's axes");
        assertTrue(svg.contains("worst elements, numbered as in the table"), "the legend of the rings");
        assertTrue(svg.contains(">10<"), "the tenth worst element's number");
    }

    private static int count(String text, String part) {
        Matcher matcher = Pattern.compile(Pattern.quote(part)).matcher(text);
        int count = 0;
        while (matcher.find()) {
            count++;
        }
        return count;
    }
}
