package barwright.ui.chart;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;

import javax.swing.UIManager;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;

/**
 * Dresses a chart in the window's theme: its background, text colour and text size, so that charts follow
 * light and dark themes and the text-size setting. Series colours come from the theme's properties too.
 */
public final class ChartStyle {
    private ChartStyle() {
    }

    /** @return a series colour of the theme: 0 front outside, 1 front inside, 2 rear outside, 3 rear inside... */
    public static Color series(int index) {
        Color colour = UIManager.getColor("Barwright.chart.series" + index);
        if (colour != null) {
            return colour;
        }
        Color[] fallback = {new Color(0x1F6FB5), new Color(0x6FA8DC), new Color(0xC24E1A), new Color(0xE6A06F),
                new Color(0x3C8D3C), new Color(0x7A4FB0)};
        return fallback[index % fallback.length];
    }

    /**
     * @return a colour for the index-th of many lines: the six theme colours, then the same colours set further
     *     from the background (darker on a light theme, lighter on a dark one), so no two lines look alike and
     *     none sinks into the background
     */
    public static Color distinct(int index) {
        Color colour = series(index % 6);
        if (index < 6) {
            return colour;
        }
        Color background = colour("Panel.background", Color.WHITE);
        boolean dark = 0.299 * background.getRed() + 0.587 * background.getGreen() + 0.114 * background.getBlue() < 128;
        return dark ? colour.brighter().brighter() : colour.darker().darker();
    }

