package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.loadline.LoadLine;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.units.MagneticConstant;

/**
 * The operating-point chart of a design check: the grade's B(H) (solid) and J(H) (dashed) at the check's
 * temperature, the load line B = −μ0·Pc·(H + Ha) and a ring at the operating point. H in kA/m, B and J in tesla,
 * from H = 0 to a little beyond the field where J reaches zero. Drawn as SVG.
 */
public final class CheckChart {

    private static final double KILO = 1000.0;
    private static final int SAMPLES = 400;
    private static final BasicStroke SOLID = new BasicStroke(2.0f);
    private static final BasicStroke DASHED = new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
            new float[] {6f, 4f}, 0f);

    private CheckChart() {
    }

    /** The chart of {@code curve} with the load line and its operating point, {@code title} above it, as SVG. */
    public static String svg(String title, IntrinsicCurve curve, LoadLine line, OperatingPoint point, int width, int height) {
        double lowest = 1.1 * Math.min(coercivity(curve), point.h());
        XYSeries b = new XYSeries("B (normal curve)", false, true);
        XYSeries j = new XYSeries("J (intrinsic curve)", false, true);
        XYSeries load = new XYSeries("load line, Pc = " + String.format(java.util.Locale.ROOT, "%.3g", line.pc()), false, true);
        for (int i = 0; i <= SAMPLES; i++) {
            double h = lowest * i / SAMPLES;
            double polarization = curve.j(h);
            b.add(h / KILO, MagneticConstant.MU0 * h + polarization);
            j.add(h / KILO, polarization);
            double onLine = line.fluxDensityAt(h);
            if (onLine >= 0 && onLine <= 1.05 * curve.remanence()) {
                load.add(h / KILO, onLine);
            }
        }
        XYSeries operating = new XYSeries("operating point", false, true);
        operating.add(point.h() / KILO, point.b());
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        add(data, renderer, b, SOLID, 0);
        add(data, renderer, j, DASHED, 0);
        add(data, renderer, load, SOLID, 3);
        add(data, renderer, operating, SOLID, 5);
        renderer.setSeriesLinesVisible(3, false);
        renderer.setSeriesShapesVisible(3, true);
        renderer.setSeriesShape(3, new Ellipse2D.Double(-6, -6, 12, 12));
        renderer.setSeriesShapesFilled(3, false);
        renderer.setSeriesPaint(3, TemperaturePalette.INK);
        NumberAxis field = new NumberAxis("field strength H (kA/m)");
        NumberAxis flux = new NumberAxis("flux density B, polarization J (T)");
        flux.setRange(-0.05 * curve.remanence(), 1.1 * curve.remanence());
        XYPlot plot = new XYPlot(data, field, flux, renderer);
        ChartStyle.apply(plot);
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ChartStyle.apply(chart);
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        chart.draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    /** The (negative) field where J reaches zero, found by widening then halving the bracket. */
    private static double coercivity(IntrinsicCurve curve) {
        double outer = -1e4;
        while (curve.j(outer) > 0 && outer > -1e9) {
            outer *= 2;
        }
        double inner = 0;
        for (int i = 0; i < 60; i++) {
            double middle = 0.5 * (inner + outer);
            if (curve.j(middle) > 0) {
                inner = middle;
            } else {
                outer = middle;
            }
        }
        return outer;
    }

    private static void add(XYSeriesCollection data, XYLineAndShapeRenderer renderer, XYSeries series, BasicStroke stroke, int colour) {
        data.addSeries(series);
        int index = data.getSeriesCount() - 1;
        renderer.setSeriesPaint(index, TemperaturePalette.colour(colour));
        renderer.setSeriesStroke(index, stroke);
    }
}
