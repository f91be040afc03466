package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.Align;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.kneepoint.fitter.field.FieldGrid;
import org.kneepoint.fitter.field.FieldLine;
import org.kneepoint.fitter.field.FieldLineTracer;
import org.kneepoint.fitter.field.FieldMap;
import org.kneepoint.fitter.field.MagnetField;
import org.kneepoint.fitter.shape.MagnetShape;

/**
 * The field chart of a magnet: a map of |B| in tesla over the x–z plane through its centre with a colour scale,
 * field lines followed from seeds spread over the north face (along B) and the south face (against B), and the
 * magnet's section as an outline; axes in millimetres. The map is an image of one pixel per point of a fixed grid
 * of {@value #COLUMNS} × {@value #ROWS}; there are {@value #SEEDS_PER_FACE} lines per pole face; the rest is SVG.
 */
public final class FieldChart {

    static final int COLUMNS = 120;
    static final int ROWS = 90;
    static final int SEEDS_PER_FACE = 12;
    private static final int STEPS_PER_WIDTH = 600;
    private static final double MILLI = 1000.0;

    private FieldChart() {
    }

    /** The chart of the field of {@code shape}, {@code title} above it, as SVG. */
    public static String svg(String title, MagnetShape shape, MagnetField field, int width, int height) {
        MagnetOutline outline = MagnetOutline.of(shape);
        double halfX = 2.5 * Math.max(outline.halfWidth(), outline.halfHeight());
        double halfZ = halfX * ROWS / COLUMNS;
        double cellX = 2 * halfX / COLUMNS;
        double cellZ = 2 * halfZ / ROWS;
        FieldGrid grid = new FieldGrid(-halfX + cellX / 2, halfX - cellX / 2, COLUMNS, -halfZ + cellZ / 2, halfZ - cellZ / 2, ROWS, 0.0);
        FieldPalette palette = new FieldPalette(field.remanence());
        NumberAxis x = new NumberAxis("x (mm), across the magnetization");
        NumberAxis z = new NumberAxis("z (mm), along the magnetization");
        x.setRange(-halfX * MILLI, halfX * MILLI);
        z.setRange(-halfZ * MILLI, halfZ * MILLI);
        FieldGrid bounds = new FieldGrid(-halfX, halfX, 2, -halfZ, halfZ, 2, 0.0);
        XYPlot plot = new XYPlot(lines(field, bounds, outline), x, z, lineRenderer(outline));
        ChartStyle.apply(plot);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setDomainZeroBaselineVisible(false);
        plot.setRangeZeroBaselineVisible(false);
        plot.setBackgroundImage(map(FieldMap.of(field, grid), palette));
        plot.setBackgroundImageAlignment(Align.FIT);
        plot.setBackgroundImageAlpha(1f);
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ChartStyle.apply(chart);
        chart.addSubtitle(scale(palette));
        SVGGraphics2D graphics = new SVGGraphics2D(width, height);
        chart.draw(graphics, new Rectangle(0, 0, width, height));
        return graphics.getSVGDocument();
    }

    /** The map as an image of one pixel per grid point, the highest z on top. */
    private static BufferedImage map(FieldMap values, FieldPalette palette) {
        FieldGrid grid = values.grid();
        BufferedImage image = new BufferedImage(grid.columns(), grid.rows(), BufferedImage.TYPE_INT_RGB);
        for (int row = 0; row < grid.rows(); row++) {
            for (int column = 0; column < grid.columns(); column++) {
                Color colour = (Color) palette.getPaint(values.fluxDensity(column, row).magnitude());
                image.setRGB(column, grid.rows() - 1 - row, colour.getRGB());
            }
        }
        return image;
    }

    /** The outline's rectangles first (one, or two beside a bore), then the field lines. */
    private static XYSeriesCollection lines(MagnetField field, FieldGrid grid, MagnetOutline outline) {
        XYSeriesCollection data = new XYSeriesCollection();
        double a = outline.halfWidth() * MILLI;
        double c = outline.halfHeight() * MILLI;
        double bore = outline.bore() * MILLI;
        data.addSeries(rectangle("magnet (section)", bore == 0 ? -a : bore, a, c));
        if (bore > 0) {
            data.addSeries(rectangle("magnet (other side)", -a, -bore, c));
        }
        FieldLineTracer tracer = new FieldLineTracer(field, grid, (grid.xMax() - grid.xMin()) / STEPS_PER_WIDTH, 4 * STEPS_PER_WIDTH);
        int number = 0;
        for (double seed : outline.seeds(SEEDS_PER_FACE)) {
            data.addSeries(series(++number == 1 ? "field lines" : "field line " + number, tracer.trace(seed, outline.halfHeight(), true)));
            data.addSeries(series("field line " + ++number, tracer.trace(seed, -outline.halfHeight(), false)));
        }
        return data;
    }

    private static XYSeries rectangle(String name, double left, double right, double c) {
        XYSeries series = new XYSeries(name, false, true);
        series.add(left, -c);
        series.add(right, -c);
        series.add(right, c);
        series.add(left, c);
        series.add(left, -c);
        return series;
    }

    private static XYSeries series(String name, FieldLine line) {
        XYSeries series = new XYSeries(name, false, true);
        for (FieldLine.Point point : line.points()) {
            series.add(point.x() * MILLI, point.z() * MILLI, false);
        }
        return series;
    }

    private static XYLineAndShapeRenderer lineRenderer(MagnetOutline outline) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setDefaultPaint(TemperaturePalette.INK);
        renderer.setAutoPopulateSeriesPaint(false);
        renderer.setDefaultStroke(new BasicStroke(1.1f));
        renderer.setAutoPopulateSeriesStroke(false);
        int rectangles = outline.bore() > 0 ? 2 : 1;
        for (int i = 0; i < rectangles; i++) {
            renderer.setSeriesPaint(i, FieldPalette.OUTLINE);
            renderer.setSeriesStroke(i, new BasicStroke(2.4f));
            renderer.setSeriesVisibleInLegend(i, i == 0);
        }
        renderer.setDefaultSeriesVisibleInLegend(false);
        renderer.setSeriesVisibleInLegend(rectangles, true);
        return renderer;
    }

    private static PaintScaleLegend scale(FieldPalette palette) {
        NumberAxis axis = new NumberAxis("|B| (T)");
        axis.setRange(palette.getLowerBound(), palette.getUpperBound());
        ChartStyle.apply(axis);
        PaintScaleLegend legend = new PaintScaleLegend(palette, axis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        legend.setStripWidth(16);
        legend.setMargin(8, 8, 40, 16);
        legend.setBackgroundPaint(Color.WHITE);
        return legend;
    }
}