    public static void apply(JFreeChart chart) {
        Color background = colour("Panel.background", Color.WHITE);
        Color text = colour("Label.foreground", Color.BLACK);
        Color grid = colour("Barwright.chart.grid", new Color(0xCCCCCC));
        float size = baseSize();
        chart.setBackgroundPaint(background);
        chart.setAntiAlias(true);
        TextTitle title = chart.getTitle();
        if (title != null) {
            title.setPaint(text);
            title.setFont(new Font(Font.SANS_SERIF, Font.BOLD, Math.round(size * 1.1f)));
        }
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof LegendTitle legend) {
                legend.setBackgroundPaint(background);
                legend.setItemPaint(text);
                legend.setItemFont(new Font(Font.SANS_SERIF, Font.PLAIN, Math.round(size * 0.95f)));
                legend.setFrame(BlockBorder.NONE);
            } else if (chart.getSubtitle(i) instanceof TextTitle subtitle) {
                subtitle.setPaint(text);
                subtitle.setFont(new Font(Font.SANS_SERIF, Font.ITALIC, Math.round(size * 0.95f)));
            }
        }
        Plot plot = chart.getPlot();
        plot.setBackgroundPaint(colour("Barwright.chart.plotBackground", background));
        plot.setOutlinePaint(grid);
        Font axisFont = axisNameFont();
        Font tickFont = labelFont();
        if (plot instanceof XYPlot xy) {
            xyPlot(xy, grid, text, axisFont, tickFont);
            if (plot instanceof org.jfree.chart.plot.CombinedDomainXYPlot combined) {
                // stacked plots sharing one x axis: each has its own background, grid and value axis
                for (XYPlot part : combined.getSubplots()) {
                    part.setBackgroundPaint(colour("Barwright.chart.plotBackground", background));
                    part.setOutlinePaint(grid);
                    xyPlot(part, grid, text, axisFont, tickFont);
                    labels(part);
                }
            }
            labels(xy);
        } else if (plot instanceof CategoryPlot category) {
            category.setRangeGridlinePaint(grid);
            axis(category.getDomainAxis(), text, axisFont, tickFont);
            axis(category.getRangeAxis(), text, axisFont, tickFont);
        }
    }

    private static void xyPlot(XYPlot xy, Color grid, Color text, Font axisFont, Font tickFont) {
        xy.setDomainGridlinePaint(grid);
        xy.setRangeGridlinePaint(grid);
        xy.setDomainGridlineStroke(new BasicStroke(0.6f));
        xy.setRangeGridlineStroke(new BasicStroke(0.6f));
        for (int i = 0; i < xy.getDomainAxisCount(); i++) {
            axis(xy.getDomainAxis(i), text, axisFont, tickFont);
        }
        for (int i = 0; i < xy.getRangeAxisCount(); i++) {
            axis(xy.getRangeAxis(i), text, axisFont, tickFont);
        }
    }

    private static void axis(Axis axis, Color text, Font label, Font ticks) {
        if (axis == null) {
            return;
        }
        axis.setLabelPaint(text);
        axis.setTickLabelPaint(text);
        axis.setLabelFont(label);
        axis.setTickLabelFont(ticks);
        axis.setAxisLinePaint(text);
        axis.setTickMarkPaint(text);
    }

    /**
     * @return the axis's name as its chart gave it, also where a short room shows its unit alone ("(deg/g)" for
     *         "Roll gradient (deg/g)")
     */
    public static String axisName(Axis axis) {
        return AxisNames.wholeName(axis);
    }

    /**
     * @return the chart in a panel that redraws at any size (no buffer, no zoom, no pop-up menu) and fits the
     *         chart's words to each size: axis names, legend lines and marker labels stay inside the chart
     */
    public static ChartPanel panel(JFreeChart chart, String name) {
        ChartPanel panel = new FittingChartPanel(chart);
        panel.setName(name);
        panel.setMouseWheelEnabled(false);
        panel.setPopupMenu(null);
        panel.setMinimumDrawWidth(200);
        panel.setMinimumDrawHeight(150);
        panel.setMaximumDrawWidth(4000);
        panel.setMaximumDrawHeight(3000);
        return panel;
    }

    /** @return the font of the axes' names: the window's text size */
    static Font axisNameFont() {
        return new Font(Font.SANS_SERIF, Font.PLAIN, Math.round(baseSize()));
    }

    /**
     * @return the font for marker and annotation labels, the size of the axes' tick labels (the window's text
     *         size, a little smaller): words on the plot grow with the text-size setting as the axes do
     */
    public static Font labelFont() {
        return new Font(Font.SANS_SERIF, Font.PLAIN, Math.round(baseSize() * 0.9f));
    }

    /** @return the window's text size in points (the theme's default font), 13 where there is none */
    private static float baseSize() {
        Font base = UIManager.getFont("defaultFont") != null ? UIManager.getFont("defaultFont")
                : UIManager.getFont("Label.font");
        return base == null ? 13f : base.getSize2D();
    }

    /**
     * Gives the labels already on a plot (its markers' and its text annotations') the label font, keeping their
     * style (bold stays bold); labels added later take {@link #labelFont()} where they are made.
     */
    private static void labels(XYPlot plot) {
        Font font = labelFont();
        List<Marker> markers = new ArrayList<>();
        for (Layer layer : new Layer[]{Layer.FOREGROUND, Layer.BACKGROUND}) {
            addAll(markers, plot.getDomainMarkers(layer));
            addAll(markers, plot.getRangeMarkers(layer));
        }
        for (Marker marker : markers) {
            marker.setLabelFont(font.deriveFont(marker.getLabelFont().getStyle()));
        }
        for (Object annotation : plot.getAnnotations()) {
            if (annotation instanceof XYTextAnnotation words) {
                words.setFont(font.deriveFont(words.getFont().getStyle()));
            }
        }
    }

    private static void addAll(List<Marker> into, java.util.Collection<?> markers) {
        if (markers != null) {
            for (Object marker : markers) {
                into.add((Marker) marker);
            }
        }
    }

    /** @return the text colour of the theme, for annotations */
    public static Color text() {
        return colour("Label.foreground", Color.BLACK);
    }

    private static Color colour(String key, Color fallback) {
        Color colour = UIManager.getColor(key);
        return colour != null ? colour : fallback;
    }

    /**
     * Readings drawn as points (series 0: used, 1: left out) and a fitted line (series 2), in the series'
     * colours: the workshop's fits.
     */
    static void pointsAndFittedLine(XYPlot plot) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesLinesVisible(1, false);
        renderer.setSeriesShapesVisible(2, false);
        for (int i = 0; i < 3; i++) {
            renderer.setSeriesPaint(i, series(i));
        }
        plot.setRenderer(renderer);
    }
}
