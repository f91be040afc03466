package org.kneepoint.server.web;

import java.time.Instant;
import java.util.List;
import org.kneepoint.server.app.elements.ElementCheckDocument;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;
import org.kneepoint.server.chart.ElementMapChart;

/**
 * An element check as one self-contained HTML file for a design review: the inputs, the summary with its verdict, the
 * map of the elements by knee margin in one plane (inline SVG), the worst elements, the load cases, the assumptions,
 * the published source of each method and the cautions. Like {@link CheckReport} it opens offline: the style sheet is
 * inlined and there is no script.
 */
public final class ElementCheckReport {

    private static final int MAP_WIDTH = 960;
    private static final int MAP_HEIGHT = 640;

    private static final List<String> ASSUMPTIONS = List.of(
            "Each element is uniformly magnetized along its direction and judged on its own: the field the solver gives at the"
                    + " element is the field it works in (B = μ0·H + J along the magnetization).",
            "Knee field Hk: where J has fallen to 0.9·Br (IEC 60404-8-1 practice, from memory).",
            "Load cases act in the order of the files; the worst point of each element so far sets its recoil line, as a duty"
                    + " sequence does (linear recoil of slope μ0·(μrec − 1) in J).",
            "The irreversible loss of the magnet is the volume-weighted mean of the elements' losses of remanence.",
            "Transverse field: by default only the component along the magnetization acts; the astroid rule is the documented"
                    + " alternative (docs/element-fields.md).");

    private static final List<String> SOURCES = List.of(
            "Volume average of a magnet's internal field and the magnetometric demagnetizing factor: D.-X. Chen, J. A. Brug,"
                    + " R. B. Goldfarb, IEEE Trans. Magn. 27(4), 3601–3619 (1991).",
            "Astroid switching field of a single domain: E. C. Stoner, E. P. Wohlfarth, Phil. Trans. R. Soc. A 240, 599–642 (1948).",
            "Knee model J(H) = Br + μ0(μrec − 1)H − D·exp(−(H + HcJ)/w) and its temperature model: docs/design.md.");

    private ElementCheckReport() {
    }

    /** The report's contents; {@code map} is SVG markup from the chart library and {@code styleSheet} our own CSS. */
    record View(String version, String madeAt, String inputs, String plane, ElementSection.Tables tables, String map, String note,
            List<String> assumptions, List<String> sources, boolean extrapolated, String styleSheet) {
    }

    /** The report of an element check and its map, drawn in {@code plane}, from the inputs that asked for it. */
    public static String html(ElementCheckDocument document, ElementMap map, MapPlane plane, String inputs, String programVersion) {
        String svg = ElementMapChart.svg("Knee margin of " + map.elements() + " elements, " + plane.label() + " plane", map, plane,
                MAP_WIDTH, MAP_HEIGHT);
        return Templates.render("elementReport.jte", new View(programVersion, Instant.now().toString(), inputs, plane.label(),
                ElementSection.tables(document), svg, ElementSection.note(map), ASSUMPTIONS, SOURCES, document.extrapolated(),
                CheckReport.styleSheet()));
    }
}
