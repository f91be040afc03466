package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.kneepoint.fitter.elements.WorstElement;
import org.kneepoint.server.app.elements.ElementMap;
import org.kneepoint.server.app.elements.MapPlane;

/**
 * The element map of an element check: each drawn element a dot at its position projected onto the chosen plane
 * (millimetres, one scale on both axes), coloured by its knee margin with the scale in kA/m beside it
 * ({@link MarginPalette}), the worst elements ringed and numbered as in the results' table. Coordinates are written
 * to 0.1 px and the dots of one colour step are one path ({@link DotRenderer}), so a dot costs about 60 bytes and
 * the {@value ElementMap#MAX_DOTS} dots of {@link ElementMap} stay under 1 MB.
 */
public final class ElementMapChart {

    private static final double MILLI = 1000.0;
    private static final double KILO = 1000.0;
    /** The side of a dot, px: larger for few dots, 4 px from {@value #SMALL_FROM} dots on. */
    private static final double DOT = 4.0;
    private static final int SMALL_FROM = 5_000;
    /** How much wider a ring is than a dot, px. */
    private static final double RING = 9.0;
    /** The room the axes, title, legend and scale take around the plot, px (for one scale on both axes). */
    private static final int SIDE_ROOM = 230;
    private static final int TOP_AND_BOTTOM_ROOM = 140;

    private ElementMapChart() {
    }

    /** The map of {@code map} projected onto {@code plane}, {@code title} above it, as SVG. */
    public static String svg(String title, ElementMap map, MapPlane plane, int width, int height) {
        int across = plane.horizontal();
        int up = plane.vertical();
        MarginPalette palette = palette(map.margins());
        DefaultXYZDataset dots = new DefaultXYZDataset();
        double[] h = scaled(map.positions()[across], MILLI);
        double[] v = scaled(map.positions()[up], MILLI);
        dots.addSeries("elements", new double[][] {h, v, scaled(map.margins(), 1.0 / KILO)});
        NumberAxis x = new NumberAxis(MapPlane.axis(across) + " (mm)");
        NumberAxis y = new NumberAxis(MapPlane.axis(up) + " (mm)");
        sameScale(x, y, h, v, width - SIDE_ROOM, height - TOP_AND_BOTTOM_ROOM);
        double dot = map.drawn() < 500 ? 2.5 * DOT : map.drawn() < SMALL_FROM ? 1.5 * DOT : DOT;
        Rings rings = rings(map.worst(), across, up);
        XYPlot plot = new XYPlot(rings.data(), x, y, ringRenderer(rings.labels(), dot));
        plot.setDataset(1, dots);
        plot.setRenderer(1, new DotRenderer(palette, dot));
        ChartStyle.apply(plot);
        plot.setDomainZeroBaselineVisible(false);
        plot.setRangeZeroBaselineVisible(false);
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ChartStyle.apply(chart);
        chart.addSubtitle(scale(palette));
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        graphics.setGeomDoubleConverter(value -> String.format(Locale.ROOT, "%.1f", value));
        chart.draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    private static double[] scaled(double[] values, double factor) {
        double[] scaled = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            scaled[i] = values[i] * factor;
        }
        return scaled;
    }

    /** The smallest and largest margin (kA/m), widened to 1 kA/m about a single value; 0 to 1 when no element has one. */
    private static MarginPalette palette(double[] margins) {
        double lower = Double.POSITIVE_INFINITY;
        double upper = Double.NEGATIVE_INFINITY;
        for (double margin : margins) {
            if (!Double.isNaN(margin)) {
                lower = Math.min(lower, margin / KILO);
                upper = Math.max(upper, margin / KILO);
            }
        }
        if (lower > upper) {
            return new MarginPalette(0.0, 1.0);
        }
        if (upper - lower < 1e-9 * Math.max(1.0, Math.abs(upper))) {
            return new MarginPalette(lower - 0.5, upper + 0.5);
        }
        return new MarginPalette(lower, upper);
    }

    /** Ranges about the points with one millimetre the same length across and up, in a plot of about {@code w} × {@code h} px. */
    private static void sameScale(NumberAxis x, NumberAxis y, double[] across, double[] up, int w, int h) {
        double[] xr = range(across);
        double[] yr = range(up);
        double perPixel = Math.max((xr[1] - xr[0]) / w, (yr[1] - yr[0]) / h) * 1.08;
        if (!(perPixel > 0)) {
            perPixel = 2.0 / Math.min(w, h);
        }
        double xMid = (xr[0] + xr[1]) / 2;
        double yMid = (yr[0] + yr[1]) / 2;
        x.setRange(xMid - perPixel * w / 2, xMid + perPixel * w / 2);
        y.setRange(yMid - perPixel * h / 2, yMid + perPixel * h / 2);
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
    }

    private static double[] range(double[] values) {
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (double value : values) {
            low = Math.min(low, value);
            high = Math.max(high, value);
        }
        return low > high ? new double[] {-1, 1} : new double[] {low, high};
    }

    /**
     * The worst elements' places on the plane, one ring per place: elements stacked along the axis left out share a
     * ring, labelled with all their ranks ("1, 2").
     */
    private static Rings rings(List<WorstElement> worst, int across, int up) {
        XYSeries series = new XYSeries("worst elements, numbered as in the table", false, true);
        List<String> labels = new ArrayList<>();
        int rank = 1;
        for (WorstElement element : worst) {
            double[] position = {element.x(), element.y(), element.z()};
            double h = position[across] * MILLI;
            double v = position[up] * MILLI;
            int same = -1;
            for (int i = 0; i < series.getItemCount() && same < 0; i++) {
                if (series.getX(i).doubleValue() == h && series.getY(i).doubleValue() == v) {
                    same = i;
                }
            }
            if (same < 0) {
                series.add(h, v, false);
                labels.add(Integer.toString(rank++));
            } else {
                labels.set(same, labels.get(same) + ", " + rank++);
            }
        }
        return new Rings(new XYSeriesCollection(series), labels);
    }

    /** The rings of the worst elements and the label of each. */
    private record Rings(XYSeriesCollection data, List<String> labels) {
    }

    private static XYLineAndShapeRenderer ringRenderer(List<String> labels, double dot) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        double ring = dot + RING;
        renderer.setSeriesShape(0, new Ellipse2D.Double(-ring / 2, -ring / 2, ring, ring));
        renderer.setSeriesShapesFilled(0, false);
        renderer.setUseOutlinePaint(false);
        renderer.setSeriesPaint(0, FieldPalette.OUTLINE);
        renderer.setSeriesStroke(0, new BasicStroke(2.2f));
        renderer.setDefaultItemLabelGenerator((dataset, series, item) -> labels.get(item));
        renderer.setDefaultItemLabelsVisible(true);
        renderer.setDefaultItemLabelFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
        renderer.setDefaultItemLabelPaint(TemperaturePalette.INK);
        renderer.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE1, TextAnchor.BOTTOM_LEFT));
        renderer.setDefaultNegativeItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE1, TextAnchor.BOTTOM_LEFT));
        return renderer;
    }


    private static PaintScaleLegend scale(MarginPalette palette) {
        NumberAxis axis = new NumberAxis("knee margin (kA/m), negative past the knee");
        axis.setRange(palette.getLowerBound(), palette.getUpperBound());
        ChartStyle.apply(axis);
        PaintScaleLegend legend = new PaintScaleLegend(palette, axis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        legend.setStripWidth(16);
        legend.setSubdivisionCount(MarginPalette.LEVELS);
        legend.setMargin(8, 8, 40, 16);
        legend.setBackgroundPaint(Color.WHITE);
        return legend;
    }
}
