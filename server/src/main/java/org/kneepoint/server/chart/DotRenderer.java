package org.kneepoint.server.chart;

import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.LinkedHashMap;
import java.util.Map;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.AbstractXYItemRenderer;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.data.xy.XYDataset;
import org.jfree.data.xy.XYZDataset;

/**
 * Square dots of an XYZ dataset coloured by z through a paint scale, gathered into one path per colour and filled
 * once each after the last item, in the order the colours first appear (so later dots lie on top). A scatter drawn
 * a dot at a time writes a styled group per dot into SVG; this writes one, which keeps a map of many dots small.
 */
final class DotRenderer extends AbstractXYItemRenderer {

    private static final long serialVersionUID = 1L;

    private final transient PaintScale scale;
    private final double size;
    private final transient Map<Paint, Path2D> byPaint = new LinkedHashMap<>();

    DotRenderer(PaintScale scale, double size) {
        this.scale = scale;
        this.size = size;
        setDefaultSeriesVisibleInLegend(false);
    }

    @Override
    public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info, XYPlot plot,
            ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item, CrosshairState crosshairState,
            int pass) {
        if (item == 0 && series == 0) {
            byPaint.clear();
        }
        double x = domainAxis.valueToJava2D(dataset.getXValue(series, item), dataArea, plot.getDomainAxisEdge());
        double y = rangeAxis.valueToJava2D(dataset.getYValue(series, item), dataArea, plot.getRangeAxisEdge());
        Paint paint = scale.getPaint(((XYZDataset) dataset).getZValue(series, item));
        Path2D path = byPaint.computeIfAbsent(paint, key -> new Path2D.Double());
        path.append(new Rectangle2D.Double(x - size / 2, y - size / 2, size, size), false);
        if (series == dataset.getSeriesCount() - 1 && item == dataset.getItemCount(series) - 1) {
            for (Map.Entry<Paint, Path2D> dots : byPaint.entrySet()) {
                g2.setPaint(dots.getKey());
                g2.fill(dots.getValue());
            }
            byPaint.clear();
        }
    }
}
