package barwright.ui.chart;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.event.ChartProgressEvent;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;

import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.WeakHashMap;

/**
 * Keeps each vertical axis's name no longer than the plot it stands beside. JFreeChart centres the name on the
 * plot and lets a longer one run past it, over the chart's title; with the largest text on a short chart
 * ("Vertical load on the wheel (N)" beside 280 px of plot) it did. After each drawing the name's font is made
 * just small enough to fit (never under {@link #SMALLEST_POINTS}), and back to the theme's size where there is
 * room again. Event thread.
 */
final class VerticalAxisLabels {
    static final int SMALLEST_POINTS = 9;
    /** The share of the plot's height the name may take. */
    private static final double SHARE_OF_PLOT = 0.95;

    /** Each axis's own font as the theme set it, and the font this class set last. */
    private final Map<Axis, Font[]> fonts = new WeakHashMap<>();
    private final ChartPanel panel;

    private VerticalAxisLabels(ChartPanel panel) {
        this.panel = panel;
    }

    /** Fits the panel's chart after each drawing, and any chart put in the panel later. */
    static void fitAfterEachDrawing(ChartPanel panel) {
        VerticalAxisLabels fitter = new VerticalAxisLabels(panel);
        org.jfree.chart.event.ChartProgressListener listener = event -> {
            if (event.getType() == ChartProgressEvent.DRAWING_FINISHED) {
                fitter.fit();
            }
        };
        if (panel.getChart() != null) {
            panel.getChart().addProgressListener(listener);
        }
        panel.addPropertyChangeListener("chart", change -> {
            if (change.getOldValue() instanceof JFreeChart old) {
                old.removeProgressListener(listener);
            }
            if (change.getNewValue() instanceof JFreeChart chart) {
                chart.addProgressListener(listener);
            }
        });
    }

    private void fit() {
        JFreeChart chart = panel.getChart();
        if (chart == null || panel.getChartRenderingInfo() == null) {
            return;
        }
        Rectangle2D plotArea = panel.getChartRenderingInfo().getPlotInfo().getDataArea();
        if (plotArea == null || plotArea.getHeight() <= 0) {
            return;
        }
        List<Axis> vertical = verticalAxes(chart.getPlot());
        // subplots share the height: each name stands beside its own part
        double room = SHARE_OF_PLOT * plotArea.getHeight() / Math.max(1, vertical.size());
        for (Axis axis : vertical) {
            String label = axis.getLabel();
            if (label == null || label.isBlank()) {
                continue;
            }
            Font[] known = fonts.get(axis);
            if (known == null || !axis.getLabelFont().equals(known[1])) {
                known = new Font[]{axis.getLabelFont(), null}; // the theme set it anew
                fonts.put(axis, known);
            }
            Font wanted = fitted(known[0], label, room);
            known[1] = wanted;
            if (!wanted.equals(axis.getLabelFont())) {
                axis.setLabelFont(wanted); // redraws once; the plot's height does not depend on this font
            }
        }
    }

    private Font fitted(Font own, String label, double room) {
        double width = panel.getFontMetrics(own).stringWidth(label);
        if (width <= room) {
            return own;
        }
        float size = (float) Math.max(SMALLEST_POINTS, Math.floor(own.getSize2D() * room / width));
        return own.deriveFont(Math.min(size, own.getSize2D()));
    }

    private static List<Axis> verticalAxes(Plot plot) {
        List<Axis> axes = new ArrayList<>();
        if (plot instanceof CombinedDomainXYPlot combined) {
            for (XYPlot part : combined.getSubplots()) {
                addRangeAxes(part, axes);
            }
        } else if (plot instanceof XYPlot xy) {
            addRangeAxes(xy, axes);
        } else if (plot instanceof CategoryPlot category && category.getRangeAxis() != null) {
            axes.add(category.getRangeAxis());
        }
        return axes;
    }

    private static void addRangeAxes(XYPlot plot, List<Axis> axes) {
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            if (plot.getRangeAxis(i) != null) {
                axes.add(plot.getRangeAxis(i));
            }
        }
    }
}
