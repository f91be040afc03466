package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.util.Comparator;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.kneepoint.fitter.curve.Characterization;
import org.kneepoint.fitter.curve.CurveCharacterizer;
import org.kneepoint.fitter.curve.CurveKind;
import org.kneepoint.fitter.curve.DemagnetizationCurve;
import org.kneepoint.fitter.library.LibraryCurve;
import org.kneepoint.server.app.wording.Temperatures;

/**
 * The demagnetization chart of a grade: B(H) solid and J(H) dashed at every stored temperature,
 * one colour per temperature, a ring on each J curve at its knee (H = −Hk, J = 0.9·Br). H in kA/m
 * on the horizontal axis, B and J in tesla on the vertical one, from just below 0 (where B crosses
 * zero at −HcB) to the highest value. Drawn as SVG.
 */
public final class GradeChart {

    private static final double KILO = 1000.0;
    private static final BasicStroke SOLID = new BasicStroke(2.0f);
    private static final BasicStroke DASHED = new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
            new float[] {6f, 4f}, 0f);

    private GradeChart() {
    }

    /**
     * The chart of these curves as an SVG document of the given size in pixels: the second quadrant of the normal and
     * intrinsic curves, or, for a grade that has only loops, the whole loops.
     */
    public static String svg(String grade, List<LibraryCurve> curves, int width, int height) {
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        chart(grade, curves).draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    /** The same chart as PNG bytes. */
    public static byte[] png(String grade, List<LibraryCurve> curves, int width, int height) {
        try {
            return org.jfree.chart.ChartUtils.encodeAsPNG(chart(grade, curves).createBufferedImage(width, height));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException("cannot encode the chart as PNG", e);
        }
    }

    private static JFreeChart chart(String grade, List<LibraryCurve> curves) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        XYSeries knees = new XYSeries("knee (J = 0.9·Br)", false, true);
        List<DemagnetizationCurve> usable = curves.stream().map(LibraryCurve::curve).filter(c -> c.kind() != CurveKind.LOOP)
                .sorted(Comparator.comparing(DemagnetizationCurve::temperatureK)).toList();
        int colourIndex = 0;
        for (DemagnetizationCurve curve : usable) {
            Color colour = TemperaturePalette.colour(colourIndex++);
            String at = Temperatures.celsius(curve.temperatureK());
            add(data, renderer, series("B at " + at, curve.h(), curve.b()), colour, SOLID);
            add(data, renderer, series("J at " + at, curve.h(), curve.j()), colour, DASHED);
            Characterization characterization = CurveCharacterizer.characterize(curve);
            if (characterization.hk() != null) {
                knees.add(-characterization.hk() / KILO, Characterization.KNEE_FRACTION * characterization.br());
            }
        }
        if (!knees.isEmpty()) {
            data.addSeries(knees);
            int index = data.getSeriesCount() - 1;
            renderer.setSeriesLinesVisible(index, false);
            renderer.setSeriesShapesVisible(index, true);
            renderer.setSeriesShape(index, new Ellipse2D.Double(-5, -5, 10, 10));
            renderer.setSeriesShapesFilled(index, false);
            renderer.setSeriesPaint(index, TemperaturePalette.INK);
            renderer.setSeriesStroke(index, SOLID);
        }
        List<DemagnetizationCurve> loops = curves.stream().map(LibraryCurve::curve).filter(c -> c.kind() == CurveKind.LOOP)
                .sorted(Comparator.comparing(DemagnetizationCurve::temperatureK)).toList();
        if (usable.isEmpty()) {
            for (DemagnetizationCurve loop : loops) {
                add(data, renderer, series("B loop at " + Temperatures.celsius(loop.temperatureK()), loop.h(), loop.b()),
                        TemperaturePalette.colour(colourIndex++), SOLID);
            }
        }
        NumberAxis field = new NumberAxis("field strength H (kA/m)");
        NumberAxis flux = new NumberAxis("flux density B, polarization J (T)");
        field.setAutoRangeIncludesZero(true);
        if (!usable.isEmpty()) {
            double top = top(usable);
            flux.setRange(-0.05 * top, 1.08 * top);
        }
        XYPlot plot = new XYPlot(data, field, flux, renderer);
        ChartStyle.apply(plot);
        JFreeChart chart = new JFreeChart(grade, ChartStyle.TITLE_FONT, plot, true);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.RIGHT);
        ChartStyle.apply(chart);
        return chart;
    }

    /** The highest B or J of the curves: the flux axis shows the second quadrant up to it (B below 0 is left out). */
    private static double top(List<DemagnetizationCurve> curves) {
        double top = 0.1;
        for (DemagnetizationCurve curve : curves) {
            for (double value : curve.b()) {
                top = Math.max(top, value);
            }
            for (double value : curve.j()) {
                top = Math.max(top, value);
            }
        }
        return top;
    }

    private static XYSeries series(String key, double[] h, double[] values) {
        XYSeries series = new XYSeries(key, false, true);
        for (int i = 0; i < h.length; i++) {
            series.add(h[i] / KILO, values[i]);
        }
        return series;
    }

    private static void add(XYSeriesCollection data, XYLineAndShapeRenderer renderer, XYSeries series, Color colour, BasicStroke stroke) {
        data.addSeries(series);
        int index = data.getSeriesCount() - 1;
        renderer.setSeriesPaint(index, colour);
        renderer.setSeriesStroke(index, stroke);
    }
}
