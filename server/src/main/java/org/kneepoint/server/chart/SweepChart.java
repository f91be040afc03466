package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Rectangle;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.kneepoint.fitter.study.SweepPoint;
import org.kneepoint.server.app.design.SweepRun;

/**
 * The chart of a temperature sweep: B at the operating point (left axis, T) and the irreversible loss (right axis, %)
 * against temperature (°C), with the minimum and maximum working temperatures for the loss limit marked as dashed
 * vertical lines. As SVG or PNG.
 */
public final class SweepChart {

    private static final double ZERO_CELSIUS = 273.15;
    private static final BasicStroke SOLID = new BasicStroke(2.0f);
    private static final BasicStroke DASHED = new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
            new float[] {6f, 4f}, 0f);

    private SweepChart() {
    }

    /** The chart as SVG. */
    public static String svg(String title, SweepRun run, int width, int height) {
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        chart(title, run).draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    /** The chart as PNG. */
    public static byte[] png(String title, SweepRun run, int width, int height) {
        try {
            return ChartUtils.encodeAsPNG(chart(title, run).createBufferedImage(width, height));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot encode the chart as PNG", e);
        }
    }

    private static JFreeChart chart(String title, SweepRun run) {
        XYSeries flux = new XYSeries("B at the operating point (T)", false, true);
        XYSeries loss = new XYSeries("irreversible loss (%)", false, true);
        for (SweepPoint point : run.sweep().points()) {
            flux.add(point.temperature() - ZERO_CELSIUS, point.b());
            loss.add(point.temperature() - ZERO_CELSIUS, 100.0 * point.irreversibleLoss());
        }
        XYPlot plot = new XYPlot(new XYSeriesCollection(flux), new NumberAxis("temperature (°C)"),
                new NumberAxis("flux density B (T)"), renderer(0));
        NumberAxis lossAxis = new NumberAxis("irreversible loss (%)");
        plot.setRangeAxis(1, lossAxis);
        plot.setDataset(1, new XYSeriesCollection(loss));
        plot.setRenderer(1, renderer(1));
        plot.mapDatasetToRangeAxis(1, 1);
        mark(plot, run.sweep().working().minimum().temperature(), "min. working temperature");
        mark(plot, run.sweep().working().maximum().temperature(), "max. working temperature");
        ChartStyle.apply(plot);
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ChartStyle.apply(chart);
        return chart;
    }

    private static XYLineAndShapeRenderer renderer(int colour) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, TemperaturePalette.colour(colour));
        renderer.setSeriesStroke(0, SOLID);
        return renderer;
    }

    private static void mark(XYPlot plot, Double temperature, String label) {
        if (temperature != null) {
            ValueMarker marker = new ValueMarker(temperature - ZERO_CELSIUS, TemperaturePalette.INK, DASHED);
            marker.setLabel(label);
            plot.addDomainMarker(marker);
        }
    }
}
