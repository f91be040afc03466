package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.util.List;
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
import org.kneepoint.fitter.loadline.TemperatureModel;
import org.kneepoint.fitter.loadline.OperatingPoint;
import org.kneepoint.fitter.units.MagneticConstant;
import org.kneepoint.server.app.wording.Temperatures;

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

    /**
     * The grade's B and J curves at each of {@code temperatures} (one colour each), the load line, and a ring at the
     * operating point on each curve, {@code title} above it, as SVG.
     */
    public static String svg(String title, TemperatureModel model, List<Double> temperatures, LoadLine line, int width, int height) {
        List<IntrinsicCurve> curves = temperatures.stream().map(model::at).toList();
        double lowest = 0;
        double top = 0;
        for (IntrinsicCurve curve : curves) {
            lowest = Math.min(lowest, 1.1 * Math.min(coercivity(curve), line.on(curve).h()));
            top = Math.max(top, curve.remanence());
        }
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        XYSeries operating = new XYSeries("operating points", false, true);
        for (int c = 0; c < curves.size(); c++) {
            IntrinsicCurve curve = curves.get(c);
            String at = Temperatures.celsius(temperatures.get(c));
            XYSeries b = new XYSeries("B at " + at, false, true);
            XYSeries j = new XYSeries("J at " + at, false, true);
            for (int i = 0; i <= SAMPLES; i++) {
                double h = lowest * i / SAMPLES;
                double polarization = curve.j(h);
                b.add(h / KILO, MagneticConstant.MU0 * h + polarization);
                j.add(h / KILO, polarization);
            }
            add(data, renderer, b, SOLID, c);
            add(data, renderer, j, DASHED, c);
            OperatingPoint point = line.on(curve);
            operating.add(point.h() / KILO, point.b());
        }
        XYSeries load = new XYSeries("load line, Pc = " + String.format(java.util.Locale.ROOT, "%.3g", line.pc()), false, true);
        for (int i = 0; i <= SAMPLES; i++) {
            double h = lowest * i / SAMPLES;
            double onLine = line.fluxDensityAt(h);
            if (onLine >= 0 && onLine <= 1.05 * top) {
                load.add(h / KILO, onLine);
            }
        }
        add(data, renderer, load, SOLID, 5);
        add(data, renderer, operating, SOLID, 0);
        int rings = data.getSeriesCount() - 1;
        renderer.setSeriesLinesVisible(rings, false);
        renderer.setSeriesShapesVisible(rings, true);
        renderer.setSeriesShape(rings, new Ellipse2D.Double(-6, -6, 12, 12));
        renderer.setSeriesShapesFilled(rings, false);
        renderer.setSeriesPaint(rings, TemperaturePalette.INK);
        NumberAxis field = new NumberAxis("field strength H (kA/m)");
        NumberAxis flux = new NumberAxis("flux density B, polarization J (T)");
        flux.setRange(-0.05 * top, 1.1 * top);
        XYPlot plot = new XYPlot(data, field, flux, renderer);
        ChartStyle.apply(plot);
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ChartStyle.apply(chart);
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        chart.draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    /** The temperatures a check's chart shows: the reference, the check's own and the maximum working one, where the model reaches. */
    public static List<Double> temperaturesOf(TemperatureModel model, double checked, Double maximum) {
        java.util.TreeSet<Double> temperatures = new java.util.TreeSet<>();
        temperatures.add(checked);
        for (Double candidate : new Double[] {model.referenceTemperature(), maximum}) {
            if (candidate != null && candidate >= model.lowestTemperature() && candidate <= model.highestTemperature()
                    && temperatures.stream().allMatch(t -> Math.abs(t - candidate) > 0.5)) {
                temperatures.add(candidate);
            }
        }
        return List.copyOf(temperatures);
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
