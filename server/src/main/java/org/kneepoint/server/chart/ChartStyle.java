package org.kneepoint.server.chart;

import java.awt.BasicStroke;
import java.awt.Font;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.text.TextUtils;

/** The look shared by the charts: paper background, light grid, axes through the origin, plain sans-serif type. */
final class ChartStyle {

    static final Font TITLE_FONT = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    private static final Font LABEL_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    private static final Font TICK_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    static {
        // JFreeChart draws rotated labels (the vertical axis title) as a TextLayout by default, which
        // JFreeSVG writes as glyph outlines; plain drawString keeps it as searchable, selectable text.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private ChartStyle() {
    }

    static void apply(XYPlot plot) {
        plot.setBackgroundPaint(TemperaturePalette.PAPER);
        plot.setDomainGridlinePaint(TemperaturePalette.GRID);
        plot.setRangeGridlinePaint(TemperaturePalette.GRID);
        plot.setDomainZeroBaselineVisible(true);
        plot.setRangeZeroBaselineVisible(true);
        plot.setDomainZeroBaselinePaint(TemperaturePalette.INK);
        plot.setRangeZeroBaselinePaint(TemperaturePalette.INK);
        plot.setDomainZeroBaselineStroke(new BasicStroke(1f));
        plot.setRangeZeroBaselineStroke(new BasicStroke(1f));
        plot.setOutlineVisible(false);
        apply(plot.getDomainAxis());
        apply(plot.getRangeAxis());
    }

    static void apply(ValueAxis axis) {
        axis.setLabelFont(LABEL_FONT);
        axis.setTickLabelFont(TICK_FONT);
        axis.setLabelPaint(TemperaturePalette.INK);
        axis.setTickLabelPaint(TemperaturePalette.INK);
    }

    static void apply(JFreeChart chart) {
        chart.setBackgroundPaint(java.awt.Color.WHITE);
        chart.setAntiAlias(true);
        chart.getTitle().setPaint(TemperaturePalette.INK);
        chart.getLegend().setItemFont(TICK_FONT);
        chart.getLegend().setFrame(org.jfree.chart.block.BlockBorder.NONE);
    }
}
