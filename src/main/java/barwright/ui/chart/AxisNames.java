package barwright.ui.chart;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;

import java.awt.Component;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.lang.ref.WeakReference;
import java.util.ArrayList;
import java.util.List;

/**
 * Keeps each axis's name within the room the chart has for it. JFreeChart centres the name on the plot and lets a
 * longer one run past it: a vertical axis's over the chart's title or off its top ("Vertical load on the wheel (N)"
 * beside 280 px of plot), a horizontal axis's off the chart's sides. After each drawing the name's font is made just
 * small enough to fit (never under {@link #SMALLEST_POINTS}), and back to the theme's size where there is room
 * again; a name too long even at that size gives way to its unit alone ("(deg/g)"), the words being in the
 * chart's title or legend. The size to fit from is the one {@link ChartStyle} gives every axis name. Which axes
 * stand upright depends on the plot's orientation: a horizontal bar chart's value axis lies along the bottom and
 * is measured against the plot's width. Event thread.
 */
final class AxisNames {
    static final int SMALLEST_POINTS = 9;
    /** The share of the plot's height a vertical axis's name may take. */
    private static final double SHARE_OF_PLOT = 0.95;
    /** Room kept free at either end of a horizontal axis's name (pixels). */
    private static final int END_ROOM = 4;

    private AxisNames() {
    }

    /** An axis and the length its name may have. */
    private record Room(Axis axis, double length) {
    }

    /**
     * @param metrics a component whose font metrics measure the names (the chart's panel)
     */
    static void fit(JFreeChart chart, ChartRenderingInfo info, Component metrics) {
        Font own = ChartStyle.axisNameFont(); // every chart's axis names, as ChartStyle dresses them
        for (Room room : rooms(chart.getPlot(), info)) {
            Axis axis = room.axis();
            String name = ownName(axis);
            if (name == null || name.isBlank()) {
                continue;
            }
            Font wanted = fitted(metrics, own, name, room.length());
            String shown = name;
            String unit = unit(name);
            if (metrics.getFontMetrics(wanted).stringWidth(name) > room.length() && unit != null) {
                // too long even at the smallest size: the unit alone, the words being in the title or legend
                // (and the whole name where the pointer rests on the axis)
                shown = unit;
                wanted = fitted(metrics, own, shown, room.length());
            }
            keep(axis, shown.equals(name) ? null : name);
            if (!shown.equals(axis.getLabel())) {
                axis.setLabel(shown);
            }
            if (!wanted.equals(axis.getLabelFont())) {
                axis.setLabelFont(wanted); // redraws once; the plot's size does not depend on this font
            }
        }
    }

    /** The whole names of the axes showing their unit alone, by the axis itself (not its equal), held weakly. */
    private static final List<Kept> KEPT = new ArrayList<>();

    private record Kept(WeakReference<Axis> axis, String name) {
    }

    /**
     * @return the axis's name as its chart gave it: the label, or where this class showed the unit alone (and the
     *         chart has not named the axis anew since), the whole name it kept
     */
    private static synchronized String ownName(Axis axis) {
        KEPT.removeIf(kept -> kept.axis().get() == null);
        for (Kept kept : KEPT) {
            if (kept.axis().get() == axis && axis.getLabel() != null && axis.getLabel().equals(unit(kept.name()))) {
                return kept.name();
            }
        }
        return axis.getLabel();
    }

    /** @return the axis's whole name, also while its unit alone is shown */
    static String wholeName(Axis axis) {
        return ownName(axis);
    }

    /** Keeps the axis's whole name while its unit alone is shown; forgets it with null. */
    private static synchronized void keep(Axis axis, String name) {
        KEPT.removeIf(kept -> kept.axis().get() == null || kept.axis().get() == axis);
        if (name != null) {
            KEPT.add(new Kept(new WeakReference<>(axis), name));
        }
    }

    /** @return the name's unit with its brackets, "(deg/g)" of "Roll gradient (deg/g)"; null where it has none */
    static String unit(String name) {
        int open = name.lastIndexOf('(');
        int close = name.indexOf(')', open);
        return open > 0 && close > open ? name.substring(open, close + 1) : null;
    }

    private static Font fitted(Component metrics, Font own, String label, double room) {
        double width = metrics.getFontMetrics(own).stringWidth(label);
        if (width <= room) {
            return own;
        }
        float size = (float) Math.max(SMALLEST_POINTS, Math.floor(own.getSize2D() * room / width));
        return own.deriveFont(Math.min(size, own.getSize2D()));
    }

    /** @return each named axis of the plot with the length its name may take */
    private static List<Room> rooms(Plot plot, ChartRenderingInfo info) {
        List<Room> rooms = new ArrayList<>();
        PlotRenderingInfo plotInfo = info.getPlotInfo();
        Rectangle2D chartArea = info.getChartArea();
        Rectangle2D dataArea = plotInfo.getDataArea();
        if (plot instanceof CombinedDomainXYPlot combined) {
            boolean upright = combined.getOrientation() == PlotOrientation.VERTICAL;
            add(rooms, combined.getDomainAxis(), !upright, dataArea, chartArea);
            List<XYPlot> parts = combined.getSubplots();
            for (int i = 0; i < parts.size(); i++) {
                // each part's name stands beside its own part of the plot
                Rectangle2D partArea = i < plotInfo.getSubplotCount() ? plotInfo.getSubplotInfo(i).getDataArea()
                        : dataArea;
                for (int axis = 0; axis < parts.get(i).getRangeAxisCount(); axis++) {
                    add(rooms, parts.get(i).getRangeAxis(axis), upright, partArea, chartArea);
                }
            }
        } else if (plot instanceof XYPlot xy) {
            boolean upright = xy.getOrientation() == PlotOrientation.VERTICAL;
            for (int axis = 0; axis < xy.getDomainAxisCount(); axis++) {
                add(rooms, xy.getDomainAxis(axis), !upright, dataArea, chartArea);
            }
            for (int axis = 0; axis < xy.getRangeAxisCount(); axis++) {
                add(rooms, xy.getRangeAxis(axis), upright, dataArea, chartArea);
            }
        } else if (plot instanceof CategoryPlot category) {
            boolean upright = category.getOrientation() == PlotOrientation.VERTICAL;
            add(rooms, category.getDomainAxis(), !upright, dataArea, chartArea);
            add(rooms, category.getRangeAxis(), upright, dataArea, chartArea);
        }
        return rooms;
    }

    /**
     * @param vertical whether the axis is drawn upright: its name then runs along the plot's height; a
     *                 horizontal axis's name is centred under (or over) the plot and may use the chart's width
     *                 on both sides of the plot as far as the narrower side allows
     */
    private static void add(List<Room> rooms, Axis axis, boolean vertical, Rectangle2D plot, Rectangle2D chart) {
        if (axis == null || plot == null) {
            return;
        }
        double length;
        if (vertical) {
            length = SHARE_OF_PLOT * plot.getHeight();
        } else {
            double side = Math.min(plot.getMinX() - chart.getMinX(), chart.getMaxX() - plot.getMaxX());
            length = plot.getWidth() + 2 * Math.max(0, side - END_ROOM);
        }
        rooms.add(new Room(axis, length));
    }
}
